import { eq } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import { diagnosticSessions } from "../db/schema.ts";
import { conflict, unprocessable } from "../lib/errors.ts";
import { recordAudit } from "./audit.ts";
import { compiledVersion } from "./flows.ts";
import { sessionEventsOf, sessionFor } from "./sessions.ts";
import { replaySession } from "../../shared/flow/session-log.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

const closed = () => conflict("session_closed", "This session is already completed or abandoned.");

/** Completes the session when its replay stands at a finding, and sends it for review. */
export async function completeSession(ctx: Pick<AppContext, "db">, user: PublicUser, id: string): Promise<void> {
  await ctx.db.transaction(async (tx) => {
    const session = await sessionFor(tx, user, id, "session.append", true);
    if (session.status !== "open") throw closed();
    const events = await sessionEventsOf(tx, id);
    const result = replaySession(await compiledVersion(tx, session.flowVersionId), session.input, events.map((e) => e.payload));
    if (!result.ok || result.status !== "finding") {
      throw unprocessable("not_at_finding", "The session can be completed only once it has reached a finding.", { stepId: result.stepId });
    }
    await tx
      .update(diagnosticSessions)
      .set({ status: "completed", reviewState: "waiting", completedAt: new Date(), currentStepId: result.stepId, findingStepId: result.findingStepId })
      .where(eq(diagnosticSessions.id, id));
    await recordAudit(tx, { userId: user.id, action: "session.completed", recordType: "diagnostic_session", recordId: id, details: { findingStepId: result.findingStepId } });
  });
}

/** Abandons an open session; its events stay as they are, so nothing entered is lost. */
export async function abandonSession(ctx: Pick<AppContext, "db">, user: PublicUser, id: string, reason: string): Promise<void> {
  await ctx.db.transaction(async (tx) => {
    const session = await sessionFor(tx, user, id, "session.abandon", true);
    if (session.status !== "open") throw closed();
    await tx.update(diagnosticSessions).set({ status: "abandoned", abandonReason: reason }).where(eq(diagnosticSessions.id, id));
    await recordAudit(tx, { userId: user.id, action: "session.abandoned", recordType: "diagnostic_session", recordId: id, details: { reason } });
  });
}
