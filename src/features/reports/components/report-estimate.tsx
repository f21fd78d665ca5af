import { formatDay } from "../../../../shared/report/dates.ts";
import { formatMoney } from "../../../../shared/calc/money.ts";
import { lineQuantity, optionTotalRows } from "../../../../shared/report/words.ts";
import type { ReportEstimate, ReportOption } from "../../../../shared/schemas/report.ts";

function OptionCard({ option, estimate }: { option: ReportOption; estimate: ReportEstimate }) {
  const money = (cents: number) => formatMoney(cents, estimate.currency);
  const titleId = `option-${option.id}`;
  return (
    <article aria-labelledby={titleId} data-print={option.lines.length <= 16 ? "keep" : undefined} className={`flex flex-col gap-3 rounded-md p-4 ${option.approved ? "border-4 border-ink" : "border-2 border-line"}`}>
      {option.approved && (
        <p className="inline-flex items-center gap-2 self-start rounded border-2 border-ink px-2 font-bold tracking-wide">
          <svg viewBox="0 0 24 24" className="size-5" aria-hidden="true" focusable="false">
            <path d="M5 12.5l4.5 4.5L19 7.5" fill="none" strokeWidth="3" strokeLinecap="round" strokeLinejoin="round" className="stroke-ink" />
          </svg>
          Approved
        </p>
      )}
      <h3 id={titleId} className="text-xl font-semibold">
        Option {option.position}: {option.title}
      </h3>
      <table className="w-full border-collapse text-left tabular-figures">
        <thead>
          <tr className="border-b-2 border-ink">
            <th scope="col" className="py-1 pr-4 font-semibold">Item</th>
            <th scope="col" className="py-1 pr-4 text-right font-semibold">Qty</th>
            <th scope="col" className="py-1 pr-4 text-right font-semibold">Unit price</th>
            <th scope="col" className="py-1 text-right font-semibold">Amount</th>
          </tr>
        </thead>
        <tbody>
          {option.lines.map((line, i) => (
            <tr key={`${line.kind}-${i}`} className="border-b border-line">
              <td className="py-1 pr-4">{line.description}</td>
              <td className="py-1 pr-4 text-right whitespace-nowrap">{lineQuantity(line)}</td>
              <td className="py-1 pr-4 text-right whitespace-nowrap">{money(line.unitPriceCents)}</td>
              <td className="py-1 text-right whitespace-nowrap">{money(line.amountCents)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <dl className="ml-auto grid w-full max-w-sm grid-cols-[1fr_auto] gap-x-6 tabular-figures">
        {optionTotalRows(option, estimate).map(([label, amount]) => (
          <div key={label} className="contents">
            <dt>{label}</dt>
            <dd className="text-right">{amount}</dd>
          </div>
        ))}
        <div className="contents text-xl font-bold">
          <dt className="mt-1 border-t-2 border-ink pt-1">Total</dt>
          <dd className="mt-1 border-t-2 border-ink pt-1 text-right">{money(option.totalCents)}</dd>
        </div>
      </dl>
    </article>
  );
}

/** The estimate's options, each with its lines and what the customer pays if they pick it. */
export function ReportEstimateSection({ estimate }: { estimate: ReportEstimate }) {
  const facts: [string, string][] = [["Status", estimate.statusLabel]];
  if (estimate.validUntil) facts.push(["Valid until", formatDay(estimate.validUntil)]);
  if (estimate.sentAt) facts.push(["Sent", formatDay(estimate.sentAt)]);
  if (estimate.decidedAt) facts.push(["Answered", formatDay(estimate.decidedAt)]);
  return (
    <section aria-labelledby="report-estimate" data-print="new-page" className="flex flex-col gap-4">
      <h2 id="report-estimate" className="border-b-2 border-ink pb-1 text-2xl font-semibold">
        Estimate, revision {estimate.revision}
      </h2>
      <dl className="grid grid-cols-[auto_1fr] gap-x-6">
        {facts.map(([label, value]) => (
          <div key={label} className="contents">
            <dt className="text-ink-muted">{label}</dt>
            <dd className="font-semibold">{value}</dd>
          </div>
        ))}
      </dl>
      <p className="font-semibold">{estimate.decisionText}</p>
      {estimate.note.trim() !== "" && <p>{estimate.note}</p>}
      {estimate.options.map((option) => (
        <OptionCard key={option.id} option={option} estimate={estimate} />
      ))}
      <p className="text-base text-ink-muted">
        Labour at {formatMoney(estimate.labourRateCents, estimate.currency)} an hour. Tax is worked out once on the taxable subtotal
        {estimate.taxLabour ? " (parts, labour and fees)." : " (parts only)."}
      </p>
    </section>
  );
}
