import { formatDay } from "../../../../shared/report/dates.ts";
import { shopContact, unitFacts, unitTitle } from "../../../../shared/report/words.ts";
import type { CustomerReport } from "../../../../shared/schemas/report.ts";
import { ReportEstimateSection } from "./report-estimate.tsx";
import { ReportFindings } from "./report-findings.tsx";
import { ReportNotes } from "./report-notes.tsx";

/** The report as it goes on paper: the same sections, in the same order, as the PDF. */
export function ReportSheet({ report }: { report: CustomerReport }) {
  const { shop, workOrder, unit } = report;
  return (
    <article aria-labelledby="report-title" data-print="sheet" className="flex flex-col gap-8 rounded-md border-2 border-line bg-raised px-6 py-8 md:px-10">
      <div className="flex flex-wrap justify-between gap-6 border-b-4 border-ink pb-4">
        <div className="flex flex-col">
          <p className="text-2xl font-bold">{shop.name}</p>
          {shopContact(shop).map((line) => (
            <p key={line} className="text-base text-ink-muted">
              {line}
            </p>
          ))}
        </div>
        <div className="flex flex-col sm:text-right">
          <h1 id="report-title" className="text-xl font-semibold">
            Customer report <span className="block text-3xl font-bold tabular-figures">{workOrder.label}</span>
          </h1>
          <p className="text-base text-ink-muted">Received {formatDay(workOrder.receivedAt)}</p>
          <p className="text-base text-ink-muted">Printed {formatDay(report.generatedAt)}</p>
        </div>
      </div>

      <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-[auto_1fr_auto_1fr]">
        <dt className="text-ink-muted">Customer</dt>
        <dd className="font-semibold">{report.customer.name}</dd>
        <dt className="text-ink-muted">Status</dt>
        <dd className="font-semibold">{workOrder.stateLabel}</dd>
      </dl>

      <section aria-labelledby="report-unit" className="flex flex-col gap-3">
        <h2 id="report-unit" className="border-b-2 border-ink pb-1 text-2xl font-semibold">
          The unit: {unitTitle(unit)}
        </h2>
        <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-[auto_1fr_auto_1fr]">
          {unitFacts(unit).map(([label, value]) => (
            <div key={label} className="contents">
              <dt className="text-ink-muted">{label}</dt>
              <dd className="font-semibold">{value}</dd>
            </div>
          ))}
        </dl>
      </section>

      <section aria-labelledby="report-complaint" className="flex flex-col gap-3">
        <h2 id="report-complaint" className="border-b-2 border-ink pb-1 text-2xl font-semibold">What you told us</h2>
        <p className="max-w-[70ch]">{report.complaint}</p>
      </section>

      <ReportFindings findings={report.findings} />
      {report.estimate && <ReportEstimateSection estimate={report.estimate} />}
      <ReportNotes safety={report.safety} warranty={report.warranty} />
    </article>
  );
}
