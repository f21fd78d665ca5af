export type CsvValue = string | number | null;

// RFC 4180, section 2: a field holding a comma, a double quote or a line break is put in double
// quotes, and a double quote inside it is written twice.
const needsQuotes = /[",\r\n]/;

function field(value: CsvValue): string {
  if (value === null) return "";
  const text = String(value);
  return needsQuotes.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** A header row and data rows as CSV text; records end in CRLF, as RFC 4180 has them. */
export function toCsv(header: readonly string[], rows: readonly (readonly CsvValue[])[]): string {
  return [header, ...rows].map((row) => row.map(field).join(",") + "\r\n").join("");
}

/** Hands the CSV to the browser as a file download. */
export function downloadCsv(fileName: string, csv: string) {
  // A byte-order mark, so spreadsheet programs read the file as UTF-8 (accents in names survive).
  const url = URL.createObjectURL(new Blob(["\uFEFF", csv], { type: "text/csv;charset=utf-8" }));
  const link = document.createElement("a");
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  // Let the download start before the address is let go.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

/** e.g. "benchpath-findings-per-flow-2026-01-01-to-2026-03-31.csv" */
export function csvFileName(what: string, range: { from: string; to: string }) {
  const slug = what.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "");
  return `benchpath-${slug}-${range.from}-to-${range.to}.csv`;
}
