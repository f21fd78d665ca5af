import { and, asc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { v7 as uuidv7 } from "uuid";
import type { AppContext } from "../context.ts";
import type { Database } from "../db/client.ts";
import { customers, diagnosticSessions, flows, flowVersions, sessionEvents, units, users, workOrders, type DiagnosticSessionRow, type SessionEventRow } from "../db/schema.ts";
import { can } from "../auth/policies.ts";
import { conflict, isUniqueViolation, notFound, unprocessable } from "../lib/errors.ts";
import { recordAudit } from "./audit.ts";
import { appliesToUnit, compiledVersion, publishedFlows } from "./flows.ts";
import { getSettings } from "./settings.ts";
import { findWorkOrder } from "./work-order-detail.ts";
import { moveWorkOrder } from "./work-orders.ts";
import { replaySession } from "../../shared/flow/session-log.ts";
import type { SessionDetail, StoredEvent } from "../../shared/schemas/sessions.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

type Tx = Pick<Database, "select">;
const reviewers = alias(users, "reviewers");

const hidden = () => notFound("There is no such session.");

/** The session, if this user may do `action` to it; anyone else is told it does not exist. */
export async function sessionFor(db: Tx, user: PublicUser, id: string, action: "session.read" | "session.append" | "session.abandon", lock = false): Promise<DiagnosticSessionRow> {
  const query = db.select().from(diagnosticSessions).where(eq(diagnosticSessions.id, id));
  const [row] = lock ? await query.for("update") : await query;
  if (!row || !can(user, action, { ownerId: row.techId })) throw hidden();
  return row;
}

export function toStoredEvent(row: SessionEventRow): StoredEvent {
  return { id: row.id, seq: row.seq, recordedAt: row.recordedAt.toISOString(), event: row.payload, receivedAt: row.receivedAt.toISOString() };
}

export async function sessionEventsOf(db: Tx, sessionId: string): Promise<SessionEventRow[]> {
  return db.select().from(sessionEvents).where(eq(sessionEvents.sessionId, sessionId)).orderBy(asc(sessionEvents.seq));
}

/** Starts a session on the flow's latest version, with the unit's engine facts and the shop's altitude fixed now. */
export async function startSession(ctx: Pick<AppContext, "db">, user: PublicUser, workOrderId: string, flowId: string): Promise<string> {
  const order = await findWorkOrder(ctx, workOrderId);
  const [flow] = await publishedFlows(ctx.db, flowId);
  if (!flow) {
    const [retired] = await ctx.db.select({ title: flows.title }).from(flows).where(and(eq(flows.id, flowId), eq(flows.retired, true)));
    if (retired) throw unprocessable("flow_retired", `"${retired.title}" is retired: it starts no new sessions. Choose another check.`);
    throw notFound("There is no such flow.");
  }
  if (!appliesToUnit(flow.appliesTo, order.unit)) {
    throw unprocessable("flow_not_applicable", `"${flow.title}" is not written for this unit (${order.unit.equipmentKind}, ${order.unit.cycle}-stroke).`);
  }
  const compiled = await compiledVersion(ctx.db, flow.versionId);
  const settings = await getSettings(ctx);
  const input = {
    profile: { cycle: order.unit.cycle as 2 | 4, compressionRelease: order.unit.compressionRelease, displacementCc: order.unit.displacementCc, specPsi: null },
    altitudeM: settings?.altitudeM ?? 0,
  };
  const openOne = async () => {
    const [open] = await ctx.db
      .select({ id: diagnosticSessions.id })
      .from(diagnosticSessions)
      .where(and(eq(diagnosticSessions.workOrderId, workOrderId), eq(diagnosticSessions.techId, user.id), eq(diagnosticSessions.status, "open")));
    return open ? conflict("session_already_open", "You already have an open session on this work order.", { sessionId: open.id }) : null;
  };
  const already = await openOne();
  if (already) throw already;
  const id = uuidv7();
  try {
    await ctx.db.transaction(async (tx) => {
      const [wo] = await tx.select({ state: workOrders.state }).from(workOrders).where(eq(workOrders.id, workOrderId)).for("update");
      await tx.insert(diagnosticSessions).values({ id, workOrderId, flowVersionId: flow.versionId, techId: user.id, currentStepId: compiled.start, input });
      if (wo!.state !== "diagnosing") await moveWorkOrder(tx, workOrderId, wo!.state, "diagnosing", user.id);
      await recordAudit(tx, { userId: user.id, action: "session.started", recordType: "diagnostic_session", recordId: id, details: { workOrderId, flowId, version: flow.version } });
    });
  } catch (e) {
    // Two starts at once: the partial unique index lets one through; the other gets the same 409.
    if (isUniqueViolation(e)) throw (await openOne()) ?? e;
    throw e;
  }
  return id;
}

export async function getSessionDetail(ctx: Pick<AppContext, "db">, user: PublicUser, id: string): Promise<SessionDetail> {
  const session = await sessionFor(ctx.db, user, id, "session.read");
  const [meta] = await ctx.db
    .select({
      number: workOrders.number,
      customer: customers.name,
      unit: { equipmentKind: units.equipmentKind, make: units.make, model: units.model },
      techName: users.name,
      reviewerName: reviewers.name,
      flowId: flows.id,
      title: flows.title,
      version: flowVersions.number,
      definition: flowVersions.definition,
    })
    .from(diagnosticSessions)
    .innerJoin(workOrders, eq(workOrders.id, diagnosticSessions.workOrderId))
    .innerJoin(customers, eq(customers.id, workOrders.customerId))
    .innerJoin(units, eq(units.id, workOrders.unitId))
    .innerJoin(users, eq(users.id, diagnosticSessions.techId))
    .leftJoin(reviewers, eq(reviewers.id, diagnosticSessions.reviewerId))
    .innerJoin(flowVersions, eq(flowVersions.id, diagnosticSessions.flowVersionId))
    .innerJoin(flows, eq(flows.id, flowVersions.flowId))
    .where(eq(diagnosticSessions.id, id));
  const events = await sessionEventsOf(ctx.db, id);
  const result = replaySession(await compiledVersion(ctx.db, session.flowVersionId), session.input, events.map((e) => e.payload));
  return {
    id,
    workOrderId: session.workOrderId,
    workOrderNumber: meta!.number,
    customer: meta!.customer,
    unit: meta!.unit,
    techId: session.techId,
    techName: meta!.techName,
    status: session.status,
    abandonReason: session.abandonReason,
    reviewState: session.reviewState,
    reviewComment: session.reviewComment,
    reviewerName: meta!.reviewerName,
    reviewedAt: session.reviewedAt?.toISOString() ?? null,
    flow: { flowId: meta!.flowId, versionId: session.flowVersionId, version: meta!.version, title: meta!.title },
    definition: meta!.definition,
    input: { profile: { cycle: session.input.profile.cycle, compressionRelease: session.input.profile.compressionRelease, displacementCc: session.input.profile.displacementCc }, altitudeM: session.input.altitudeM },
    events: events.map(toStoredEvent),
    // A stored log always replays; the cache stands in only if the flow engine ever disagreed.
    currentStepId: result.ok ? result.stepId : (result.stepId ?? session.currentStepId),
    findingStepId: result.ok ? result.findingStepId : session.findingStepId,
    startedAt: session.startedAt.toISOString(),
    completedAt: session.completedAt?.toISOString() ?? null,
  };
}
