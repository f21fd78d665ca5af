import { and, desc, eq, or } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import { diagnosticSessions, flows, flowVersions, units, workOrders } from "../db/schema.ts";
import { compiledVersion } from "./flows.ts";
import type { BenchHomeResponse, BenchSession } from "../../shared/schemas/sessions.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

/** The signed-in tech's open sessions, those waiting for review, and those the lead returned. */
export async function benchHome(ctx: Pick<AppContext, "db">, user: PublicUser): Promise<BenchHomeResponse> {
  const s = diagnosticSessions;
  const rows = await ctx.db
    .select({
      sessionId: s.id,
      status: s.status,
      reviewState: s.reviewState,
      flowVersionId: s.flowVersionId,
      workOrderId: s.workOrderId,
      workOrderNumber: workOrders.number,
      unit: { equipmentKind: units.equipmentKind, make: units.make, model: units.model },
      flowTitle: flows.title,
      currentStepId: s.currentStepId,
      reviewComment: s.reviewComment,
      startedAt: s.startedAt,
    })
    .from(s)
    .innerJoin(workOrders, eq(workOrders.id, s.workOrderId))
    .innerJoin(units, eq(units.id, workOrders.unitId))
    .innerJoin(flowVersions, eq(flowVersions.id, s.flowVersionId))
    .innerJoin(flows, eq(flows.id, flowVersions.flowId))
    .where(and(eq(s.techId, user.id), or(eq(s.status, "open"), eq(s.reviewState, "waiting"), eq(s.reviewState, "returned"))))
    .orderBy(desc(s.startedAt))
    .limit(300);
  const home: BenchHomeResponse = { open: [], waitingForReview: [], returned: [] };
  for (const { status, reviewState, flowVersionId, startedAt, ...r } of rows) {
    const step = (await compiledVersion(ctx.db, flowVersionId)).steps[r.currentStepId];
    const item: BenchSession = { ...r, currentStepTitle: step?.title ?? r.currentStepId, startedAt: startedAt.toISOString() };
    if (status === "open") home.open.push(item);
    else if (reviewState === "waiting") home.waitingForReview.push(item);
    else if (reviewState === "returned") home.returned.push(item);
  }
  return home;
}
