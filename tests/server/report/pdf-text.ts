// Reading a PDF back as the customer's viewer would: its pages, their sizes and their text.
import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";

export interface PdfPage {
  /** Width and height in points. */
  size: [number, number];
  /** The page's text, runs joined by single spaces. */
  text: string;
}

export async function readPdf(bytes: Buffer | Uint8Array): Promise<PdfPage[]> {
  const doc = await getDocument({ data: new Uint8Array(bytes), verbosity: 0, isEvalSupported: false, useSystemFonts: false }).promise;
  try {
    const pages: PdfPage[] = [];
    for (let n = 1; n <= doc.numPages; n++) {
      const page = await doc.getPage(n);
      const [x0, y0, x1, y1] = page.view as [number, number, number, number];
      const content = await page.getTextContent();
      const text = content.items
        .map((item) => ("str" in item ? item.str : ""))
        .join(" ")
        .replace(/\s+/g, " ")
        .trim();
      pages.push({ size: [Math.round((x1 - x0) * 100) / 100, Math.round((y1 - y0) * 100) / 100], text });
    }
    return pages;
  } finally {
    await doc.destroy();
  }
}
