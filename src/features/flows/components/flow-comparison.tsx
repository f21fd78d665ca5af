import type { ReactNode } from "react";
import type { Change, FlowDiff } from "../../../../shared/flow/diff.ts";
import { changeWords } from "../lib/diff-words.ts";
import { countInWords } from "../lib/flow-words.ts";

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);
const titled = (stepId: string, step: unknown) => (isRecord(step) && typeof step.title === "string" && step.title !== "" ? `${step.title} (${stepId})` : stepId);

/** A structural comparison: the flow's fields, steps added, removed, renamed and changed. */
export function FlowComparison({ diff, headingLevel = 3 }: { diff: FlowDiff; headingLevel?: 3 | 4 }) {
  if (diff.same) return <p className="font-semibold">No differences.</p>;
  const H = headingLevel === 3 ? "h3" : "h4";
  const { added, removed, renamed, changed, sections } = diff;
  return (
    <div className="flex flex-col gap-5">
      {diff.flow.length > 0 && (
        <Part heading={<H className="text-lg font-semibold">The flow</H>}>
          <Changes changes={diff.flow} />
        </Part>
      )}
      {added.length > 0 && (
        <Part heading={<H className="text-lg font-semibold">Steps added ({added.length})</H>}>
          <ul className="list-disc pl-6">
            {added.map(({ stepId, step }) => (
              <li key={stepId}>{titled(stepId, step)}</li>
            ))}
          </ul>
        </Part>
      )}
      {removed.length > 0 && (
        <Part heading={<H className="text-lg font-semibold">Steps removed ({removed.length})</H>}>
          <ul className="list-disc pl-6">
            {removed.map(({ stepId, step }) => (
              <li key={stepId}>{titled(stepId, step)}</li>
            ))}
          </ul>
        </Part>
      )}
      {renamed.length > 0 && (
        <Part heading={<H className="text-lg font-semibold">Steps renamed ({renamed.length})</H>}>
          <ul className="list-disc pl-6">
            {renamed.map(({ from, to }) => (
              <li key={from}>
                {from} → {to}
              </li>
            ))}
          </ul>
        </Part>
      )}
      {changed.length > 0 && (
        <Part heading={<H className="text-lg font-semibold">Steps changed ({changed.length})</H>}>
          <ul className="flex flex-col gap-3">
            {changed.map((step) => (
              <li key={step.stepId} className="rounded-lg border-2 border-line px-4 py-3">
                <p className="font-semibold">
                  {step.title} ({step.stepId})
                </p>
                {step.fields.length > 0 && (
                  <>
                    <p className="mt-1 text-base text-ink-muted">{countInWords(step.fields.length, "field")} changed</p>
                    <Changes changes={step.fields} />
                  </>
                )}
                {step.branches.length > 0 && (
                  <>
                    <p className="mt-1 text-base text-ink-muted">{countInWords(step.branches.length, "branch change", "branch changes")}</p>
                    <Changes changes={step.branches} />
                  </>
                )}
              </li>
            ))}
          </ul>
        </Part>
      )}
      {sections.added.length + sections.removed.length + sections.changed.length > 0 && (
        <Part heading={<H className="text-lg font-semibold">Sections</H>}>
          <ul className="list-disc pl-6">
            {sections.added.map((id) => (
              <li key={`a-${id}`}>Added: {id}</li>
            ))}
            {sections.removed.map((id) => (
              <li key={`r-${id}`}>Removed: {id}</li>
            ))}
            {sections.changed.map((id) => (
              <li key={`c-${id}`}>Changed: {id}</li>
            ))}
          </ul>
        </Part>
      )}
    </div>
  );
}

function Part({ heading, children }: { heading: ReactNode; children: ReactNode }) {
  return (
    <section className="flex flex-col gap-2">
      {heading}
      {children}
    </section>
  );
}

function Changes({ changes }: { changes: readonly Change[] }) {
  return (
    <ul className="list-disc pl-6">
      {changes.map((change) => (
        <li key={change.path} className="break-words">
          {changeWords(change)}
        </li>
      ))}
    </ul>
  );
}
