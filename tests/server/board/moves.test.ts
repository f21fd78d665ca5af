import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, desc, eq } from "drizzle-orm";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildWorkOrder } from "../../factories/work-orders.ts";
import { auditLog, workOrders, workOrderStateHistory, workOrderTestRuns } from "../../../server/db/schema.ts";
import type { BoardResponse, MoveWorkOrderResponse } from "../../../shared/schemas/board.ts";
import type { WorkOrderDetail, WorkOrderState } from "../../../shared/schemas/work-orders.ts";

let t: TestApp;
let lead: Awaited<ReturnType<typeof signedInAs>>;
let apprentice: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  t = await createTestApp();
  lead = await signedInAs(t, "shop_lead");
  apprentice = await signedInAs(t, "apprentice");
});
afterAll(() => t.close());

const allPass = { throttleReturns: true, stopSwitchStops: true, steadyIdle: true, attachmentStillAtIdle: true, runsUnderLoad: true };
const move = (agent: typeof lead.agent, id: string, expectedFrom: WorkOrderState, to: WorkOrderState) => agent.post(`/api/work-orders/${id}/moves`).send({ to, expectedFrom });

describe("POST /api/work-orders/:id/moves", () => {
  it("moves an allowed step and records who moved it and when, in the history and the audit", async () => {
    const wo = await buildWorkOrder(t.ctx.db, { state: "waiting_for_approval" });
    const before = Date.now();
    const res = await move(apprentice.agent, wo.id, "waiting_for_approval", "approved");
    expect(res.status).toBe(200);
    const body = res.body as MoveWorkOrderResponse;
    expect(body).toMatchObject({ id: wo.id, from: "waiting_for_approval", state: "approved", movedBy: { id: apprentice.user.id, name: apprentice.user.name } });
    expect(Date.parse(body.movedAt)).toBeGreaterThanOrEqual(before - 1000);

    const [row] = await t.ctx.db.select().from(workOrders).where(eq(workOrders.id, wo.id));
    expect(row!.state).toBe("approved");
    const [last] = await t.ctx.db.select().from(workOrderStateHistory).where(eq(workOrderStateHistory.workOrderId, wo.id)).orderBy(desc(workOrderStateHistory.at)).limit(1);
    expect(last).toMatchObject({ fromState: "waiting_for_approval", toState: "approved", userId: apprentice.user.id });
    expect(last!.at.toISOString()).toBe(body.movedAt);
    const audits = await t.ctx.db.select().from(auditLog).where(and(eq(auditLog.recordId, wo.id), eq(auditLog.action, "work_order.moved")));
    expect(audits).toHaveLength(1);
    expect(audits[0]).toMatchObject({ userId: apprentice.user.id, details: { from: "waiting_for_approval", to: "approved", number: wo.number } });
  });

  it("refuses a move the board does not allow with 409 naming where it can go, and changes nothing", async () => {
    const wo = await buildWorkOrder(t.ctx.db, { state: "waiting_for_diagnosis" });
    const res = await move(lead.agent, wo.id, "waiting_for_diagnosis", "in_repair");
    expect(res.status).toBe(409);
    expect(res.body.error.id).toBe("move_not_allowed");
    expect(res.body.error.message).toBe("A work order that is waiting for diagnosis cannot go to in repair. From here it can go to diagnosing.");
    const [row] = await t.ctx.db.select().from(workOrders).where(eq(workOrders.id, wo.id));
    expect(row!.state).toBe("waiting_for_diagnosis");
    expect(await t.ctx.db.select().from(workOrderStateHistory).where(eq(workOrderStateHistory.workOrderId, wo.id))).toHaveLength(1);
  });

  it("refuses any move out of picked up", async () => {
    const wo = await buildWorkOrder(t.ctx.db, { state: "picked_up" });
    const res = await move(lead.agent, wo.id, "picked_up", "in_repair");
    expect(res.status).toBe(409);
    expect(res.body.error.message).toContain("a comeback is checked in as a new work order");
  });

  it("answers 409 work_order_moved when the ticket moved since the mover looked", async () => {
    const wo = await buildWorkOrder(t.ctx.db, { state: "waiting_for_approval" });
    expect((await move(lead.agent, wo.id, "waiting_for_approval", "declined")).status).toBe(200);
    // The apprentice's tablet still shows it waiting for approval.
    const stale = await move(apprentice.agent, wo.id, "waiting_for_approval", "approved");
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ id: "work_order_moved", details: { state: "declined" } });
    expect(stale.body.error.message).toContain("now declined, not waiting for approval");
    const [row] = await t.ctx.db.select().from(workOrders).where(eq(workOrders.id, wo.id));
    expect(row!.state).toBe("declined");
  });

  it("lets a declined unit go back unrepaired without a test run", async () => {
    const wo = await buildWorkOrder(t.ctx.db, { state: "declined" });
    expect((await move(lead.agent, wo.id, "declined", "ready_for_pickup")).status).toBe(200);
  });

  it("validates the body and the id, and answers 404 for an unknown work order", async () => {
    const wo = await buildWorkOrder(t.ctx.db);
    const bad = await lead.agent.post(`/api/work-orders/${wo.id}/moves`).send({ to: "on_fire", expectedFrom: "waiting_for_diagnosis" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.fieldErrors.to).toEqual(["Choose the state to move the work order to."]);
    expect((await lead.agent.post("/api/work-orders/not-an-id/moves").send({ to: "diagnosing", expectedFrom: "waiting_for_diagnosis" })).status).toBe(400);
    expect((await move(lead.agent, "0190f0c0-0000-7000-8000-0000000000aa", "waiting_for_diagnosis", "diagnosing")).status).toBe(404);
  });
});

describe("the test run before pick-up", () => {
  it("refuses ready for pick-up until a passed test run is recorded since the ticket entered test run", async () => {
    const wo = await buildWorkOrder(t.ctx.db, { state: "in_repair" });
    expect((await move(lead.agent, wo.id, "in_repair", "test_run")).status).toBe(200);

    const none = await move(lead.agent, wo.id, "test_run", "ready_for_pickup");
    expect(none.status).toBe(409);
    expect(none.body.error.id).toBe("test_run_needed");

    const failed = await lead.agent.post(`/api/work-orders/${wo.id}/test-runs`).send({ checks: { ...allPass, attachmentStillAtIdle: false }, note: "Head turns at idle" });
    expect(failed.status).toBe(201);
    expect(failed.body).toMatchObject({ passed: false, note: "Head turns at idle", checks: { attachmentStillAtIdle: false }, by: { id: lead.user.id } });
    expect((await move(lead.agent, wo.id, "test_run", "ready_for_pickup")).body.error.id).toBe("test_run_needed");

    // Back to the bench, and a pass recorded before the reopened repair no longer counts.
    const passed = await lead.agent.post(`/api/work-orders/${wo.id}/test-runs`).send({ checks: allPass });
    expect(passed.body.passed).toBe(true);
    expect((await move(lead.agent, wo.id, "test_run", "in_repair")).status).toBe(200);
    expect((await move(lead.agent, wo.id, "in_repair", "test_run")).status).toBe(200);
    expect((await move(lead.agent, wo.id, "test_run", "ready_for_pickup")).body.error.id).toBe("test_run_needed");

    const again = await apprentice.agent.post(`/api/work-orders/${wo.id}/test-runs`).send({ checks: allPass, note: "" });
    expect(again.status).toBe(201);
    const out = await move(lead.agent, wo.id, "test_run", "ready_for_pickup");
    expect(out.status).toBe(200);
    expect(out.body.state).toBe("ready_for_pickup");

    const runs = await t.ctx.db.select().from(workOrderTestRuns).where(eq(workOrderTestRuns.workOrderId, wo.id));
    expect(runs.map((r) => r.passed)).toEqual([false, true, true]);
    expect(runs[0]!.checks).toEqual({ ...allPass, attachmentStillAtIdle: false });

    // The detail shows the latest run, with who ran it.
    const detail = (await lead.agent.get(`/api/work-orders/${wo.id}`)).body as WorkOrderDetail;
    expect(detail.latestTestRun).toMatchObject({ id: again.body.id, passed: true, by: { id: apprentice.user.id, name: apprentice.user.name } });
  });

  it("records a test run only while the ticket is in test run, with all five answers", async () => {
    const wo = await buildWorkOrder(t.ctx.db, { state: "in_repair" });
    const early = await lead.agent.post(`/api/work-orders/${wo.id}/test-runs`).send({ checks: allPass });
    expect(early.status).toBe(409);
    expect(early.body.error.id).toBe("not_in_test_run");
    const partial = await lead.agent.post(`/api/work-orders/${wo.id}/test-runs`).send({ checks: { throttleReturns: true } });
    expect(partial.status).toBe(400);
    expect(Object.keys(partial.body.error.details.fieldErrors)).toEqual(["checks"]);
    const detail = (await lead.agent.get(`/api/work-orders/${wo.id}`)).body as WorkOrderDetail;
    expect(detail.latestTestRun).toBeNull();
  });
});

describe("GET /api/work-orders/board", () => {
  it("groups tickets by state in the board's order, each with its number, customer, unit and last move", async () => {
    const wo = await buildWorkOrder(t.ctx.db, { state: "approved", unit: { make: "Brackwater", model: "BW-40" } });
    await move(apprentice.agent, wo.id, "approved", "waiting_for_parts");
    const board = (await lead.agent.get("/api/work-orders/board")).body as BoardResponse;
    expect(board.columns.map((c) => c.state)).toEqual([
      "waiting_for_diagnosis",
      "diagnosing",
      "waiting_for_approval",
      "approved",
      "declined",
      "waiting_for_parts",
      "in_repair",
      "test_run",
      "ready_for_pickup",
      "picked_up",
    ]);
    const parts = board.columns.find((c) => c.state === "waiting_for_parts")!;
    const ticket = parts.tickets.find((x) => x.id === wo.id)!;
    expect(ticket).toMatchObject({ number: wo.number, make: "Brackwater", model: "BW-40", movedBy: { id: apprentice.user.id, name: apprentice.user.name } });
    expect(ticket.customerName).toMatch(/^Test Customer/);
    expect(ticket.secondsInState).toBeGreaterThanOrEqual(0);
    expect(ticket.secondsInState).toBeLessThan(120);
    expect(board.columns.find((c) => c.state === "approved")!.tickets.some((x) => x.id === wo.id)).toBe(false);
    for (const column of board.columns) {
      if (column.state !== "picked_up") expect(column.total).toBe(column.tickets.length);
      for (const x of column.tickets) expect(x.state).toBe(column.state);
    }
  });
});
