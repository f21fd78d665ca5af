import type { PublicEstimate } from "../../../../shared/schemas/estimates.ts";
import { formatMoney } from "../lib/money.ts";

type Option = PublicEstimate["options"][number];

/** One option as the customer reads it on a phone: its lines, its total, and the big button to approve it. */
export function PublicOptionCard({ option, number, currency, onApprove }: { option: Option; number: number | null; currency: string; onApprove: () => void }) {
  const money = (cents: number) => formatMoney(cents, currency);
  const headingId = `public-option-${option.id}`;
  return (
    <li aria-labelledby={headingId} className="flex flex-col gap-4 rounded-xl border-2 border-line-strong bg-raised px-4 py-4">
      <h2 id={headingId} className="text-xl font-semibold">
        {number !== null && <span className="block text-base font-medium text-ink-muted">Option {number}</span>}
        {option.title}
      </h2>
      <table className="w-full border-collapse text-base tabular-figures">
        <caption className="sr-only">What {option.title} is made of</caption>
        <tbody>
          {option.lines.map((line, i) => (
            <tr key={i} className="border-b border-line align-top">
              <th scope="row" className="py-2 pr-3 text-left font-normal">
                {line.description}
                {line.kind === "labour" ? (
                  <span className="block text-ink-muted">
                    {line.quantity} h at {money(line.unitPriceCents)} an hour
                  </span>
                ) : (
                  line.quantity !== 1 && (
                    <span className="block text-ink-muted">
                      {line.quantity} × {money(line.unitPriceCents)}
                    </span>
                  )
                )}
              </th>
              <td className="py-2 text-right whitespace-nowrap">{line.amountCents < 0 ? `−${money(-line.amountCents)}` : money(line.amountCents)}</td>
            </tr>
          ))}
          <tr className="border-b border-line">
            <th scope="row" className="py-2 pr-3 text-left font-normal">
              Tax
            </th>
            <td className="py-2 text-right whitespace-nowrap">{money(option.totals.taxCents)}</td>
          </tr>
          <tr>
            <th scope="row" className="pt-2 pr-3 text-left text-xl font-semibold">
              Total
            </th>
            <td className="pt-2 text-right text-2xl font-semibold whitespace-nowrap">{money(option.totals.totalCents)}</td>
          </tr>
        </tbody>
      </table>
      {option.repairOrReplace && <p>{option.repairOrReplace.sentence}</p>}
      <button type="button" onClick={onApprove} className="min-h-16 w-full rounded-lg border-2 border-accent bg-accent px-6 text-xl font-semibold text-accent-ink">
        Approve this option
      </button>
    </li>
  );
}
