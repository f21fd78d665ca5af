// The hot path: one short transaction per saved event, with nothing but database work inside it.
import { isDeepStrictEqual } from "node:util";
import { and, eq } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import { attachments, diagnosticSessions, sessionEvents, type SessionEventRow } from "../db/schema.ts";
import { conflict, unprocessable } from "../lib/errors.ts";
import { compiledVersion } from "./flows.ts";
import { sessionEventsOf, sessionFor, toStoredEvent } from "./sessions.ts";
import { replaySession } from "../../shared/flow/session-log.ts";
import type { AppendEventRequest, StoredEvent } from "../../shared/schemas/sessions.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

export interface AppendResult {
  stored: boolean;
  event: StoredEvent;
  currentStepId: string;
  findingStepId: string | null;
}

const sameEvent = (row: SessionEventRow, req: AppendEventRequest) =>
  row.seq === req.seq && row.recordedAt.getTime() === Date.parse(req.recordedAt) && isDeepStrictEqual(row.payload, req.event);

const refused = (code: string, reason: string, stepId: string | null) =>
  unprocessable("event_refused", `The event was refused: ${reason}.`, { code, reason, stepId });

export async function appendEvent(ctx: Pick<AppContext, "db">, user: PublicUser, sessionId: string, req: AppendEventRequest): Promise<AppendResult> {
  return ctx.db.transaction(async (tx) => {
    // The row lock puts concurrent saves to one session in a queue, so seq checks cannot race.
    const session = await sessionFor(tx, user, sessionId, "session.append", true);
    const [existing] = await tx.select().from(sessionEvents).where(eq(sessionEvents.id, req.id));
    if (existing) {
      if (existing.sessionId !== sessionId || !sameEvent(existing, req)) {
        throw conflict("event_id_conflict", "An event with this id was already saved with different contents.", { eventId: req.id });
      }
      return { stored: false, event: toStoredEvent(existing), currentStepId: session.currentStepId, findingStepId: session.findingStepId };
    }
    if (session.status !== "open") throw conflict("session_closed", "This session is already completed or abandoned; it takes no more events.");
    const stored = await sessionEventsOf(tx, sessionId);
    const expectedSeq = stored.length + 1;
    if (req.seq !== expectedSeq) throw conflict("seq_mismatch", `The server expected event number ${expectedSeq}.`, { expectedSeq });
    if (req.event.type === "photo.attach") {
      const [photo] = await tx
        .select({ stepId: attachments.stepId })
        .from(attachments)
        .where(and(eq(attachments.id, req.event.attachmentId), eq(attachments.ownerType, "session"), eq(attachments.ownerId, sessionId)));
      if (!photo || photo.stepId !== req.event.stepId) throw refused("unknown_attachment", `no photo ${req.event.attachmentId} was uploaded to this session for step "${req.event.stepId}"`, session.currentStepId);
    }
    const result = replaySession(await compiledVersion(tx, session.flowVersionId), session.input, [...stored.map((e) => e.payload), req.event]);
    if (!result.ok) throw refused(result.code, result.reason, result.stepId);
    const [row] = await tx
      .insert(sessionEvents)
      .values({ id: req.id, sessionId, seq: req.seq, type: req.event.type, payload: req.event, recordedAt: new Date(req.recordedAt) })
      .returning();
    await tx.update(diagnosticSessions).set({ currentStepId: result.stepId, findingStepId: result.findingStepId }).where(eq(diagnosticSessions.id, sessionId));
    // No audit row per event: the event row itself records who (the session's tech), what and when, and a second write would double the hot path's cost.
    return { stored: true, event: toStoredEvent(row!), currentStepId: result.stepId, findingStepId: result.findingStepId };
  });
}
