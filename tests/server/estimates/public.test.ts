import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { createTestApp, HOST, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { seedDemo } from "../../../server/db/seed/demo.ts";
import { auditLog, estimateLinks, estimates, workOrders, workOrderStateHistory } from "../../../server/db/schema.ts";
import { installBuiltInFlows } from "../../../server/services/flows.ts";
import { lastMailTo, linkToken, pricedCarbOptions, workOrderWithFinding } from "./helpers.ts";
import type { EstimateView, PublicEstimate } from "../../../shared/schemas/estimates.ts";

let t: TestApp;
let tech: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  t = await createTestApp();
  await seedDemo(t.ctx.db);
  await installBuiltInFlows(t.ctx.db);
  tech = await signedInAs(t, "apprentice");
});
afterAll(() => t.close());

let mailbox = 0;
/** A priced two-option estimate sent to a new address; answers the estimate and the customer's token. */
async function sentEstimate() {
  mailbox += 1;
  const to = `customer.${mailbox}@example.com`;
  const { wo } = await workOrderWithFinding(t.ctx.db, undefined, to);
  const draft = (await tech.agent.post("/api/estimates").send({ workOrderId: wo.id }).expect(201)).body as EstimateView;
  await tech.agent.put(`/api/estimates/${draft.id}`).send({ options: pricedCarbOptions(draft.options.map((o) => o.id)), note: "Parts in stock.", replacementPriceCents: 30000 }).expect(200);
  const sent = await tech.agent.post(`/api/estimates/${draft.id}/send`).send({ to }).expect(200);
  expect(sent.body.mail.status).toBe("sent");
  return { estimate: sent.body.estimate as EstimateView, token: linkToken((await lastMailTo(t.ctx.db, to))!.textBody), workOrderId: wo.id };
}

/** The anonymous customer's browser: our Host and Origin, no cookie. */
const customer = () => t.agent();

async function snapshot(estimateId: string, workOrderId: string) {
  return {
    estimate: (await t.ctx.db.select().from(estimates).where(eq(estimates.id, estimateId)))[0],
    links: await t.ctx.db.select().from(estimateLinks).where(eq(estimateLinks.estimateId, estimateId)),
    workOrder: (await t.ctx.db.select().from(workOrders).where(eq(workOrders.id, workOrderId)))[0],
    history: await t.ctx.db.select().from(workOrderStateHistory).where(eq(workOrderStateHistory.workOrderId, workOrderId)),
  };
}

describe("the customer's page", () => {
  it("shows the shop, the unit and each option with its lines and total, and nothing internal", async () => {
    const { token, estimate } = await sentEstimate();
    const res = await customer().get(`/api/public/estimates/${token}`);
    expect(res.status).toBe(200);
    expect(res.headers["cache-control"]).toBe("no-store");
    const view = res.body as PublicEstimate;
    expect(view.shop).toEqual({ name: "Kettle Creek Mower & Saw", phone: "555-0142", email: "desk@kettlecreek.example", address: "14 Mill Race Road, Kettle Creek" });
    expect(view.unit).toEqual({ equipmentKind: "string_trimmer", make: "Fernhill", model: "FT-25" });
    expect(view.options.map((o) => [o.id, o.title, o.totals.totalCents])).toEqual([
      [estimate.options[0]!.id, "Clean and rebuild the carburettor", 16820],
      [estimate.options[1]!.id, "Replace the carburettor", 12053],
    ]);
    expect(view.options[0]!.lines.map((l) => [l.description, l.amountCents])).toEqual([
      ["KC-RK-118 carburettor rebuild kit", 2495],
      ["KC-FF-02 fuel filter", 1300],
      ["Labour", 12750],
      ["Diagnostic fee", 4500],
      ["Diagnostic fee credited to the repair", -4500],
    ]);
    expect(view.validUntil).toBe(estimate.validUntil);
    const text = JSON.stringify(view);
    for (const internal of [tech.user.id, tech.user.name, estimate.id, estimate.workOrderId, "customer.", "sentBy", "createdBy", "tokenHash"]) expect(text).not.toContain(internal);
  });

  it("answers 404 for a link it does not know, well formed or not", async () => {
    const unknown = await customer().get(`/api/public/estimates/${"A".repeat(43)}`);
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.message).toMatch(/not one we know/);
    expect((await customer().get("/api/public/estimates/short")).status).toBe(404);
    expect((await customer().post(`/api/public/estimates/${"B".repeat(43)}/decision`).send({ decision: "decline" })).status).toBe(404);
  });
});

describe("the customer's answer", () => {
  it("approves one option in one go: the estimate, the link, the work order and the audit; a second answer is 410 and changes nothing", async () => {
    const { token, estimate, workOrderId } = await sentEstimate();
    const chosen = estimate.options[1]!;
    const res = await customer().post(`/api/public/estimates/${token}/decision`).send({ decision: "approve", optionId: chosen.id });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toEqual({ decision: "approved", optionTitle: "Replace the carburettor", shopName: "Kettle Creek Mower & Saw", shopPhone: "555-0142" });

    const after = await snapshot(estimate.id, workOrderId);
    expect(after.estimate).toMatchObject({ status: "approved", approvedOptionId: chosen.id });
    expect(after.estimate!.decidedAt).toBeInstanceOf(Date);
    expect(after.links[0]!.usedAt).toBeInstanceOf(Date);
    expect(after.workOrder!.state).toBe("approved");
    expect(after.history.at(-1)).toMatchObject({ fromState: "waiting_for_approval", toState: "approved", userId: tech.user.id });
    const audit = (await t.ctx.db.select().from(auditLog)).filter((a) => a.recordId === estimate.id && a.action === "estimate.approved");
    expect(audit).toHaveLength(1);
    expect(audit[0]).toMatchObject({ userId: tech.user.id, details: { decidedBy: "customer_link", optionId: chosen.id, workOrderTo: "approved" } });

    const again = await customer().post(`/api/public/estimates/${token}/decision`).send({ decision: "decline", comment: "Changed my mind" });
    expect(again.status).toBe(410);
    expect(again.body.error).toMatchObject({ id: "link_used", message: expect.stringMatching(/already been answered/) });
    expect((await customer().get(`/api/public/estimates/${token}`)).status).toBe(410);
    expect(await snapshot(estimate.id, workOrderId)).toEqual(after);

    const shop = await tech.agent.get(`/api/estimates/${estimate.id}`).expect(200);
    expect(shop.body).toMatchObject({ status: "approved", approvedOptionId: chosen.id });
  });

  it("declines with the customer's comment and moves the work order to declined", async () => {
    const { token, estimate, workOrderId } = await sentEstimate();
    const res = await customer().post(`/api/public/estimates/${token}/decision`).send({ decision: "decline", comment: "  I will buy a new one.  " });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ decision: "declined", optionTitle: null });
    const after = await snapshot(estimate.id, workOrderId);
    expect(after.estimate).toMatchObject({ status: "declined", approvedOptionId: null, customerComment: "I will buy a new one." });
    expect(after.workOrder!.state).toBe("declined");
    // A declined estimate can be revised and sent again.
    expect((await tech.agent.post(`/api/estimates/${estimate.id}/revise`)).status).toBe(201);
  });

  it("refuses an option of another estimate, and a body that is neither answer, changing nothing", async () => {
    const { token, estimate, workOrderId } = await sentEstimate();
    const other = await sentEstimate();
    const before = await snapshot(estimate.id, workOrderId);
    const wrong = await customer().post(`/api/public/estimates/${token}/decision`).send({ decision: "approve", optionId: other.estimate.options[0]!.id });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.id).toBe("unknown_option");
    const nonsense = await customer().post(`/api/public/estimates/${token}/decision`).send({ decision: "maybe" });
    expect(nonsense.status).toBe(400);
    expect(await snapshot(estimate.id, workOrderId)).toEqual(before);
  });

  it("answers 410 for an expired link and changes nothing", async () => {
    const { token, estimate, workOrderId } = await sentEstimate();
    await t.ctx.db.update(estimateLinks).set({ expiresAt: new Date(Date.now() - 60_000) }).where(eq(estimateLinks.estimateId, estimate.id));
    const before = await snapshot(estimate.id, workOrderId);
    const view = await customer().get(`/api/public/estimates/${token}`);
    expect(view.status).toBe(410);
    expect(view.body.error).toMatchObject({ id: "link_expired", message: expect.stringMatching(/has passed\. Ask the shop for a new one\./) });
    const res = await customer().post(`/api/public/estimates/${token}/decision`).send({ decision: "approve", optionId: estimate.options[0]!.id });
    expect(res.status).toBe(410);
    expect(await snapshot(estimate.id, workOrderId)).toEqual(before);
  });

  it("takes the answer from a same-origin page, and refuses one from another site or with no Origin", async () => {
    const { token, estimate } = await sentEstimate();
    const foreign = await customer().post(`/api/public/estimates/${token}/decision`).set("Origin", "http://elsewhere.example").send({ decision: "decline" });
    expect(foreign.status).toBe(403);
    const request = (await import("supertest")).default;
    const bare = await request(t.app).post(`/api/public/estimates/${token}/decision`).set("Host", HOST).send({ decision: "decline" });
    expect(bare.status).toBe(403);
    expect((await t.ctx.db.select().from(estimates).where(eq(estimates.id, estimate.id)))[0]!.status).toBe("sent");
    expect((await customer().post(`/api/public/estimates/${token}/decision`).send({ decision: "decline" })).status).toBe(200);
  });
});
