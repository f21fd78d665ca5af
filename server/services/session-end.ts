import { and, eq, ne, or } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import type { Database } from "../db/client.ts";
import { diagnosticSessions, workOrders } from "../db/schema.ts";
import { conflict, unprocessable } from "../lib/errors.ts";
import { recordAudit } from "./audit.ts";
import { compiledVersion } from "./flows.ts";
import { sessionEventsOf, sessionFor, toStoredEvent } from "./sessions.ts";
import { moveWorkOrder } from "./work-orders.ts";
import { flagLimits } from "./settings.ts";
import { replaySession } from "../../shared/flow/session-log.ts";
import { sessionFlags } from "../../shared/review/flags.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

const closed = () => conflict("session_closed", "This session is already completed or abandoned.");

type Tx = Pick<Database, "select" | "update" | "insert">;

/**
 * A finished session moves its work order on. With a finding the ticket waits for the customer's
 * go-ahead (the estimate goes out from there); when the last open session is abandoned without any
 * finding on the ticket, it goes back to waiting for diagnosis, so it is not left "diagnosing" with
 * nobody on it. A ticket that has already moved past diagnosing is left where it is.
 */
async function moveOnAfterSession(tx: Tx, user: PublicUser, workOrderId: string, sessionId: string, outcome: "completed" | "abandoned") {
  const [wo] = await tx.select({ state: workOrders.state }).from(workOrders).where(eq(workOrders.id, workOrderId)).for("update");
  if (wo?.state !== "diagnosing") return;
  if (outcome === "completed") return moveWorkOrder(tx, workOrderId, wo.state, "waiting_for_approval", user.id);
  const others = await tx
    .select({ id: diagnosticSessions.id })
    .from(diagnosticSessions)
    .where(and(eq(diagnosticSessions.workOrderId, workOrderId), ne(diagnosticSessions.id, sessionId), or(eq(diagnosticSessions.status, "open"), eq(diagnosticSessions.status, "completed"))))
    .limit(1);
  if (others.length === 0) await moveWorkOrder(tx, workOrderId, wo.state, "waiting_for_diagnosis", user.id);
}

/** Completes the session when its replay stands at a finding, and sends it for review. */
export async function completeSession(ctx: Pick<AppContext, "db">, user: PublicUser, id: string): Promise<void> {
  await ctx.db.transaction(async (tx) => {
    const session = await sessionFor(tx, user, id, "session.append", true);
    if (session.status !== "open") throw closed();
    const events = await sessionEventsOf(tx, id);
    const flow = await compiledVersion(tx, session.flowVersionId);
    const result = replaySession(flow, session.input, events.map((e) => e.payload));
    if (!result.ok || result.status !== "finding") {
      throw unprocessable("not_at_finding", "The session can be completed only once it has reached a finding.", { stepId: result.stepId });
    }
    const completedAt = new Date();
    // Computed once, here, so the review queue can filter on the count.
    const flags = sessionFlags({ flow, input: session.input, events: events.map(toStoredEvent), status: "completed", startedAt: session.startedAt, completedAt, now: completedAt }, await flagLimits({ db: tx }));
    await tx
      .update(diagnosticSessions)
      .set({ status: "completed", reviewState: "waiting", completedAt, currentStepId: result.stepId, findingStepId: result.findingStepId, flags, flagCount: flags.length })
      .where(eq(diagnosticSessions.id, id));
    await moveOnAfterSession(tx, user, session.workOrderId, id, "completed");
    await recordAudit(tx, { userId: user.id, action: "session.completed", recordType: "diagnostic_session", recordId: id, details: { findingStepId: result.findingStepId } });
  });
}

/** Abandons an open session; its events stay as they are, so nothing entered is lost. */
export async function abandonSession(ctx: Pick<AppContext, "db">, user: PublicUser, id: string, reason: string): Promise<void> {
  await ctx.db.transaction(async (tx) => {
    const session = await sessionFor(tx, user, id, "session.abandon", true);
    if (session.status !== "open") throw closed();
    await tx.update(diagnosticSessions).set({ status: "abandoned", abandonReason: reason }).where(eq(diagnosticSessions.id, id));
    await moveOnAfterSession(tx, user, session.workOrderId, id, "abandoned");
    await recordAudit(tx, { userId: user.id, action: "session.abandoned", recordType: "diagnostic_session", recordId: id, details: { reason } });
  });
}

/**
 * The tech takes a session the shop lead returned back to the bench: it is open again where it
 * stood, at its finding, so the tech can go back and redo what the comment asks. Every answer it had
 * stays in the log; completing it again sends it back for review with fresh flags.
 */
export async function reopenSession(ctx: Pick<AppContext, "db">, user: PublicUser, id: string): Promise<void> {
  await ctx.db.transaction(async (tx) => {
    const session = await sessionFor(tx, user, id, "session.append", true);
    if (session.status !== "completed" || session.reviewState !== "returned") {
      throw conflict("not_returned", "Only a session the shop lead returned can be opened again.", { status: session.status, reviewState: session.reviewState });
    }
    await tx.update(diagnosticSessions).set({ status: "open", completedAt: null, flags: null, flagCount: 0 }).where(eq(diagnosticSessions.id, id));
    await recordAudit(tx, { userId: user.id, action: "session.reopened", recordType: "diagnostic_session", recordId: id });
  });
}
