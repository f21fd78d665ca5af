import { useQuery } from "@tanstack/react-query";
import type { AdviceResponse } from "../../../../shared/schemas/flows.ts";
import { Button } from "../../../components/ui/button.tsx";
import { adviceQueryOptions } from "../api/get-advice.ts";

const minutes = (n: number) => `${Number(n.toFixed(1))} min`;
const percent = (share: number) => `${Math.round(share * 100)} %`;

function titleOf(advice: AdviceResponse, stepId: string) {
  return advice.checks.find((c) => c.stepId === stepId)?.title ?? stepId;
}

/** What the shop's finished checks on this flow say: how often each finding came, how long each check took, and a quicker order. */
export function CheckOrderAdvice({ flowId, currentOrder, onApply }: { flowId: string; currentOrder: readonly string[]; onApply: (order: string[]) => void }) {
  const advice = useQuery(adviceQueryOptions(flowId));
  if (advice.isPending) return <p className="text-base">Reading the shop's finished checks…</p>;
  if (advice.isError) return <p role="alert" className="text-base">The advice could not be loaded: {advice.error.message}</p>;
  const a = advice.data;
  if (!a.enough) {
    return (
      <p className="max-w-[70ch] text-base">
        Too little history to advise: {a.sessionCount} finished {a.sessionCount === 1 ? "check" : "checks"} on this flow, and advice needs at least {a.minimumSessions}.
      </p>
    );
  }
  const s = a.suggestion;
  const applied = s !== null && s.suggested.join() === currentOrder.join();
  return (
    <div className="flex max-w-3xl flex-col gap-5">
      <p className="text-base">From {a.sessionCount} finished checks.</p>
      <table className="w-full text-left text-base">
        <caption className="mb-2 text-left text-lg font-semibold">How often each finding came</caption>
        <thead>
          <tr className="border-b-2 border-line">
            <th className="py-2 pr-4 font-semibold">Finding</th>
            <th className="py-2 pr-4 font-semibold">Times</th>
            <th className="py-2 font-semibold">Share</th>
          </tr>
        </thead>
        <tbody>
          {a.findings.map((f) => (
            <tr key={f.stepId} className="border-b border-line">
              <td className="py-2 pr-4">{f.title}</td>
              <td className="tabular-figures py-2 pr-4">{f.count}</td>
              <td className="tabular-figures py-2">{percent(f.share)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <table className="w-full text-left text-base">
        <caption className="mb-2 text-left text-lg font-semibold">Time each check takes (median)</caption>
        <tbody>
          {a.checks.map((c) => (
            <tr key={c.stepId} className="border-b border-line">
              <td className="py-2 pr-4">{c.title}</td>
              <td className="tabular-figures py-2">{c.medianMinutes === null ? "no times yet" : `${minutes(c.medianMinutes)} over ${c.samples}`}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {s === null ? (
        <p className="text-base">The checks are already in the quickest order the history shows.</p>
      ) : (
        <section aria-labelledby="order-advice" className="flex flex-col gap-3 rounded-lg border-2 border-accent bg-accent-soft px-5 py-4">
          <h3 id="order-advice" className="text-lg font-semibold">
            A quicker order
          </h3>
          <p className="text-base">{s.explanation}</p>
          <p className="text-base">
            Now: {s.current.map((id) => titleOf(a, id)).join(" → ")}, about {minutes(s.expectedMinutesNow)} to a finding.
          </p>
          <p className="text-base font-semibold">
            Suggested: {s.suggested.map((id) => titleOf(a, id)).join(" → ")}, about {minutes(s.expectedMinutesSuggested)}.
          </p>
          <Button variant="primary" className="self-start" disabled={applied} onClick={() => onApply(s.suggested)}>
            {applied ? "The draft already uses this order" : "Use this order in the draft"}
          </Button>
        </section>
      )}
    </div>
  );
}
