// Check-order advice for a flow: the rows its completed sessions left, handed to shared/flow/advice.ts.
import { asc, desc, eq, and, sql } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import { diagnosticSessions, flowVersions, sessionEvents } from "../db/schema.ts";
import { can } from "../auth/policies.ts";
import { compiledVersion } from "./flows.ts";
import { draftOf, readableFlow } from "./flow-authoring.ts";
import { computeAdvice, type AdviceEvent, type AdviceSession } from "../../shared/flow/advice.ts";
import type { AdviceResponse } from "../../shared/schemas/flows.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

/** Advice from completed sessions on every version, read against the latest version (or, never published, the draft). */
export async function flowAdvice(ctx: Pick<AppContext, "db">, user: PublicUser, flowId: string): Promise<AdviceResponse> {
  await readableFlow(ctx.db, user, flowId);
  const [latest] = await ctx.db
    .select({ definition: flowVersions.definition })
    .from(flowVersions)
    .where(eq(flowVersions.flowId, flowId))
    .orderBy(desc(flowVersions.number))
    .limit(1);
  const definition = latest?.definition ?? (can(user, "flow.edit") ? (await draftOf(ctx.db, flowId))?.definition : undefined) ?? {};

  const completed = and(eq(flowVersions.flowId, flowId), eq(diagnosticSessions.status, "completed"));
  const sessions = await ctx.db
    .select({ id: diagnosticSessions.id, versionId: diagnosticSessions.flowVersionId, findingStepId: diagnosticSessions.findingStepId })
    .from(diagnosticSessions)
    .innerJoin(flowVersions, eq(flowVersions.id, diagnosticSessions.flowVersionId))
    .where(completed);
  // Only the step and the time of each event: the payloads themselves are not needed.
  const events = await ctx.db
    .select({ sessionId: sessionEvents.sessionId, stepId: sql<string | null>`${sessionEvents.payload}->>'stepId'`, recordedAt: sessionEvents.recordedAt })
    .from(sessionEvents)
    .innerJoin(diagnosticSessions, eq(diagnosticSessions.id, sessionEvents.sessionId))
    .innerJoin(flowVersions, eq(flowVersions.id, diagnosticSessions.flowVersionId))
    .where(completed)
    .orderBy(asc(sessionEvents.sessionId), asc(sessionEvents.seq));
  const eventsOf = new Map<string, AdviceEvent[]>();
  for (const e of events) {
    const list = eventsOf.get(e.sessionId) ?? [];
    list.push({ stepId: e.stepId, recordedAt: e.recordedAt });
    eventsOf.set(e.sessionId, list);
  }
  const input: AdviceSession[] = [];
  for (const s of sessions) {
    const title = s.findingStepId ? ((await compiledVersion(ctx.db, s.versionId)).steps[s.findingStepId]?.title ?? null) : null;
    input.push({ findingStepId: s.findingStepId, findingTitle: title, events: eventsOf.get(s.id) ?? [] });
  }
  return computeAdvice(definition, input);
}
