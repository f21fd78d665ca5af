import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { seedDemo } from "../../../server/db/seed/demo.ts";
import { auditLog, estimates, shopSettings } from "../../../server/db/schema.ts";
import { installBuiltInFlows } from "../../../server/services/flows.ts";
import { buildWorkOrder } from "../../factories/work-orders.ts";
import { pricedCarbOptions, workOrderWithFinding } from "./helpers.ts";
import type { EstimateView } from "../../../shared/schemas/estimates.ts";

let t: TestApp;
let tech: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  t = await createTestApp();
  // The demo shop's rates: labour 85.00 an hour, a 45.00 diagnostic fee credited to the repair, 7.25 % tax on parts only.
  await seedDemo(t.ctx.db);
  await installBuiltInFlows(t.ctx.db);
  tech = await signedInAs(t, "apprentice");
});
afterAll(() => t.close());

async function draftFor(workOrderId: string): Promise<EstimateView> {
  const res = await tech.agent.post("/api/estimates").send({ workOrderId });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as EstimateView;
}

describe("a draft from the finding", () => {
  it("puts one option per recommended repair, its parts as unpriced lines, with the shop's rates copied in", async () => {
    const { wo } = await workOrderWithFinding(t.ctx.db);
    const draft = await draftFor(wo.id);
    expect(draft).toMatchObject({ status: "draft", revision: 1, revisesId: null, findingTitle: expect.any(String), currency: "USD", replaceThresholdPercent: 50 });
    expect(draft.rates).toEqual({ labourRateCents: 8500, diagnosticFeeCents: 4500, creditDiagnosticFee: true, taxRateBasisPoints: 725, taxLabour: false });
    // Source: flows/sections/fuel-delivery.json, the finding "carb-varnish" and its two repairs.
    expect(draft.options.map((o) => [o.title, o.labourHours])).toEqual([
      ["Clean and rebuild the carburettor", 1.5],
      ["Replace the carburettor", 0.8],
    ]);
    expect(draft.options[0]!.parts).toEqual([
      { partNumber: "", description: "carburettor rebuild kit", quantity: 1, unitPriceCents: 0 },
      { partNumber: "", description: "fuel filter", quantity: 1, unitPriceCents: 0 },
    ]);
    expect(draft.options[0]!.repairOrReplace).toBeNull();

    // The rates stay as written when the shop changes its settings.
    await t.ctx.db.update(shopSettings).set({ labourRateCents: 9900 });
    const again = await tech.agent.get(`/api/estimates/${draft.id}`).expect(200);
    expect(again.body.rates.labourRateCents).toBe(8500);
    await t.ctx.db.update(shopSettings).set({ labourRateCents: 8500 });

    const second = await tech.agent.post("/api/estimates").send({ workOrderId: wo.id });
    expect(second.status).toBe(409);
    expect(second.body.error).toMatchObject({ id: "estimate_exists", details: { estimateId: draft.id } });
  });

  it("refuses a work order without a finished check with a finding", async () => {
    const wo = await buildWorkOrder(t.ctx.db);
    const res = await tech.agent.post("/api/estimates").send({ workOrderId: wo.id });
    expect(res.status).toBe(422);
    expect(res.body.error.id).toBe("no_finding");
    expect(await t.ctx.db.select().from(estimates).where(eq(estimates.workOrderId, wo.id))).toEqual([]);
  });
});

describe("pricing the options", () => {
  it("totals each option with the shared arithmetic, hand-worked here", async () => {
    const { wo } = await workOrderWithFinding(t.ctx.db);
    const draft = await draftFor(wo.id);
    const res = await tech.agent
      .put(`/api/estimates/${draft.id}`)
      .send({ options: pricedCarbOptions(draft.options.map((o) => o.id)), note: "Old fuel varnished the carburettor.", replacementPriceCents: 30000 });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const [rebuild, replace] = (res.body as EstimateView).options;
    // The options keep their ids across a save.
    expect([rebuild!.id, replace!.id]).toEqual(draft.options.map((o) => o.id));

    // Rebuild: parts 24.95 + 2 × 6.50 = 37.95; labour 1.5 h × 85.00 = 127.50; fee 45.00 charged and 45.00 credited;
    // subtotal 37.95 + 127.50 + 45.00 − 45.00 = 165.45; tax 7.25 % of the parts only: 37.95 × 0.0725 = 2.751375 → 2.75;
    // total 165.45 + 2.75 = 168.20.
    // Common practice (no published source): tax on separately stated parts only, rounded once, half away from zero.
    // Common practice (no published source): the diagnostic fee is often credited toward an approved repair.
    expect(rebuild!.totals).toEqual({ partsCents: 3795, labourCents: 12750, diagnosticFeeCents: 4500, diagnosticCreditCents: 4500, subtotalCents: 16545, taxCents: 275, totalCents: 16820 });
    // Replace: parts 38.99 + 3.49 + 6.50 = 48.98; labour 0.8 h × 85.00 = 68.00; fee and credit cancel;
    // subtotal 116.98; tax 48.98 × 0.0725 = 3.55105 → 3.55; total 120.53.
    expect(replace!.totals).toEqual({ partsCents: 4898, labourCents: 6800, diagnosticFeeCents: 4500, diagnosticCreditCents: 4500, subtotalCents: 11698, taxCents: 355, totalCents: 12053 });

    // Against a new unit at 300.00: 168.20 / 300.00 = 56.07 % (shown to the tenth, cut down: 56.0), at or above 50 %;
    // 120.53 / 300.00 = 40.18 % → 40.1, under it.
    // Common practice (consumer advice, no published source): replace when the repair is 50 % or more of a new unit.
    expect(rebuild!.repairOrReplace).toEqual({ recommendation: "consider_replacing", sentence: "The repair ($168.20) is 56.0 % of a new unit ($300.00): at or above the 50 % line, so consider replacing it." });
    expect(replace!.repairOrReplace).toEqual({ recommendation: "repair", sentence: "The repair ($120.53) is 40.1 % of a new unit ($300.00): under the 50 % line, so repair it." });
  });

  it("rounds a part sold by the metre to the cent, half away from zero", async () => {
    const { wo } = await workOrderWithFinding(t.ctx.db);
    const draft = await draftFor(wo.id);
    const res = await tech.agent
      .put(`/api/estimates/${draft.id}`)
      .send({ options: [{ title: "Replace the fuel line", labourHours: 0.25, parts: [{ partNumber: "", description: "fuel line", quantity: 1.25, unitPriceCents: 399 }] }], replacementPriceCents: null });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    // 1.25 m × 3.99 = 4.9875 → 4.99; labour 0.25 h × 85.00 = 21.25; fee and credit cancel; subtotal 26.24;
    // tax 4.99 × 0.0725 = 0.361775 → 0.36; total 26.60.
    // Common practice (no published source): each line is rounded to the cent before it is added up.
    expect(res.body.options[0].totals).toMatchObject({ partsCents: 499, labourCents: 2125, subtotalCents: 2624, taxCents: 36, totalCents: 2660 });
    expect(res.body.options[0].repairOrReplace).toBeNull();
  });

  it("names each wrong field and keeps the draft as it was", async () => {
    const { wo } = await workOrderWithFinding(t.ctx.db);
    const draft = await draftFor(wo.id);
    const bad = await tech.agent.put(`/api/estimates/${draft.id}`).send({
      options: [{ title: "", labourHours: -1, parts: [{ partNumber: "", description: "fuel filter", quantity: -2, unitPriceCents: -650 }] }],
      replacementPriceCents: 0,
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.id).toBe("invalid_input");
    const messages = JSON.stringify(bad.body.error.details);
    for (const message of ["The quantity must be above zero.", "The price cannot be negative.", "Labour hours cannot be negative.", "Name the option", "The price of a new unit must be above zero, or left empty."]) {
      expect(messages).toContain(message);
    }
    const kept = await tech.agent.get(`/api/estimates/${draft.id}`).expect(200);
    expect(kept.body.options).toEqual(draft.options);
    const empty = await tech.agent.put(`/api/estimates/${draft.id}`).send({ options: [] });
    expect(empty.status).toBe(400);
    expect(empty.body.error.details.fieldErrors.options).toEqual(["An estimate needs at least one option."]);
  });
});

describe("a sent estimate is frozen", () => {
  it("refuses edits with 409 and offers a revision that supersedes it once sent", async () => {
    const { wo } = await workOrderWithFinding(t.ctx.db, undefined, "frozen@example.com");
    const draft = await draftFor(wo.id);
    await tech.agent.put(`/api/estimates/${draft.id}`).send({ options: pricedCarbOptions(draft.options.map((o) => o.id)) }).expect(200);
    const sent = await tech.agent.post(`/api/estimates/${draft.id}/send`).send({ to: "frozen@example.com" });
    expect(sent.status, JSON.stringify(sent.body)).toBe(200);
    expect(sent.body.estimate.status).toBe("sent");

    const edit = await tech.agent.put(`/api/estimates/${draft.id}`).send({ options: pricedCarbOptions([]), note: "changed" });
    expect(edit.status).toBe(409);
    expect(edit.body.error.id).toBe("estimate_frozen");
    expect(edit.body.error.message).toMatch(/^It was sent on \d{4}-\d{2}-\d{2} and can no longer be changed\. Revise it/);
    expect((await tech.agent.get(`/api/estimates/${draft.id}`)).body.note).toBe("");

    const revised = await tech.agent.post(`/api/estimates/${draft.id}/revise`);
    expect(revised.status, JSON.stringify(revised.body)).toBe(201);
    expect(revised.body).toMatchObject({ status: "draft", revision: 2, revisesId: draft.id, sentAt: null });
    expect(revised.body.options.map((o: { totals: { totalCents: number } }) => o.totals.totalCents)).toEqual([16820, 12053]);
    expect((await tech.agent.post(`/api/estimates/${draft.id}/revise`)).body.error).toMatchObject({ id: "estimate_draft_exists", details: { estimateId: revised.body.id } });
    // Until the revision goes out, the customer still has revision 1.
    expect((await tech.agent.get(`/api/estimates/${draft.id}`)).body.status).toBe("sent");

    const options = revised.body.options.map((o: { id: string; title: string; labourHours: number; parts: unknown[] }) => ({ id: o.id, title: o.title, labourHours: o.labourHours, parts: o.parts }));
    await tech.agent.put(`/api/estimates/${revised.body.id}`).send({ options: [options[0]], note: "Rebuild only, as agreed on the phone." }).expect(200);
    await tech.agent.post(`/api/estimates/${revised.body.id}/send`).send({ to: "frozen@example.com" }).expect(200);
    const list = await tech.agent.get(`/api/estimates?workOrderId=${wo.id}`).expect(200);
    expect(list.body.estimates.map((e: EstimateView) => [e.revision, e.status])).toEqual([
      [2, "sent"],
      [1, "superseded"],
    ]);
    expect((await tech.agent.post(`/api/estimates/${draft.id}/revise`)).status).toBe(409);

    const actions = (await t.ctx.db.select().from(auditLog)).filter((a) => a.recordId === draft.id || a.recordId === revised.body.id).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(["estimate.created", "estimate.updated", "estimate.sent", "estimate.revised"]));
  });
});
