import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { installBuiltInFlows } from "../../../server/services/flows.ts";
import { customerReportAttachment, renderCustomerReportPdf } from "../../../server/pdf/customer-report-pdf.tsx";
import { optionTotals } from "../../../shared/calc/estimate.ts";
import { formatMoney } from "../../../shared/calc/money.ts";
import { finishedWorkOrder, insertEstimate, seedShop, SHOP, wornRingOptions } from "./report-fixtures.ts";
import { readPdf, type PdfPage } from "./pdf-text.ts";

let t: TestApp;
let tech: Awaited<ReturnType<typeof signedInAs>>;
let finished: Awaited<ReturnType<typeof finishedWorkOrder>>;
let estimate: Awaited<ReturnType<typeof insertEstimate>>["estimate"];
let pages: PdfPage[];
beforeAll(async () => {
  t = await createTestApp();
  await installBuiltInFlows(t.ctx.db);
  await seedShop(t.ctx.db);
  tech = await signedInAs(t, "apprentice");
  finished = await finishedWorkOrder(t, tech.agent, { unit: { make: "Fernhill", model: "FT-25", engineSerial: "FH25-0071342" } });
  estimate = (await insertEstimate(t.ctx.db, finished.workOrder.id, wornRingOptions)).estimate;
  const res = await tech.agent.get(`/api/work-orders/${finished.workOrder.id}/report.pdf`).buffer(true);
  expect(res.status).toBe(200);
  expect(Buffer.isBuffer(res.body)).toBe(true);
  pages = await readPdf(res.body as Buffer);
});
afterAll(() => t.close());

const pageWith = (text: string) => pages.findIndex((p) => p.text.includes(text));

describe("GET /api/work-orders/:id/report.pdf", () => {
  it("answers a PDF shown inline, named after the work order", async () => {
    const res = await tech.agent.get(`/api/work-orders/${finished.workOrder.id}/report.pdf?paper=letter`).buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("application/pdf");
    expect(res.headers["content-disposition"]).toBe(`inline; filename="customer-report-wo-${finished.workOrder.number}.pdf"`);
    expect((res.body as Buffer).subarray(0, 5).toString("latin1")).toBe("%PDF-");
  });

  it("opens with the shop, the work-order number, the unit and the complaint, and numbers every page", () => {
    expect(pages.length).toBeGreaterThanOrEqual(2);
    const first = pages[0]!.text;
    expect(first).toContain(SHOP.name);
    expect(first).toContain(SHOP.phone);
    expect(first).toContain(`WO ${finished.workOrder.number}`);
    expect(first).toContain("Fernhill FT-25 string trimmer");
    expect(first).toContain("FH25-0071342");
    expect(first).toContain("Starts, then dies after a few seconds and has no power up a slope");
    pages.forEach((page, i) => expect(page.text).toContain(`Page ${i + 1} of ${pages.length}`));
  });

  it("shows the finding with its standing reading in both units", () => {
    const findings = pageWith("Low compression: worn rings or cylinder");
    expect(findings).toBeGreaterThanOrEqual(0);
    const text = pages[findings]!.text;
    // Source: NIST SP 811 (2008) B.8, 430 kPa / 6.894757 = 62.37 psi.
    expect(text).toContain("430 kPa (62.37 psi)");
    expect(text).toContain("Low");
    expect(text).not.toContain("900 psi");
  });

  it("prints each option's total as the shared arithmetic gives it", () => {
    const at = pageWith("Estimate, revision 1");
    expect(at).toBeGreaterThan(0);
    const text = pages.slice(at).map((p) => p.text).join(" ");
    for (const option of wornRingOptions) expect(text).toContain(formatMoney(optionTotals(estimate, option).totalCents, "USD"));
    // Hand-worked: 77.45 parts + 255.00 labour + 45.00 fee − 45.00 credit + 5.62 tax (7.25 % of 77.45, rounded half up) = 338.07.
    // Common practice (no published source): tax on separately stated parts only.
    expect(text).toContain("$338.07");
    expect(text).toContain("KC-PR-25 Piston and ring kit");
    expect(text).toContain("Valid until December 20, 2026");
  });

  it("carries the safety signal words, the deferral to the manufacturer and the warranty lines", () => {
    const all = pages.map((p) => p.text).join(" ");
    // Source: ANSI Z535.4 signal words.
    expect(all).toContain("WARNING");
    expect(all).toContain("CAUTION");
    expect(all).toContain("Read and follow the manufacturer's operator's manual");
    expect(all).toContain(SHOP.warrantyNote);
    expect(all).toContain("The manufacturer's warranty terms and your rights under local consumer law prevail");
  });

  it("sets A4 by default and Letter when asked", async () => {
    const a4 = await readPdf(await renderCustomerReportPdf(t.ctx, finished.workOrder.id));
    const letter = await readPdf(await renderCustomerReportPdf(t.ctx, finished.workOrder.id, undefined, "letter"));
    // Source: ISO 216 A4 210x297 mm; ANSI/ASME Y14.1 Letter 8.5x11 in (72 pt to the inch).
    for (const page of a4) expect(page.size).toEqual([595.28, 841.89]);
    for (const page of letter) expect(page.size).toEqual([612, 792]);
  });

  it("runs a long estimate over several pages", async () => {
    const { workOrder } = await finishedWorkOrder(t, tech.agent);
    const parts = Array.from({ length: 60 }, (_, i) => ({ partNumber: `KC-${1000 + i}`, description: `Invented part ${i + 1}`, quantity: 1, unitPriceCents: 100 + i }));
    await insertEstimate(t.ctx.db, workOrder.id, [{ title: "Everything at once", labourHours: 1, parts }]);
    const long = await readPdf(await renderCustomerReportPdf(t.ctx, workOrder.id));
    expect(long.length).toBeGreaterThanOrEqual(3);
    long.forEach((page, i) => expect(page.text).toContain(`Page ${i + 1} of ${long.length}`));
    const all = long.map((p) => p.text).join(" ");
    expect(all).toContain("KC-1000 Invented part 1");
    expect(all).toContain("KC-1059 Invented part 60");
  });

  it("refuses paper it does not know", async () => {
    const res = await tech.agent.get(`/api/work-orders/${finished.workOrder.id}/report.pdf?paper=a5`);
    expect(res.status).toBe(400);
    expect(res.body.error.details.fieldErrors.paper).toEqual(['paper is "a4" or "letter"']);
  });
});

describe("customerReportAttachment", () => {
  it("gives the estimate's report as a named PDF for the e-mail", async () => {
    const attachment = await customerReportAttachment(t.ctx, { id: estimate.id, workOrderId: finished.workOrder.id });
    expect(attachment.filename).toBe(`customer-report-wo-${finished.workOrder.number}-estimate-1.pdf`);
    expect(attachment.contentType).toBe("application/pdf");
    const text = (await readPdf(attachment.content)).map((p) => p.text).join(" ");
    expect(text).toContain("Estimate, revision 1");
  });

  it("refuses an estimate of another work order", async () => {
    await expect(customerReportAttachment(t.ctx, { id: estimate.id, workOrderId: "0190f0c0-0000-7000-8000-000000000000" })).rejects.toMatchObject({ status: 404 });
  });
});
