import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { useSearchParams } from "react-router";
import type { InsightResponse } from "../../../../shared/schemas/insight.ts";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { insightQueryOptions } from "../api/get-insight.ts";
import { formatRange } from "../lib/format.ts";
import { checkRange, isoDay, rangeFromParams } from "../lib/range.ts";
import { FindingsByEquipment, FindingsByFlow, TimeToFinding } from "./findings-sections.tsx";
import { HeadlineFigures } from "./headline-figures.tsx";
import { RangeForm } from "./range-form.tsx";
import { ReviewsPerTech, SessionsPerTech } from "./tech-sections.tsx";

/** The shop lead's figures; the range lives in the address, so a view can be shared and survives a reload. */
export function InsightPage({ now = () => new Date() }: { now?: () => Date }) {
  const [params, setParams] = useSearchParams();
  const today = isoDay(now());
  const { from, to } = rangeFromParams(params, today);
  const { range, errors } = checkRange(from, to);
  const setRange = (next: { from: string; to: string }) => setParams(new URLSearchParams(next), { replace: true });
  // The last answer stays up while a new range loads, rather than the screen going blank.
  const insight = useQuery({ ...insightQueryOptions(range ?? { from: today, to: today }), enabled: range !== null, placeholderData: keepPreviousData });

  return (
    <div className="flex max-w-6xl min-w-0 flex-col gap-8">
      <div className="flex flex-col gap-1">
        <h1 className="text-step font-semibold">Shop insight</h1>
        <p className="max-w-[65ch] text-ink-muted">Which faults come in most, how long checks take, and how each tech's sessions fare at review, over the days you choose.</p>
      </div>
      <RangeForm from={from} to={to} today={today} errors={errors} onChange={setRange} />
      {range === null ? (
        <p className="text-ink-muted">Fix the dates above to see the figures.</p>
      ) : insight.isError ? (
        <FormProblem title="The figures did not load.">Check that this tablet is on the shop's network, then choose the range again or reload.</FormProblem>
      ) : insight.isPending ? (
        <p className="text-ink-muted">Loading the figures…</p>
      ) : insight.data.totals.sessions === 0 ? (
        <div className="flex flex-col gap-2 rounded-xl border-2 border-dashed border-line-strong px-5 py-4">
          <p className="font-semibold">No sessions in this range</p>
          <p>No check was started on the days chosen ({formatRange(range)}). Choose a longer range, or one that ends later.</p>
        </div>
      ) : (
        <Figures data={insight.data} />
      )}
    </div>
  );
}

function Figures({ data }: { data: InsightResponse }) {
  const range = { from: data.from, to: data.to };
  return (
    <div className="flex min-w-0 flex-col gap-8">
      <p className="text-lg font-semibold" aria-live="polite">
        Figures for sessions started {formatRange(range)}
      </p>
      <HeadlineFigures totals={data.totals} />
      <FindingsByFlow rows={data.findingsByFlow} range={range} />
      <FindingsByEquipment rows={data.findingsByEquipment} range={range} />
      <TimeToFinding rows={data.timeToFinding} range={range} />
      <SessionsPerTech rows={data.techs} range={range} />
      <ReviewsPerTech rows={data.techs} range={range} />
    </div>
  );
}
