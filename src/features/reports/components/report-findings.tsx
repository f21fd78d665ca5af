import { formatDay } from "../../../../shared/report/dates.ts";
import { readingText } from "../../../../shared/report/words.ts";
import type { ReportFinding } from "../../../../shared/schemas/report.ts";
import { VerdictMark } from "../../../components/ui/verdict-mark.tsx";

function Readings({ finding }: { finding: ReportFinding }) {
  if (finding.readings.length === 0) return null;
  return (
    <table className="w-full border-collapse text-left">
      <caption className="sr-only">Readings taken for this finding</caption>
      <thead>
        <tr className="border-b-2 border-ink">
          <th scope="col" className="py-1 pr-4 font-semibold">Measured</th>
          <th scope="col" className="py-1 pr-4 font-semibold">Reading</th>
          <th scope="col" className="py-1 font-semibold">Verdict</th>
        </tr>
      </thead>
      <tbody>
        {finding.readings.map((r) => (
          <tr key={r.stepId} className="border-b border-line align-top">
            <td className="py-1.5 pr-4">{r.title}</td>
            <td className="tabular-figures py-1.5 pr-4 font-semibold whitespace-nowrap">{readingText(r)}</td>
            <td className="py-1.5">
              <VerdictMark verdict={r.verdict} size="small" />
              {r.band && <span className="block text-base text-ink-muted">{r.band}</span>}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** What the checks found, each finding said as it can be told to the customer, with its readings. */
export function ReportFindings({ findings }: { findings: ReportFinding[] }) {
  return (
    <section aria-labelledby="report-findings" className="flex flex-col gap-4">
      <h2 id="report-findings" className="border-b-2 border-ink pb-1 text-2xl font-semibold">What we found</h2>
      {findings.length === 0 && <p>The checks on this unit are not finished yet.</p>}
      {findings.map((finding) => (
        <article key={finding.sessionId} aria-labelledby={`finding-${finding.sessionId}`} className="flex flex-col gap-3 rounded-md border-2 border-line p-4">
          <p className="text-base text-ink-muted">
            {finding.certaintyLabel} · {finding.flowTitle}
            {finding.completedAt && ` · ${formatDay(finding.completedAt)}`}
          </p>
          <h3 id={`finding-${finding.sessionId}`} className="text-xl font-semibold">
            {finding.title}
          </h3>
          <p>{finding.explanation}</p>
          <Readings finding={finding} />
          {finding.repairs.length > 0 && (
            <div data-print="keep">
              <h4 className="font-semibold">Recommended repairs</h4>
              <ul className="list-disc pl-6">
                {finding.repairs.map((r) => (
                  <li key={r.title}>
                    {r.title}
                    {r.parts.length > 0 && <span className="text-ink-muted"> ({r.parts.join(", ")})</span>}
                  </li>
                ))}
              </ul>
            </div>
          )}
        </article>
      ))}
    </section>
  );
}
