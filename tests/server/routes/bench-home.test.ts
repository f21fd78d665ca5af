import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildWorkOrder } from "../../factories/work-orders.ts";
import { buildSession } from "../../factories/sessions.ts";
import { compiledVersion, installBuiltInFlows } from "../../../server/services/flows.ts";
import type { BenchHomeResponse } from "../../../shared/schemas/sessions.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await installBuiltInFlows(t.ctx.db);
});
afterAll(() => t.close());

const ids = (sessions: BenchHomeResponse[keyof BenchHomeResponse]) => sessions.map((s) => s.sessionId);

describe("GET /api/bench/home for waiting and returned sessions", () => {
  it("groups the tech's sessions by where they stand and leaves out closed and other techs' ones", async () => {
    const tech = await signedInAs(t, "apprentice");
    const otherTech = await signedInAs(t, "apprentice");
    const blower = await buildWorkOrder(t.ctx.db, { state: "diagnosing", unit: { equipmentKind: "leaf_blower", make: "Brackwater", model: "BL-9" } });
    // A finished check stands at its finding.
    const finding = "prepare/controls-not-set";
    const at = (minutesAgo: number) => new Date(Date.now() - minutesAgo * 60_000);

    const open = await buildSession(t.ctx.db, { techId: tech.user.id, startedAt: at(5) });
    const waiting = await buildSession(t.ctx.db, { techId: tech.user.id, workOrderId: blower.id, status: "completed", reviewState: "waiting", currentStepId: finding, startedAt: at(90), completedAt: at(60) });
    const olderWaiting = await buildSession(t.ctx.db, { techId: tech.user.id, status: "completed", reviewState: "waiting", startedAt: at(300), completedAt: at(240) });
    const returned = await buildSession(t.ctx.db, {
      techId: tech.user.id,
      status: "completed",
      reviewState: "returned",
      reviewComment: "Drain the bowl into a jar and photograph it.",
      startedAt: at(120),
      completedAt: at(100),
    });
    await buildSession(t.ctx.db, { techId: tech.user.id, status: "completed", reviewState: "approved", reviewComment: "Good work.", completedAt: at(30) });
    await buildSession(t.ctx.db, { techId: tech.user.id, status: "abandoned", abandonReason: "Customer took the unit back" });
    await buildSession(t.ctx.db, { techId: otherTech.user.id });
    await buildSession(t.ctx.db, { techId: otherTech.user.id, status: "completed", reviewState: "waiting" });
    await buildSession(t.ctx.db, { techId: otherTech.user.id, status: "completed", reviewState: "returned", reviewComment: "Not yours." });

    const res = await tech.agent.get("/api/bench/home");
    expect(res.status).toBe(200);
    const home = res.body as BenchHomeResponse;
    expect(ids(home.open)).toEqual([open.id]);
    // Newest first, like the rest of the bench.
    expect(ids(home.waitingForReview)).toEqual([waiting.id, olderWaiting.id]);
    expect(ids(home.returned)).toEqual([returned.id]);

    const step = (await compiledVersion(t.ctx.db, waiting.flowVersionId)).steps[finding]!;
    expect(step.kind).toBe("finding");
    expect(home.waitingForReview[0]).toEqual({
      sessionId: waiting.id,
      workOrderId: blower.id,
      workOrderNumber: blower.number,
      unit: { equipmentKind: "leaf_blower", make: "Brackwater", model: "BL-9" },
      flowTitle: expect.any(String),
      currentStepId: finding,
      currentStepTitle: step.title,
      reviewComment: null,
      startedAt: waiting.startedAt.toISOString(),
    });
    expect(home.returned[0]).toMatchObject({ sessionId: returned.id, reviewComment: "Drain the bowl into a jar and photograph it.", startedAt: returned.startedAt.toISOString() });

    const other = await otherTech.agent.get("/api/bench/home");
    const theirs = other.body as BenchHomeResponse;
    expect([theirs.open.length, theirs.waitingForReview.length, theirs.returned.length]).toEqual([1, 1, 1]);
    expect(theirs.returned[0]!.reviewComment).toBe("Not yours.");
  });

  it("answers three empty groups to a tech with no sessions", async () => {
    const fresh = await signedInAs(t, "apprentice");
    const res = await fresh.agent.get("/api/bench/home");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ open: [], waitingForReview: [], returned: [] });
  });
});
