import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { asc, eq } from "drizzle-orm";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildWorkOrder } from "../../factories/work-orders.ts";
import { buildAttachment } from "../../factories/attachments.ts";
import { appendRequests, gatedEvents, handheldToFinding } from "../../factories/session-events.ts";
import { diagnosticSessions, workOrders, workOrderStateHistory } from "../../../server/db/schema.ts";
import { compiledVersion, installBuiltInFlows } from "../../../server/services/flows.ts";

let t: TestApp;
let tech: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  t = await createTestApp();
  await installBuiltInFlows(t.ctx.db);
  tech = await signedInAs(t, "apprentice");
});
afterAll(() => t.close());

async function startSession(workOrderId: string): Promise<string> {
  const res = await tech.agent.post(`/api/work-orders/${workOrderId}/sessions`).send({ flowId: "handheld-2-stroke-no-start" });
  if (res.status !== 201) throw new Error(`start: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id as string;
}

async function history(workOrderId: string) {
  const rows = await t.ctx.db.select().from(workOrderStateHistory).where(eq(workOrderStateHistory.workOrderId, workOrderId)).orderBy(asc(workOrderStateHistory.at), asc(workOrderStateHistory.id));
  return rows.map((r) => [r.fromState, r.toState]);
}

const stateOf = async (id: string) => (await t.ctx.db.select({ state: workOrders.state }).from(workOrders).where(eq(workOrders.id, id)))[0]!.state;

describe("a session's end moves its work order on", () => {
  it("sends the ticket to waiting for approval when the check reaches a finding and is completed", async () => {
    const wo = await buildWorkOrder(t.ctx.db);
    const sessionId = await startSession(wo.id);
    expect(await stateOf(wo.id)).toBe("diagnosing");
    const [session] = await t.ctx.db.select().from(diagnosticSessions).where(eq(diagnosticSessions.id, sessionId));
    const flow = await compiledVersion(t.ctx.db, session!.flowVersionId);
    const photos = new Map<string, string>();
    for (const step of Object.values(flow.steps)) {
      if (step.photo?.requirement === "required") photos.set(step.id, (await buildAttachment(t.ctx.db, { ownerType: "session", ownerId: sessionId, stepId: step.id })).id);
    }
    for (const body of appendRequests(gatedEvents(flow, handheldToFinding, (id) => photos.get(id)!))) {
      expect((await tech.agent.post(`/api/sessions/${sessionId}/events`).send(body)).status).toBe(201);
    }
    expect((await tech.agent.post(`/api/sessions/${sessionId}/complete`)).status).toBe(200);
    expect(await stateOf(wo.id)).toBe("waiting_for_approval");
    expect((await history(wo.id)).slice(-1)).toEqual([["diagnosing", "waiting_for_approval"]]);
  });

  it("puts the ticket back to waiting for diagnosis when its only check is abandoned", async () => {
    const wo = await buildWorkOrder(t.ctx.db);
    const sessionId = await startSession(wo.id);
    expect((await tech.agent.post(`/api/sessions/${sessionId}/abandon`).send({ reason: "Started on the wrong unit" })).status).toBe(200);
    expect(await stateOf(wo.id)).toBe("waiting_for_diagnosis");
    expect((await history(wo.id)).slice(-2)).toEqual([
      ["waiting_for_diagnosis", "diagnosing"],
      ["diagnosing", "waiting_for_diagnosis"],
    ]);
  });

  it("keeps the ticket diagnosing while another tech's check on it is still open", async () => {
    const wo = await buildWorkOrder(t.ctx.db);
    const colleague = await signedInAs(t, "apprentice");
    const theirs = await colleague.agent.post(`/api/work-orders/${wo.id}/sessions`).send({ flowId: "handheld-2-stroke-no-start" });
    expect(theirs.status).toBe(201);
    const mine = await startSession(wo.id);
    expect((await tech.agent.post(`/api/sessions/${mine}/abandon`).send({ reason: "Two of us on one unit" })).status).toBe(200);
    expect(await stateOf(wo.id)).toBe("diagnosing");
  });
});
