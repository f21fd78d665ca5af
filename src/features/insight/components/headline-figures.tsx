import type { InsightResponse } from "../../../../shared/schemas/insight.ts";
import { formatMinutes, formatShare } from "../lib/format.ts";

const count = (n: number) => n.toLocaleString("en-GB");

/** The range in five figures, each with a line saying what it counts. */
export function HeadlineFigures({ totals }: { totals: InsightResponse["totals"] }) {
  const figures = [
    { term: "Sessions started", value: count(totals.sessions), note: `${count(totals.open)} still open, ${count(totals.abandoned)} given up` },
    { term: "Completed", value: count(totals.completed), note: "reached a finding" },
    {
      term: "Median time to a finding",
      value: totals.medianMinutesToFinding === null ? "None yet" : formatMinutes(totals.medianMinutesToFinding),
      note: "start to finding, completed sessions",
    },
    {
      term: "Sent back after review",
      value: totals.returnRate === null ? "None reviewed" : formatShare(totals.returnRate),
      note: `${count(totals.returned)} of ${count(totals.reviewed)} reviewed`,
    },
    { term: "Flagged sessions", value: count(totals.flaggedSessions), note: `of ${count(totals.completed)} completed had a flag` },
  ];
  return (
    <dl className="grid grid-cols-[repeat(auto-fill,minmax(13rem,1fr))] gap-4">
      {figures.map((f) => (
        <div key={f.term} className="flex flex-col gap-1 rounded-xl border-2 border-line bg-raised px-5 py-4">
          <dt className="text-base font-semibold text-ink-muted">{f.term}</dt>
          <dd className="text-3xl font-semibold tabular-figures">{f.value}</dd>
          <dd className="text-base text-ink-muted">{f.note}</dd>
        </div>
      ))}
    </dl>
  );
}
