import type { FlowDetail } from "../../../../shared/schemas/flows.ts";
import { Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { useStartDraft } from "../api/start-draft.ts";

/** A flow without a draft: edits start from one of its published versions. */
export function StartDraftPanel({ detail }: { detail: FlowDetail }) {
  const start = useStartDraft(detail.id);
  const [latest, ...older] = detail.versions;
  return (
    <section aria-labelledby="start-draft-title" className="flex max-w-3xl flex-col gap-4 rounded-xl border-2 border-dashed border-line-strong bg-raised px-6 py-5">
      <h2 id="start-draft-title" className="text-2xl font-semibold">
        No draft
      </h2>
      {latest ? (
        <>
          <p>Changes are made in a draft; the bench keeps running the published version until the draft is published.</p>
          {start.error && <FormProblem title="The draft was not started.">{start.error.message}</FormProblem>}
          <Button variant="primary" size="main" className="self-start" disabled={start.isPending} onClick={() => start.mutate(latest.number)}>
            Start a draft from version {latest.number}
          </Button>
          {older.length > 0 && (
            <div className="flex flex-wrap items-center gap-3">
              <span className="text-ink-muted">Or from an older version:</span>
              {older.map((version) => (
                <Button key={version.number} disabled={start.isPending} onClick={() => start.mutate(version.number)}>
                  Version {version.number}
                </Button>
              ))}
            </div>
          )}
        </>
      ) : (
        <p>This flow has neither a draft nor a published version. Import a flow file with its id to give it a draft.</p>
      )}
    </section>
  );
}
