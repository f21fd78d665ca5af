import type { Estimate } from "../../../../shared/calc/estimate.ts";
import type { EstimateView } from "../../../../shared/schemas/estimates.ts";
import { formatMoney } from "../lib/money.ts";

type Totals = Pick<Estimate, "partsCents" | "labourCents" | "diagnosticFeeCents" | "diagnosticCreditCents" | "taxCents" | "totalCents">;

/** An option's sum, line by line: parts, labour, the diagnostic fee and its credit, tax, and what the customer pays. */
export function OptionTotals({ estimate, totals, labourHours }: { estimate: Pick<EstimateView, "rates" | "currency">; totals: Totals | null; labourHours: string }) {
  const money = (cents: number) => formatMoney(cents, estimate.currency);
  const { rates } = estimate;
  if (!totals) {
    return <p className="rounded-lg border-2 border-dashed border-line-strong px-4 py-3 text-ink-muted">The total shows once every field of this option reads right.</p>;
  }
  const taxRate = `${(rates.taxRateBasisPoints / 100).toLocaleString("en-US", { maximumFractionDigits: 2 })} %`;
  const rows: [string, string][] = [
    ["Parts", money(totals.partsCents)],
    [`Labour, ${labourHours.trim() || "0"} h at ${money(rates.labourRateCents)}`, money(totals.labourCents)],
  ];
  if (totals.diagnosticFeeCents > 0) rows.push(["Diagnostic fee", money(totals.diagnosticFeeCents)]);
  if (totals.diagnosticCreditCents > 0) rows.push(["Diagnostic fee credited to the repair", `−${money(totals.diagnosticCreditCents)}`]);
  rows.push([`Tax, ${taxRate} on ${rates.taxLabour ? "parts, labour and fee" : "parts"}`, money(totals.taxCents)]);
  return (
    <dl className="grid grid-cols-[minmax(0,1fr)_auto] gap-x-6 gap-y-1 rounded-lg bg-sunken px-4 py-3 tabular-figures">
      {rows.map(([term, value]) => (
        <div key={term} className="contents">
          <dt>{term}</dt>
          <dd className="text-right">{value}</dd>
        </div>
      ))}
      <dt className="border-t-2 border-line-strong pt-1 text-xl font-semibold">Total</dt>
      <dd className="border-t-2 border-line-strong pt-1 text-right text-xl font-semibold" data-testid="option-total">
        {money(totals.totalCents)}
      </dd>
    </dl>
  );
}
