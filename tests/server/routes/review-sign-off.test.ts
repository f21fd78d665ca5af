import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildSession } from "../../factories/sessions.ts";
import { buildAttachment } from "../../factories/attachments.ts";
import { appendRequests, gatedEvents, handheldToFinding, moveEvent } from "../../factories/session-events.ts";
import { auditLog, diagnosticSessions, sessionEvents, shopSettings } from "../../../server/db/schema.ts";
import { compiledVersion, installBuiltInFlows } from "../../../server/services/flows.ts";

let t: TestApp;
let tech: Awaited<ReturnType<typeof signedInAs>>;
let senior: Awaited<ReturnType<typeof signedInAs>>;
let lead: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  t = await createTestApp();
  await installBuiltInFlows(t.ctx.db);
  [tech, senior, lead] = [await signedInAs(t, "apprentice"), await signedInAs(t, "senior_tech"), await signedInAs(t, "shop_lead")];
});
afterAll(() => t.close());

/** A session the tech ran to a finding and completed through the API; every step's events are recorded at `recordedAt`. */
async function completedByTech(recordedAt = new Date()) {
  const session = await buildSession(t.ctx.db, { techId: tech.user.id });
  const flow = await compiledVersion(t.ctx.db, session.flowVersionId);
  const photos = new Map<string, string>();
  for (const step of Object.values(flow.steps)) {
    if (step.photo?.requirement === "required") photos.set(step.id, (await buildAttachment(t.ctx.db, { ownerType: "session", ownerId: session.id, stepId: step.id })).id);
  }
  for (const body of appendRequests(gatedEvents(flow, handheldToFinding, (id) => photos.get(id)!))) {
    const res = await tech.agent.post(`/api/sessions/${session.id}/events`).send({ ...body, recordedAt: recordedAt.toISOString() });
    if (res.status !== 201) throw new Error(`event ${body.seq}: ${res.status} ${JSON.stringify(res.body)}`);
  }
  const done = await tech.agent.post(`/api/sessions/${session.id}/complete`);
  if (done.status !== 200) throw new Error(`complete: ${done.status} ${JSON.stringify(done.body)}`);
  return session;
}
const eventCount = async (id: string) => (await t.ctx.db.select().from(sessionEvents).where(eq(sessionEvents.sessionId, id))).length;
const rowOf = async (id: string) => (await t.ctx.db.select().from(diagnosticSessions).where(eq(diagnosticSessions.id, id)))[0]!;

describe("POST /api/sessions/:id/review", () => {
  it("approves a completed session: reviewer, time and an audit row recorded", async () => {
    const session = await completedByTech();
    const res = await lead.agent.post(`/api/sessions/${session.id}/review`).send({ decision: "approve", comment: "" });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: session.id, status: "completed", reviewState: "approved", reviewComment: null, reviewerName: lead.user.name, techName: tech.user.name });
    const row = await rowOf(session.id);
    expect(res.body.reviewedAt).toBe(row.reviewedAt!.toISOString());
    expect(row).toMatchObject({ reviewState: "approved", reviewerId: lead.user.id });
    expect(row.reviewedAt).toBeInstanceOf(Date);
    const audit = await t.ctx.db.select().from(auditLog).where(and(eq(auditLog.recordId, session.id), eq(auditLog.action, "session.approved")));
    expect(audit).toHaveLength(1);
    expect(audit[0]!.userId).toBe(lead.user.id);
  });

  it("returns a session with its comment and keeps every event; the tech sees it on the bench", async () => {
    const session = await completedByTech();
    const before = await eventCount(session.id);
    expect(before).toBeGreaterThan(0);
    const comment = "  The plug gap was not recorded. Measure it and add a note.  ";
    const res = await lead.agent.post(`/api/sessions/${session.id}/review`).send({ decision: "return", comment });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ reviewState: "returned", reviewComment: comment.trim() });
    expect(res.body.events).toHaveLength(before);
    expect(await eventCount(session.id)).toBe(before);
    const audit = await t.ctx.db.select().from(auditLog).where(and(eq(auditLog.recordId, session.id), eq(auditLog.action, "session.returned")));
    expect(audit.map((a) => a.details)).toEqual([{ comment: comment.trim() }]);
    const home = await tech.agent.get("/api/bench/home");
    expect(home.body.returned.map((s: { sessionId: string; reviewComment: string }) => [s.sessionId, s.reviewComment])).toEqual([[session.id, comment.trim()]]);
  });

  it("lets the tech open a returned session again, go back from its finding, and send it for review once more", async () => {
    const session = await completedByTech();
    await lead.agent.post(`/api/sessions/${session.id}/review`).send({ decision: "return", comment: "Redo the last step." }).expect(200);
    const before = await eventCount(session.id);
    // Only the session's own tech reopens it.
    expect((await lead.agent.post(`/api/sessions/${session.id}/reopen`)).status).toBe(404);
    const reopened = await tech.agent.post(`/api/sessions/${session.id}/reopen`);
    expect(reopened.status).toBe(200);
    expect(reopened.body).toMatchObject({ status: "open", reviewState: "returned", reviewComment: "Redo the last step.", completedAt: null });
    expect(reopened.body.findingStepId).not.toBeNull();
    expect((await tech.agent.get("/api/bench/home")).body.open.map((s: { sessionId: string }) => s.sessionId)).toContain(session.id);
    // Back from the finding, then the last answer again: the log only grows.
    const again = appendRequests([{ type: "step.back" }, moveEvent(handheldToFinding[handheldToFinding.length - 1]!)], before + 1);
    for (const body of again) await tech.agent.post(`/api/sessions/${session.id}/events`).send(body).expect(201);
    await tech.agent.post(`/api/sessions/${session.id}/complete`).expect(200);
    const row = await rowOf(session.id);
    expect(row).toMatchObject({ status: "completed", reviewState: "waiting" });
    expect(row.flags).not.toBeNull();
    expect(await eventCount(session.id)).toBe(before + 2);
    const audit = await t.ctx.db.select().from(auditLog).where(and(eq(auditLog.recordId, session.id), eq(auditLog.action, "session.reopened")));
    expect(audit.map((a) => a.userId)).toEqual([tech.user.id]);
    // Waiting for review again: not a returned session, so it cannot be reopened.
    const twice = await tech.agent.post(`/api/sessions/${session.id}/reopen`);
    expect(twice.status).toBe(409);
    expect(twice.body.error.id).toBe("not_returned");
  });

  it("flags a session left open by the shop's own limit, in its flags and in the queue", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id, startedAt: new Date(Date.now() - 3 * 3_600_000) });
    const openTooLong = async () => ((await lead.agent.get(`/api/review/sessions/${session.id}/flags`)).body.flags as { code: string; reason: string }[]).filter((f) => f.code === "open_too_long");
    const flaggedIds = async () => ((await lead.agent.get("/api/review/sessions").query({ flagged: "true", pageSize: "100" })).body.rows as { sessionId: string }[]).map((r) => r.sessionId);
    // Three hours open is within the usual 24.
    expect(await openTooLong()).toEqual([]);
    expect(await flaggedIds()).not.toContain(session.id);
    await t.ctx.db.insert(shopSettings).values({ id: 1, name: "Test shop", labourRateCents: 0, diagnosticFeeCents: 0, reviewOpenHours: 2 }).onConflictDoUpdate({ target: shopSettings.id, set: { reviewOpenHours: 2 } });
    try {
      const flags = await openTooLong();
      expect(flags).toHaveLength(1);
      expect(flags[0]!.reason).toMatch(/has been open for 3 hours, more than the 2 hours/);
      expect(await flaggedIds()).toContain(session.id);
    } finally {
      await t.ctx.db.update(shopSettings).set({ reviewOpenHours: 24 });
    }
  });

  it("asks for a comment beside the field on a return, and refuses one over 2000 characters", async () => {
    const session = await completedByTech();
    const empty = await lead.agent.post(`/api/sessions/${session.id}/review`).send({ decision: "return", comment: "   " });
    expect(empty.status).toBe(400);
    expect(empty.body.error.details.fieldErrors.comment[0]).toMatch(/Say what the tech should look at again/);
    const long = await lead.agent.post(`/api/sessions/${session.id}/review`).send({ decision: "approve", comment: "x".repeat(2001) });
    expect(long.status).toBe(400);
    expect(long.body.error.details.fieldErrors.comment[0]).toMatch(/2000 characters/);
    const bad = await lead.agent.post(`/api/sessions/${session.id}/review`).send({ decision: "maybe" });
    expect(bad.body.error.details.fieldErrors.decision[0]).toMatch(/"approve" or "return"/);
    expect((await rowOf(session.id)).reviewState).toBe("waiting");
  });

  it("refuses apprentices and senior techs, even on their own session", async () => {
    const session = await completedByTech();
    for (const who of [tech, senior]) {
      const res = await who.agent.post(`/api/sessions/${session.id}/review`).send({ decision: "approve", comment: "" });
      expect(res.status).toBe(403);
    }
    expect((await rowOf(session.id)).reviewState).toBe("waiting");
  });

  it("answers 409 for a session that is open, abandoned or already signed off, and 404 for none", async () => {
    const open = await buildSession(t.ctx.db, { techId: tech.user.id });
    const abandoned = await buildSession(t.ctx.db, { status: "abandoned", abandonReason: "Customer took it back" });
    const signed = await completedByTech();
    expect((await lead.agent.post(`/api/sessions/${signed.id}/review`).send({ decision: "approve" })).status).toBe(200);
    for (const id of [open.id, abandoned.id, signed.id]) {
      const res = await lead.agent.post(`/api/sessions/${id}/review`).send({ decision: "return", comment: "Look again" });
      expect(res.status).toBe(409);
      expect(res.body.error.id).toBe("not_waiting_for_review");
    }
    expect((await rowOf(signed.id)).reviewState).toBe("approved");
    expect((await lead.agent.post(`/api/sessions/${uuidv7()}/review`).send({ decision: "approve" })).status).toBe(404);
  });
});

describe("GET /api/review/sessions/:id/flags", () => {
  it("stores the flags and their count when the session is completed, and answers them to the lead and the tech", async () => {
    // Every event at the same instant: each timed instruction on the way is done "in 0 seconds".
    const session = await completedByTech();
    const flow = await compiledVersion(t.ctx.db, session.flowVersionId);
    const timed = handheldToFinding.filter(([id]) => { const s = flow.steps[id]; return s?.kind === "instruction" && (s.minSeconds ?? 0) > 0; }).map(([id]) => id);
    expect(timed.length).toBeGreaterThan(0);
    const row = await rowOf(session.id);
    expect(row.flagCount).toBe(row.flags!.length);
    for (const who of [lead, tech]) {
      const res = await who.agent.get(`/api/review/sessions/${session.id}/flags`);
      expect(res.status).toBe(200);
      expect(res.body.flags).toEqual(row.flags);
    }
    expect(row.flags!.filter((f) => f.code === "step_too_fast").map((f) => f.stepId)).toEqual(timed);
  });

  it("works the flags out now for an open session left for days, and hides the session from other techs", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id, startedAt: new Date(Date.now() - 50 * 3_600_000) });
    const res = await tech.agent.get(`/api/review/sessions/${session.id}/flags`);
    expect(res.status).toBe(200);
    expect(res.body.flags).toEqual([expect.objectContaining({ code: "open_too_long", stepId: null })]);
    expect((await senior.agent.get(`/api/review/sessions/${session.id}/flags`)).status).toBe(404);
  });
});
