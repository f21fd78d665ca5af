import type { CompiledFlow, CompiledStep } from "../../../../shared/flow/compile.ts";
import type { FlowContext } from "../../../../shared/flow/context.ts";
import { unitLabel } from "../../../../shared/calc/units.ts";
import { VerdictMark } from "../../../components/ui/verdict-mark.tsx";

type FindingStep = Extract<CompiledStep, { kind: "finding" }>;

const certaintyWords = { confirmed: "Confirmed by the checks", likely: "Likely, from the checks so far" } as const;
const fmt = (n: number) => String(Number(n.toPrecision(4)));

function Readings({ compiled, context }: { compiled: CompiledFlow; context: FlowContext }) {
  if (context.readings.length === 0) return null;
  return (
    <section aria-labelledby="finding-readings" className="flex flex-col gap-3">
      <h2 id="finding-readings" className="text-xl font-semibold">Readings</h2>
      <ul className="flex flex-col gap-3">
        {context.readings.map((r) => (
          <li key={r.seq} className="flex flex-col gap-1 rounded-lg border-2 border-line bg-raised px-4 py-3">
            <span className="text-base text-ink-muted">{compiled.steps[r.stepId]?.title ?? r.stepId}</span>
            <span className="flex flex-wrap items-center gap-4">
              <span className="tabular-figures text-2xl font-semibold">{fmt(r.value)} {unitLabel(r.unit)}</span>
              <VerdictMark verdict={r.verdict} size="small" />
            </span>
            <span className="text-base">{r.reason}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}

/** What the check found, said so it can be told to the customer, with the work it leads to. */
export function FindingSummary({ compiled, step, context }: { compiled: CompiledFlow; step: FindingStep; context: FlowContext }) {
  return (
    <div className="flex max-w-[70ch] flex-col gap-6">
      <header className="flex flex-col gap-2">
        <p className="text-base font-semibold text-ink-muted">Finding · {certaintyWords[step.certainty]}</p>
        <h1 className="text-step font-semibold">{step.title}</h1>
        <p className="text-lg">{step.explanation}</p>
      </header>
      <Readings compiled={compiled} context={context} />
      {step.repairs.length > 0 && (
        <section aria-labelledby="finding-repairs" className="flex flex-col gap-3">
          <h2 id="finding-repairs" className="text-xl font-semibold">Recommended repairs</h2>
          <ul className="flex flex-col gap-3">
            {step.repairs.map((repair) => (
              <li key={repair.title} className="rounded-lg border-2 border-line bg-raised px-4 py-3">
                <p className="flex flex-wrap justify-between gap-3 text-lg font-semibold">
                  <span>{repair.title}</span>
                  <span className="tabular-figures">{repair.labourHours} h labour</span>
                </p>
                {repair.parts.length > 0 && <p className="text-base">Parts: {repair.parts.join(", ")}</p>}
              </li>
            ))}
          </ul>
        </section>
      )}
      {step.followUp && step.followUp.length > 0 && (
        <section aria-labelledby="finding-follow-up" className="flex flex-col gap-2">
          <h2 id="finding-follow-up" className="text-xl font-semibold">Check afterwards</h2>
          <ul className="list-disc pl-6 text-base">
            {step.followUp.map((f) => (
              <li key={f}>{f}</li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}
