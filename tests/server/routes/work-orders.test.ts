import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { mkdtempSync, mkdirSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildWorkOrder } from "../../factories/work-orders.ts";
import { auditLog, flowVersions, workOrderStateHistory } from "../../../server/db/schema.ts";
import { installBuiltInFlows } from "../../../server/services/flows.ts";
import { BuiltInFlowError, loadBuiltInFlows } from "../../../server/flows/builtin.ts";
import type { CreateWorkOrderRequest } from "../../../shared/schemas/work-orders.ts";

let t: TestApp;
let apprentice: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  t = await createTestApp();
  await installBuiltInFlows(t.ctx.db);
  apprentice = await signedInAs(t, "apprentice");
});
afterAll(() => t.close());

const intake = (overrides: Partial<CreateWorkOrderRequest> = {}): CreateWorkOrderRequest => ({
  customer: { name: "Marla Quennell", phone: "555-0177", email: "marla@example.com" },
  unit: { equipmentKind: "string_trimmer", make: "Fernhill", model: "FT-26 Sprint", cycle: 2, displacementCc: 26, compressionRelease: "no" },
  complaint: "Pulls over, never catches",
  alreadyTried: "New plug",
  tankContents: "premix",
  ...overrides,
});

describe("built-in flows", () => {
  it("installs each flow once as version 1 with its sections inlined", async () => {
    expect(await installBuiltInFlows(t.ctx.db)).toEqual([]);
    const versions = await t.ctx.db.select().from(flowVersions);
    expect(versions.map((v) => `${v.flowId}@${v.number}`).sort()).toEqual(loadBuiltInFlows().map((f) => `${f.id}@1`).sort());
    const handheld = versions.find((v) => v.flowId === "handheld-2-stroke-no-start")!;
    expect(Object.keys(handheld.definition.sections ?? {})).toContain("spark-check");
  });

  it("refuses an invalid built-in flow with a message naming the file", () => {
    const dir = mkdtempSync(path.join(tmpdir(), "bp-flows-"));
    mkdirSync(path.join(dir, "sections"));
    writeFileSync(path.join(dir, "broken.json"), JSON.stringify({ formatVersion: 1, id: "broken", title: "Broken", start: "nowhere", appliesTo: { equipment: ["tiller"], cycle: "any" }, steps: {} }));
    expect(() => loadBuiltInFlows(dir)).toThrow(BuiltInFlowError);
    expect(() => loadBuiltInFlows(dir)).toThrow(/broken\.json is not valid/);
  });
});

describe("POST /api/work-orders", () => {
  it("creates the customer, unit and work order waiting for diagnosis, with history and audit", async () => {
    const res = await apprentice.agent.post("/api/work-orders").send(intake());
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ state: "waiting_for_diagnosis", customerName: "Marla Quennell", make: "Fernhill", tankContents: "premix", intakePhotoId: null, sessions: [] });
    expect(res.body.number).toBeGreaterThan(1000);
    expect(res.body.unit).toMatchObject({ cycle: 2, displacementCc: 26, engineModel: "", hours: null });
    const history = await t.ctx.db.select().from(workOrderStateHistory).where(eq(workOrderStateHistory.workOrderId, res.body.id));
    expect(history).toMatchObject([{ fromState: null, toState: "waiting_for_diagnosis", userId: apprentice.user.id }]);
    const audit = await t.ctx.db.select().from(auditLog).where(eq(auditLog.recordId, res.body.id));
    expect(audit.map((a) => a.action)).toEqual(["work_order.created"]);
  });

  it("answers 400 naming each field that needs attention", async () => {
    const res = await apprentice.agent
      .post("/api/work-orders")
      .send({ customer: { name: " ", email: "not-mail" }, unit: { equipmentKind: "hovercraft", make: "X", model: "Y", cycle: 3 }, complaint: "", tankContents: "water" });
    expect(res.status).toBe(400);
    expect(res.body.error.id).toBe("invalid_input");
    expect(Object.keys(res.body.error.details.fieldErrors).sort()).toEqual(["complaint", "customer", "tankContents", "unit"]);
  });
});

describe("GET /api/work-orders", () => {
  it("lists open work orders newest first and searches name, make, model and number", async () => {
    const a = await buildWorkOrder(t.ctx.db, { unit: { make: "Quillby", model: "Q-40 Ridge" } });
    const b = await buildWorkOrder(t.ctx.db, { unit: { make: "Orrin", model: "Sable 9" } });
    const done = await buildWorkOrder(t.ctx.db, { state: "picked_up", unit: { make: "Quillby" } });
    const list = await apprentice.agent.get("/api/work-orders");
    expect(list.status).toBe(200);
    const ids = list.body.workOrders.map((w: { id: string }) => w.id);
    expect(ids.indexOf(b.id)).toBeLessThan(ids.indexOf(a.id));
    expect(ids).not.toContain(done.id);
    const byMake = await apprentice.agent.get("/api/work-orders").query({ search: "quillby" });
    expect(byMake.body.workOrders.map((w: { id: string }) => w.id)).toEqual([a.id]);
    const byModel = await apprentice.agent.get("/api/work-orders").query({ search: "sable", state: "all" });
    expect(byModel.body.workOrders.map((w: { id: string }) => w.id)).toEqual([b.id]);
    const byNumber = await apprentice.agent.get("/api/work-orders").query({ search: String(b.number) });
    expect(byNumber.body.workOrders.map((w: { id: string }) => w.id)).toEqual([b.id]);
    const all = await apprentice.agent.get("/api/work-orders").query({ search: "quillby", state: "all" });
    expect(all.body.workOrders).toHaveLength(2);
    const picked = await apprentice.agent.get("/api/work-orders").query({ state: "picked_up" });
    expect(picked.body.workOrders.map((w: { id: string }) => w.id)).toContain(done.id);
    expect((await apprentice.agent.get("/api/work-orders").query({ state: "lost" })).status).toBe(400);
  });

  it("treats % and _ in a search as plain characters", async () => {
    const res = await apprentice.agent.get("/api/work-orders").query({ search: "%" });
    expect(res.body.workOrders).toEqual([]);
  });
});

describe("GET /api/work-orders/:id", () => {
  it("offers the handheld 2-stroke flow for a 2-stroke trimmer, and not the mower flow", async () => {
    const wo = await buildWorkOrder(t.ctx.db);
    const res = await apprentice.agent.get(`/api/work-orders/${wo.id}`);
    expect(res.status).toBe(200);
    const flowIds = res.body.applicableFlows.map((f: { flowId: string }) => f.flowId);
    expect(flowIds).toContain("handheld-2-stroke-no-start");
    expect(flowIds).not.toContain("walk-behind-mower-no-start");
    expect(flowIds).not.toContain("handheld-4-stroke-no-start");
  });

  it("offers the mower flow for a 4-stroke walk-behind mower", async () => {
    const wo = await buildWorkOrder(t.ctx.db, { unit: { equipmentKind: "walk_behind_mower", cycle: 4, displacementCc: 160 } });
    const res = await apprentice.agent.get(`/api/work-orders/${wo.id}`);
    expect(res.body.applicableFlows.map((f: { flowId: string }) => f.flowId)).toEqual(["walk-behind-mower-no-start"]);
  });

  it("answers 404 for an unknown work order and 400 for a malformed id", async () => {
    expect((await apprentice.agent.get("/api/work-orders/0190f0c0-0000-7000-8000-000000000001")).status).toBe(404);
    expect((await apprentice.agent.get("/api/work-orders/nope")).status).toBe(400);
  });
});
