import type { ReactNode } from "react";
import { Button } from "../../../components/ui/button.tsx";
import { csvFileName, downloadCsv, toCsv } from "../lib/csv.ts";
import { InsightTable, type Column } from "./insight-table.tsx";

interface InsightSectionProps<T> {
  id: string;
  title: string;
  intro: string;
  caption: string;
  columns: Column<T>[];
  rows: T[];
  rowKey: (row: T) => string;
  range: { from: string; to: string };
  /** One chart or more, drawn from the same rows as the table. */
  charts: ReactNode;
}

/** The CSV of a table: the same columns and rows, numbers as numbers. */
export function tableCsv<T>(columns: Column<T>[], rows: T[]) {
  return toCsv(columns.map((c) => c.csvHeader ?? c.header), rows.map((row) => columns.map((c) => c.csv(row))));
}

/** One question about the shop: a chart, the table with the same figures, and the table as a CSV file. */
export function InsightSection<T>({ id, title, intro, caption, columns, rows, rowKey, range, charts }: InsightSectionProps<T>) {
  const headingId = `${id}-heading`;
  return (
    <section aria-labelledby={headingId} className="flex min-w-0 flex-col gap-4 rounded-xl border-2 border-line bg-raised px-5 py-5">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div className="flex max-w-[60ch] flex-col gap-1">
          <h2 id={headingId} className="text-2xl font-semibold">
            {title}
          </h2>
          <p className="text-ink-muted">{intro}</p>
        </div>
        <Button onClick={() => downloadCsv(csvFileName(title, range), tableCsv(columns, rows))} aria-describedby={headingId}>
          Download CSV
        </Button>
      </div>
      {rows.length === 0 ? (
        <p className="text-ink-muted">Nothing to show for this range.</p>
      ) : (
        <>
          {charts}
          <InsightTable caption={caption} columns={columns} rows={rows} rowKey={rowKey} />
        </>
      )}
    </section>
  );
}
