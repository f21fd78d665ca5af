import { paperSizes, type PaperSize } from "../../../../shared/schemas/report.ts";

/** The paper in the address (`?paper=letter`), A4 when it names none or one we do not print on. */
export function paperFrom(search: URLSearchParams): PaperSize {
  const asked = search.get("paper");
  return paperSizes.find((p) => p === asked) ?? "a4";
}

/** The PDF of the report on that paper, from the server. */
export function reportPdfPath(workOrderId: string, paper: PaperSize) {
  return `/api/work-orders/${encodeURIComponent(workOrderId)}/report.pdf?paper=${paper}`;
}

const pageSizes: Record<PaperSize, string> = { a4: "A4", letter: "letter" };

/**
 * The print stylesheet: the chosen paper, only the report on it (the app's header, area list and the
 * page's own buttons stay on screen), black on white, and the estimate on a page of its own.
 */
export function printRules(paper: PaperSize) {
  return `
@page { size: ${pageSizes[paper]}; margin: 14mm 14mm 16mm; }
@media print {
  /* The app sizes text in rem: a smaller root brings every size down to paper sizes together. */
  html { font-size: 9.5pt !important; }
  html, body { background: #fff !important; color: #000 !important; }
  header, nav, a[href="#main"], [data-print="hide"] { display: none !important; }
  main { padding: 0 !important; }
  .customer-report { max-width: none !important; }
  .customer-report [data-print="sheet"] { border: 0 !important; padding: 0 !important; background: #fff !important; }
  .customer-report [data-print="new-page"] { break-before: page; }
  .customer-report h2, .customer-report h3 { break-after: avoid; }
  .customer-report tr, .customer-report [data-print="keep"] { break-inside: avoid; }
}`;
}
