import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { estimates } from "../../../server/db/schema.ts";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildWorkOrder } from "../../factories/work-orders.ts";
import { installBuiltInFlows } from "../../../server/services/flows.ts";
import { finishedWorkOrder, insertEstimate, seedShop, SHOP, wornRingOptions } from "./report-fixtures.ts";
import { optionTotals } from "../../../shared/calc/estimate.ts";
import { customerReportSchema, type CustomerReport } from "../../../shared/schemas/report.ts";
import { WARRANTY_STANDARD_LINE } from "../../../shared/report/safety.ts";

let t: TestApp;
let tech: Awaited<ReturnType<typeof signedInAs>>;
let finished: Awaited<ReturnType<typeof finishedWorkOrder>>;
beforeAll(async () => {
  t = await createTestApp();
  await installBuiltInFlows(t.ctx.db);
  await seedShop(t.ctx.db);
  tech = await signedInAs(t, "apprentice");
  finished = await finishedWorkOrder(t, tech.agent, { unit: { make: "Fernhill", model: "FT-25", engineSerial: "FH25-0071342" } });
});
afterAll(() => t.close());

async function report(workOrderId: string, query = ""): Promise<CustomerReport> {
  const res = await tech.agent.get(`/api/work-orders/${workOrderId}/report${query}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return customerReportSchema.parse(res.body);
}

describe("GET /api/work-orders/:id/report", () => {
  it("gives the shop, the work order, the unit as recorded and the complaint, and only the customer's name", async () => {
    const body = await report(finished.workOrder.id);
    expect(body.shop).toEqual({ name: SHOP.name, phone: SHOP.phone, email: SHOP.email, address: SHOP.address });
    expect(body.workOrder.number).toBe(finished.workOrder.number);
    expect(body.workOrder.label).toBe(`WO ${finished.workOrder.number}`);
    expect(body.workOrder.state).toBe("waiting_for_approval");
    expect(body.unit).toMatchObject({ equipmentKind: "string_trimmer", kindLabel: "String trimmer", make: "Fernhill", model: "FT-25", engineSerial: "FH25-0071342", cycle: 2, displacementCc: 25 });
    expect(body.complaint).toBe("Starts, then dies after a few seconds and has no power up a slope");
    expect(body.customer).toEqual({ name: expect.stringMatching(/^Test Customer \d+$/) });
    // The factory's customer phone number must not travel with the report.
    expect(JSON.stringify(body)).not.toContain("555-0100");
  });

  it("lists the finding of the completed check with the reading that stands, in the unit entered and in the shop's", async () => {
    const { findings } = await report(finished.workOrder.id);
    expect(findings).toHaveLength(1);
    const [finding] = findings;
    expect(finding).toMatchObject({ sessionId: finished.sessionId, stepId: "compression/worn", title: "Low compression: worn rings or cylinder", certainty: "likely", flowTitle: expect.any(String) });
    expect(finding!.repairs.map((r) => r.title)).toEqual(["Top-end overhaul: piston, rings and gaskets", "Replace the short block"]);
    // The 900 psi the gauge cannot give was taken again: only the second reading stands.
    expect(finding!.readings).toHaveLength(1);
    const [reading] = finding!.readings;
    expect(reading!.entered).toEqual({ value: 430, unit: "kPa", unitLabel: "kPa" });
    // Source: NIST SP 811 (2008) B.8, 1 psi = 6.894 757 kPa; 430 / 6.894757 = 62.366 → 62.37 psi to four figures.
    expect(reading!.converted).toEqual({ value: 62.37, unit: "psi", unitLabel: "psi" });
    // Common practice (no published source): a handheld 2-stroke under about 80 psi is low.
    expect(reading!.verdict).toBe("low");
    expect(reading!.verdictLabel).toBe("Low");
  });

  it("has no findings and no estimate for a work order not yet checked", async () => {
    const wo = await buildWorkOrder(t.ctx.db);
    const body = await report(wo.id);
    expect(body.findings).toEqual([]);
    expect(body.estimate).toBeNull();
  });

  it("prices the latest revision that is not superseded with the shared arithmetic, or the revision asked for", async () => {
    const { workOrder } = await finishedWorkOrder(t, tech.agent);
    const old = await insertEstimate(t.ctx.db, workOrder.id, [wornRingOptions[1]!], { revision: 1, status: "superseded" });
    const current = await insertEstimate(t.ctx.db, workOrder.id, wornRingOptions, { revision: 2, revisesId: old.estimate.id });

    const body = await report(workOrder.id);
    expect(body.estimate).toMatchObject({ id: current.estimate.id, revision: 2, status: "sent", decision: "open", currency: "USD", validUntil: "2026-12-20T15:00:00.000Z" });
    const rates = current.estimate;
    for (const [i, option] of body.estimate!.options.entries()) {
      const expected = optionTotals(rates, wornRingOptions[i]!);
      expect(option.totalCents).toBe(expected.totalCents);
      expect(option.taxCents).toBe(expected.taxCents);
      expect(option.lines).toEqual(expected.lines);
    }
    // Hand-worked, option 1: parts 64.50 + 12.95 = 77.45; labour 3 h × 85.00 = 255.00; the 45.00 diagnostic
    // fee is charged and credited; subtotal 332.45; tax 7.25 % on the parts only: 77.45 × 0.0725 = 5.615 → 5.62;
    // total 338.07.
    // Common practice (no published source): tax on separately stated parts, rounded half up to the cent.
    expect(body.estimate!.options[0]).toMatchObject({ partsCents: 7745, labourCents: 25500, diagnosticFeeCents: 4500, diagnosticCreditCents: 4500, subtotalCents: 33245, taxCents: 562, totalCents: 33807 });

    const asked = await report(workOrder.id, `?estimateId=${old.estimate.id}`);
    expect(asked.estimate).toMatchObject({ id: old.estimate.id, revision: 1, status: "superseded" });
    expect(asked.estimate!.options.map((o) => o.title)).toEqual(["Replace the short block"]);
  });

  it("says which option the customer approved", async () => {
    const { workOrder } = await finishedWorkOrder(t, tech.agent);
    const { estimate, optionIds } = await insertEstimate(t.ctx.db, workOrder.id, wornRingOptions, { status: "approved", decidedAt: new Date("2026-11-21T10:00:00Z") });
    await t.ctx.db.update(estimates).set({ approvedOptionId: optionIds[1]! }).where(eq(estimates.id, estimate.id));
    const body = await report(workOrder.id);
    expect(body.estimate).toMatchObject({ id: estimate.id, decision: "approved", approvedOptionId: optionIds[1], decisionText: "You approved option 2: Replace the short block." });
    expect(body.estimate!.options.map((o) => o.approved)).toEqual([false, true]);
  });

  it("carries the safety notes with their signal words and the warranty lines", async () => {
    const body = await report(finished.workOrder.id);
    // Source: ANSI Z535.4 signal words; fuel fire is a WARNING, a cutting attachment a CAUTION.
    expect(body.safety.notes.map((n) => n.signal)).toEqual(["WARNING", "CAUTION"]);
    for (const note of body.safety.notes) expect(note.text).toMatch(/manufacturer's manual/);
    expect(body.safety.intro).toMatch(/manufacturer's operator's manual/);
    expect(body.warranty).toEqual({ shopNote: SHOP.warrantyNote, standardLine: WARRANTY_STANDARD_LINE });
  });

  it("adds the carbon monoxide DANGER for a generator", async () => {
    const wo = await buildWorkOrder(t.ctx.db, { unit: { equipmentKind: "generator", make: "Brookmere", model: "G-2200", cycle: 4, displacementCc: 80 } });
    const body = await report(wo.id);
    expect(body.safety.notes.map((n) => n.signal)).toEqual(["DANGER", "WARNING"]);
    expect(body.safety.notes[0]!.text).toMatch(/carbon monoxide/i);
  });

  it("refuses a bad estimate id, another work order's estimate and an unknown work order", async () => {
    const bad = await tech.agent.get(`/api/work-orders/${finished.workOrder.id}/report?estimateId=latest`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.fieldErrors.estimateId).toEqual(["estimateId is not a valid id"]);

    const other = await finishedWorkOrder(t, tech.agent);
    const { estimate } = await insertEstimate(t.ctx.db, other.workOrder.id, wornRingOptions);
    const foreign = await tech.agent.get(`/api/work-orders/${finished.workOrder.id}/report?estimateId=${estimate.id}`);
    expect(foreign.status).toBe(404);

    const missing = await tech.agent.get("/api/work-orders/0190f0c0-0000-7000-8000-000000000000/report");
    expect(missing.status).toBe(404);
  });
});
