import type { FlowDetail } from "../../../../shared/schemas/flows.ts";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { exportFileName, exportHref } from "../api/export-flow.ts";
import { authorName, personName, timeInWords } from "../lib/flow-words.ts";

/** Every published version, newest first, and the draft above them when there is one. */
export function VersionTable({ detail }: { detail: FlowDetail }) {
  const { draft, versions } = detail;
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[40rem] border-collapse text-left">
        <caption className="sr-only">Versions of this flow</caption>
        <thead>
          <tr className="border-b-2 border-line-strong">
            <th scope="col" className="py-2 pr-4">Version</th>
            <th scope="col" className="py-2 pr-4">By</th>
            <th scope="col" className="py-2 pr-4">When</th>
            <th scope="col" className="py-2 pr-4">What changed</th>
            <th scope="col" className="py-2 pr-4 text-right">Sessions</th>
            <th scope="col" className="py-2"><span className="sr-only">File</span></th>
          </tr>
        </thead>
        <tbody>
          {draft && (
            <tr className="border-b border-line">
              <th scope="row" className="py-2 pr-4 font-semibold">Draft</th>
              <td className="py-2 pr-4">{personName(draft.updatedBy)}</td>
              <td className="py-2 pr-4">{timeInWords(draft.updatedAt)}</td>
              <td className="py-2 pr-4 text-ink-muted">{draft.basedOnVersion ? `Unpublished changes on version ${draft.basedOnVersion}` : "Not yet published"}</td>
              <td className="py-2 pr-4 text-right tabular-figures">–</td>
              <td className="py-2">
                <a className={buttonClasses({ variant: "quiet" })} href={exportHref(detail.id, "draft")} download={exportFileName(detail.id, "draft")}>
                  Export
                </a>
              </td>
            </tr>
          )}
          {versions.map((version) => (
            <tr key={version.number} className="border-b border-line align-top">
              <th scope="row" className="py-2 pr-4 font-semibold tabular-figures">{version.number}</th>
              <td className="py-2 pr-4">{authorName(version.createdBy)}</td>
              <td className="py-2 pr-4">{timeInWords(version.createdAt)}</td>
              <td className="py-2 pr-4">{version.note}</td>
              <td className="py-2 pr-4 text-right tabular-figures">{version.sessionCount}</td>
              <td className="py-2">
                <a className={buttonClasses({ variant: "quiet" })} href={exportHref(detail.id, version.number)} download={exportFileName(detail.id, version.number)}>
                  Export
                </a>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
