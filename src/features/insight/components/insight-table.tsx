import type { CsvValue } from "../lib/csv.ts";

export interface Column<T> {
  header: string;
  /** The CSV's heading, where its figure is written differently from the table's (minutes, percent). */
  csvHeader?: string;
  /** The cell as the table shows it. */
  text: (row: T) => string;
  /** The same figure for the CSV: a plain number where the table has one. */
  csv: (row: T) => CsvValue;
  numeric?: boolean;
}

/** The figures behind a chart as a plain table: the first column names each row. */
export function InsightTable<T>({ caption, columns, rows, rowKey }: { caption: string; columns: Column<T>[]; rows: T[]; rowKey: (row: T) => string }) {
  return (
    <div className="overflow-x-auto rounded-lg border-2 border-line">
      <table className="w-full border-collapse text-left tabular-figures">
        <caption className="px-4 pt-3 pb-2 text-left font-semibold">{caption}</caption>
        <thead>
          <tr className="border-b-2 border-line-strong bg-sunken">
            {columns.map((c) => (
              <th key={c.header} scope="col" className={`px-4 py-3 text-base font-semibold ${c.numeric ? "text-right" : ""}`}>
                {c.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={rowKey(row)} className="border-b border-line last:border-b-0">
              {columns.map((c, i) =>
                i === 0 ? (
                  <th key={c.header} scope="row" className="min-w-40 px-4 py-3 font-medium">
                    {c.text(row)}
                  </th>
                ) : (
                  <td key={c.header} className={`px-4 py-3 ${c.numeric ? "text-right" : ""}`}>
                    {c.text(row)}
                  </td>
                ),
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
