import { eq } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import { diagnosticSessions, type DiagnosticSessionRow } from "../db/schema.ts";
import { authorize, can } from "../auth/policies.ts";
import { conflict, notFound } from "../lib/errors.ts";
import { recordAudit } from "./audit.ts";
import { compiledVersion } from "./flows.ts";
import { flagLimits } from "./settings.ts";
import { sessionEventsOf, toStoredEvent } from "./sessions.ts";
import { sessionFlags } from "../../shared/review/flags.ts";
import type { ReviewDecisionRequest, SessionFlagsResponse } from "../../shared/schemas/review.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

/**
 * The shop lead's sign-off on a completed session waiting for review. Approving closes the review;
 * returning sends it back to the tech's bench with the comment. Either way every event is kept.
 */
export async function reviewSession(ctx: Pick<AppContext, "db">, user: PublicUser, id: string, body: ReviewDecisionRequest): Promise<DiagnosticSessionRow> {
  authorize(user, "session.review");
  return ctx.db.transaction(async (tx) => {
    const [session] = await tx.select().from(diagnosticSessions).where(eq(diagnosticSessions.id, id)).for("update");
    if (!session) throw notFound("There is no such session.");
    if (session.status !== "completed" || session.reviewState !== "waiting") {
      throw conflict("not_waiting_for_review", "Only a completed session waiting for review can be signed off.", { status: session.status, reviewState: session.reviewState });
    }
    const reviewState = body.decision === "approve" ? "approved" : "returned";
    const [row] = await tx
      .update(diagnosticSessions)
      .set({ reviewState, reviewerId: user.id, reviewComment: body.comment === "" ? null : body.comment, reviewedAt: new Date() })
      .where(eq(diagnosticSessions.id, id))
      .returning();
    await recordAudit(tx, { userId: user.id, action: `session.${reviewState}`, recordType: "diagnostic_session", recordId: id, details: { comment: body.comment } });
    return row!;
  });
}

/** The session's flags: as stored when it was completed, or worked out now for one that is not. */
export async function flagsOfSession(ctx: Pick<AppContext, "db">, user: PublicUser, id: string, now = new Date()): Promise<SessionFlagsResponse> {
  const [session] = await ctx.db.select().from(diagnosticSessions).where(eq(diagnosticSessions.id, id));
  if (!session || !can(user, "session.flags", { ownerId: session.techId })) throw notFound("There is no such session.");
  if (session.flags) return { sessionId: id, computedAt: (session.completedAt ?? now).toISOString(), flags: session.flags };
  const events = await sessionEventsOf(ctx.db, id);
  const flow = await compiledVersion(ctx.db, session.flowVersionId);
  const flags = sessionFlags({ flow, input: session.input, events: events.map(toStoredEvent), status: session.status, startedAt: session.startedAt, completedAt: session.completedAt, now }, await flagLimits(ctx));
  return { sessionId: id, computedAt: now.toISOString(), flags };
}
