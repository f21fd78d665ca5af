import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildWorkOrder } from "../../factories/work-orders.ts";
import { buildSession, HANDHELD_2_STROKE } from "../../factories/sessions.ts";
import { buildAttachment } from "../../factories/attachments.ts";
import { appendRequests, gatedEvents, handheldToFinding, type Move } from "../../factories/session-events.ts";
import { auditLog, customers, diagnosticSessions, sessionEvents, workOrders } from "../../../server/db/schema.ts";
import { compiledVersion, installBuiltInFlows } from "../../../server/services/flows.ts";
import type { CompiledFlow } from "../../../shared/flow/compile.ts";
import type { DiagnosticSessionRow } from "../../../server/db/schema.ts";

let t: TestApp;
let tech: Awaited<ReturnType<typeof signedInAs>>;
let other: Awaited<ReturnType<typeof signedInAs>>;
let senior: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  t = await createTestApp();
  await installBuiltInFlows(t.ctx.db);
  [tech, other, senior] = [await signedInAs(t, "apprentice"), await signedInAs(t, "apprentice"), await signedInAs(t, "senior_tech")];
});
afterAll(() => t.close());

const safety: Move[] = [
  ["prepare/protect", "done"],
  ["prepare/as-received", "done"],
  ["prepare/secure", "done"],
  ["prepare/controls", "yes"],
];
/** A session of the tech's with photo rows ready for every step that requires one. */
async function sessionWithPhotos(techId = tech.user.id): Promise<{ session: DiagnosticSessionRow; flow: CompiledFlow; photoFor: (stepId: string) => string }> {
  const session = await buildSession(t.ctx.db, { techId });
  const flow = await compiledVersion(t.ctx.db, session.flowVersionId);
  const photos = new Map<string, string>();
  for (const step of Object.values(flow.steps)) {
    if (step.photo?.requirement === "required") photos.set(step.id, (await buildAttachment(t.ctx.db, { ownerType: "session", ownerId: session.id, stepId: step.id })).id);
  }
  return { session, flow, photoFor: (stepId) => photos.get(stepId)! };
}

async function sendAll(sessionId: string, bodies: ReturnType<typeof appendRequests>) {
  for (const body of bodies) {
    const res = await tech.agent.post(`/api/sessions/${sessionId}/events`).send(body);
    if (res.status !== 201) throw new Error(`event ${body.seq} (${JSON.stringify(body.event)}): ${res.status} ${JSON.stringify(res.body)}`);
  }
}

describe("POST /api/work-orders/:id/sessions", () => {
  it("pins the latest version, snapshots the engine and altitude, and moves the work order to diagnosing", async () => {
    const wo = await buildWorkOrder(t.ctx.db);
    const res = await tech.agent.post(`/api/work-orders/${wo.id}/sessions`).send({ flowId: HANDHELD_2_STROKE });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ workOrderId: wo.id, workOrderNumber: wo.number, techId: tech.user.id, status: "open", reviewState: "not_submitted", events: [], findingStepId: null });
    const [customer] = await t.ctx.db.select().from(customers).where(eq(customers.id, wo.customerId));
    expect(res.body).toMatchObject({ customer: customer!.name, techName: tech.user.name, abandonReason: null, reviewerName: null, reviewedAt: null });
    expect(res.body.flow).toMatchObject({ flowId: HANDHELD_2_STROKE, version: 1 });
    expect(res.body.input).toEqual({ profile: { cycle: 2, compressionRelease: "no", displacementCc: 25 }, altitudeM: 0 });
    expect(res.body.currentStepId).toBe("prepare/protect");
    expect((res.body.definition as { sections: object }).sections).toHaveProperty("safety-and-reproduce");
    const [row] = await t.ctx.db.select().from(workOrders).where(eq(workOrders.id, wo.id));
    expect(row!.state).toBe("diagnosing");
    const audit = await t.ctx.db.select().from(auditLog).where(eq(auditLog.recordId, res.body.id));
    expect(audit.map((a) => a.action)).toEqual(["session.started"]);
  });

  it("allows one open session per tech per work order: the second start is 409 naming the open one", async () => {
    const wo = await buildWorkOrder(t.ctx.db);
    const first = await tech.agent.post(`/api/work-orders/${wo.id}/sessions`).send({ flowId: HANDHELD_2_STROKE });
    const second = await tech.agent.post(`/api/work-orders/${wo.id}/sessions`).send({ flowId: HANDHELD_2_STROKE });
    expect(second.status).toBe(409);
    expect(second.body.error).toMatchObject({ id: "session_already_open", details: { sessionId: first.body.id } });
    expect((await other.agent.post(`/api/work-orders/${wo.id}/sessions`).send({ flowId: HANDHELD_2_STROKE })).status).toBe(201);
  });

  it("answers 422 for a flow that does not fit the unit and 404 for an unknown flow", async () => {
    const wo = await buildWorkOrder(t.ctx.db);
    const mower = await tech.agent.post(`/api/work-orders/${wo.id}/sessions`).send({ flowId: "walk-behind-mower-no-start" });
    expect(mower.status).toBe(422);
    expect(mower.body.error.id).toBe("flow_not_applicable");
    expect((await tech.agent.post(`/api/work-orders/${wo.id}/sessions`).send({ flowId: "no-such-flow" })).status).toBe(404);
  });
});

describe("POST /api/sessions/:id/events", () => {
  it("stores an event once: the same event again answers 200 with stored false", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id });
    const [body] = appendRequests([{ type: "caution.acknowledge", stepId: "prepare/protect", signal: "WARNING" }]);
    const first = await tech.agent.post(`/api/sessions/${session.id}/events`).send(body);
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ stored: true, event: { id: body!.id, seq: 1 }, currentStepId: "prepare/protect" });
    const again = await tech.agent.post(`/api/sessions/${session.id}/events`).send(body);
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ stored: false, event: { id: body!.id, seq: 1, receivedAt: first.body.event.receivedAt } });
    expect(await t.ctx.db.select().from(sessionEvents).where(eq(sessionEvents.sessionId, session.id))).toHaveLength(1);
    const changed = await tech.agent.post(`/api/sessions/${session.id}/events`).send({ ...body, event: { type: "note.add", stepId: "prepare/protect", text: "other" } });
    expect(changed.status).toBe(409);
    expect(changed.body.error.id).toBe("event_id_conflict");
  });

  it("answers 409 with the expected seq when one is skipped", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id });
    const [body] = appendRequests([{ type: "note.add", stepId: "prepare/protect", text: "Gap ahead" }], 3);
    const res = await tech.agent.post(`/api/sessions/${session.id}/events`).send(body);
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ id: "seq_mismatch", details: { expectedSeq: 1 } });
  });

  it("refuses a forged step with 422 and the machine's reason, and stores nothing", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id });
    const [body] = appendRequests([{ type: "step.answer", stepId: "spark/flash", value: "every" }]);
    const res = await tech.agent.post(`/api/sessions/${session.id}/events`).send(body);
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ id: "event_refused", details: { code: "wrong_step", stepId: "prepare/protect" } });
    expect(res.body.error.details.reason).toMatch(/stands at "prepare\/protect"/);
    expect(await t.ctx.db.select().from(sessionEvents).where(eq(sessionEvents.sessionId, session.id))).toHaveLength(0);
  });

  it("refuses answering a WARNING step before its acknowledgement, and a photo that was never uploaded", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id });
    const [answer] = appendRequests([{ type: "step.answer", stepId: "prepare/protect", value: "done" }]);
    const res = await tech.agent.post(`/api/sessions/${session.id}/events`).send(answer);
    expect(res.body.error.details.code).toBe("caution_not_acknowledged");
    const [photo] = appendRequests([{ type: "photo.attach", stepId: "prepare/protect", attachmentId: "0190f0c0-0000-7000-8000-0000000000aa" }]);
    const ghost = await tech.agent.post(`/api/sessions/${session.id}/events`).send(photo);
    expect(ghost.status).toBe(422);
    expect(ghost.body.error.details.code).toBe("unknown_attachment");
  });

  it("refuses a reading in an unknown unit (422) and a value that is not a number (400)", async () => {
    const { session, flow, photoFor } = await sessionWithPhotos();
    const moves: Move[] = [...safety, ["prepare/fuel-valve", "none"], ["prepare/fuel-tank", "fresh"], ["prepare/oil-level", "none"], ["prepare/reproduce", "done"], ["prepare/reproduce-result", "no"]];
    const spark: Move[] = [["spark/connect", "done"], ["spark/pull", "done"], ["spark/flash", "every"], ["spark/plug-remove", "done"], ["spark/plug-look", "dry"]];
    const air: Move[] = [["air/filter", "done"], ["air/filter-result", "clean"], ["air/arrestor", "done"], ["air/arrestor-result", "clear"], ["air/two-stroke", "yes"], ["air/port", "done"], ["air/port-result", "no"]];
    const events = gatedEvents(flow, [...moves, ...spark, ...air, ["compression/prep", "done"], ["compression/crank", "done"]], photoFor);
    events.push({ type: "photo.attach", stepId: "compression/reading", attachmentId: photoFor("compression/reading") });
    await sendAll(session.id, appendRequests(events));
    const [furlongs] = appendRequests([{ type: "step.record", stepId: "compression/reading", value: 120, unit: "furlongs" }], events.length + 1);
    const unknownUnit = await tech.agent.post(`/api/sessions/${session.id}/events`).send(furlongs);
    expect(unknownUnit.status).toBe(422);
    expect(unknownUnit.body.error.details.code).toBe("unknown_unit");
    const notNumber = await tech.agent.post(`/api/sessions/${session.id}/events`).send({ ...furlongs, event: { type: "step.record", stepId: "compression/reading", value: "NaN", unit: "psi" } });
    expect(notNumber.status).toBe(400);
    expect(notNumber.body.error.id).toBe("invalid_input");
  });

  it("hides another tech's session from an apprentice (404) but lets a senior tech read it", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id });
    const [body] = appendRequests([{ type: "note.add", stepId: "prepare/protect", text: "Not mine" }]);
    expect((await other.agent.post(`/api/sessions/${session.id}/events`).send(body)).status).toBe(404);
    expect((await other.agent.get(`/api/sessions/${session.id}`)).status).toBe(404);
    expect((await senior.agent.post(`/api/sessions/${session.id}/events`).send(body)).status).toBe(404);
    expect((await senior.agent.get(`/api/sessions/${session.id}`)).status).toBe(200);
  });
});

describe("completing and abandoning", () => {
  it("completes only at a finding, then sends it for review and takes no more events", async () => {
    const { session, flow, photoFor } = await sessionWithPhotos();
    const early = await tech.agent.post(`/api/sessions/${session.id}/complete`);
    expect(early.status).toBe(422);
    expect(early.body.error.id).toBe("not_at_finding");
    const events = gatedEvents(flow, handheldToFinding, photoFor);
    const bodies = appendRequests(events);
    await sendAll(session.id, bodies);
    const detail = await tech.agent.get(`/api/sessions/${session.id}`);
    expect(detail.body.events.map((e: { seq: number }) => e.seq)).toEqual(bodies.map((b) => b.seq));
    expect(detail.body).toMatchObject({ currentStepId: "prepare/controls-not-set", findingStepId: "prepare/controls-not-set" });
    const done = await tech.agent.post(`/api/sessions/${session.id}/complete`);
    expect(done.status).toBe(200);
    expect(done.body).toMatchObject({ status: "completed", reviewState: "waiting" });
    expect(done.body.findingStepId).not.toBeNull();
    expect(done.body.completedAt).not.toBeNull();
    const [late] = appendRequests([{ type: "note.add", stepId: done.body.currentStepId, text: "After the fact" }], done.body.events.length + 1);
    const after = await tech.agent.post(`/api/sessions/${session.id}/events`).send(late);
    expect(after.status).toBe(409);
    expect(after.body.error.id).toBe("session_closed");
  });

  it("abandons with a reason, keeps the events, and the shop lead may abandon anyone's", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id });
    await sendAll(session.id, appendRequests([{ type: "note.add", stepId: "prepare/protect", text: "Customer collected it" }]));
    expect((await tech.agent.post(`/api/sessions/${session.id}/abandon`).send({ reason: "" })).status).toBe(400);
    const res = await tech.agent.post(`/api/sessions/${session.id}/abandon`).send({ reason: "Customer took the unit back" });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: "abandoned", abandonReason: "Customer took the unit back" });
    expect(res.body.events).toHaveLength(1);
    const [row] = await t.ctx.db.select().from(diagnosticSessions).where(eq(diagnosticSessions.id, session.id));
    expect(row!.abandonReason).toBe("Customer took the unit back");
    const lead = await signedInAs(t, "shop_lead");
    const another = await buildSession(t.ctx.db, { techId: tech.user.id });
    expect((await lead.agent.post(`/api/sessions/${another.id}/abandon`).send({ reason: "Duplicate session" })).status).toBe(200);
  });
});

describe("GET /api/bench/home", () => {
  it("lists the tech's own open and waiting sessions with the current step's title", async () => {
    const home0 = await other.agent.get("/api/bench/home");
    const session = await buildSession(t.ctx.db, { techId: other.user.id });
    await buildSession(t.ctx.db, { techId: other.user.id, status: "completed", reviewState: "returned", reviewComment: "Photograph the plug too" });
    const res = await other.agent.get("/api/bench/home");
    expect(res.status).toBe(200);
    expect(res.body.open).toHaveLength(home0.body.open.length + 1);
    expect(res.body.open[0]).toMatchObject({ sessionId: session.id, currentStepId: "prepare/protect", flowTitle: expect.any(String), unit: { make: "Fernhill" } });
    expect(res.body.open[0].currentStepTitle).toMatch(/safety glasses/i);
    expect(res.body.returned[0]).toMatchObject({ reviewComment: "Photograph the plug too" });
  });
});
