// Runs a session on the tablet: a live actor of the shared flow machine says where the session
// stands and what it takes; replaySession checks notes, photos and cautions; the log saves in order.
import { useMemo, useState } from "react";
import { useActorRef, useSelector } from "@xstate/react";
import { v7 as uuidv7 } from "uuid";
import type { CompiledFlow, CompiledStep } from "../../../../shared/flow/compile.ts";
import { currentStepId } from "../../../../shared/flow/context.ts";
import { machineFor } from "../../../../shared/flow/replay.ts";
import { replaySession, unacknowledged } from "../../../../shared/flow/session-log.ts";
import type { FlowEvent } from "../../../../shared/flow/schema.ts";
import type { FlowInput } from "../../../../shared/flow/step-rules.ts";
import type { SessionEventBody } from "../../../../shared/schemas/sessions.ts";
import { photoFileProblem } from "../api/upload-photo.ts";
import type { SessionLog } from "./use-session-log.ts";

export type { SaveState } from "./use-session-log.ts";

const flowEventTypes = new Set<SessionEventBody["type"]>(["step.answer", "step.record", "step.back", "session.restart"]);
const isFlowEvent = (event: SessionEventBody): event is FlowEvent & SessionEventBody => flowEventTypes.has(event.type);

export interface RunTarget {
  sessionId: string;
  input: FlowInput;
}

function replayOrThrow(compiled: CompiledFlow, input: FlowInput, events: readonly SessionEventBody[]) {
  const replayed = replaySession(compiled, input, events);
  if (!replayed.ok) throw new Error(`The saved session does not replay: ${replayed.reason}`);
  return replayed;
}

/**
 * The screen's runner. Mount it under a key of `log.generation`: when the log is put back on the
 * server's, the actor starts again from the replayed log.
 */
export function useSessionRunner(run: RunTarget, compiled: CompiledFlow, session: SessionLog) {
  const { store, log, save, saveEvent, savePhoto, keepPhoto } = session;
  const events = useMemo(() => log.requests.map((r) => r.event), [log.requests]);
  const replayed = useMemo(() => replayOrThrow(compiled, run.input, events), [compiled, run.input, events]);

  // The actor starts where the log stands when the screen mounts, then takes each flow event as it is given.
  const [start] = useState(() => replayed.snapshot);
  const actor = useActorRef(machineFor(compiled), { input: run.input, snapshot: start });
  const snapshot = useSelector(actor, (s) => s);
  const step: CompiledStep = compiled.steps[currentStepId(snapshot.context)]!;

  /** Whether the machine takes this flow event now; the annotation gates are checked on send. */
  const can = (event: FlowEvent) => snapshot.can(event);
  const missingAcks = unacknowledged(step, replayed.acknowledgements[step.id]);
  const photos = replayed.photos[step.id] ?? [];
  const photoMissing = step.photo?.requirement === "required" && photos.length === 0;

  /** Why the shared rules refuse the event after the log, or null when they take it. */
  const refusal = (event: SessionEventBody): string | null => {
    const check = replaySession(compiled, run.input, [...store.getSnapshot().requests.map((r) => r.event), event]);
    return check.ok ? null : check.reason;
  };

  /** Applies the event at once if the shared rules take it, then saves it; answers the refusal otherwise. */
  const send = (event: SessionEventBody): string | null => {
    const refused = refusal(event);
    if (refused) return refused;
    const request = store.append(event, uuidv7(), new Date());
    saveEvent({ sessionId: run.sessionId, request });
    if (isFlowEvent(event)) actor.send(event);
    return null;
  };

  /** Keeps the picture on the tablet, queues it, and names it in the session at once: the tech goes on while it is sent. */
  const takePhoto = async (stepId: string, file: File): Promise<string | null> => {
    const attachmentId = uuidv7();
    const event: SessionEventBody = { type: "photo.attach", stepId, attachmentId };
    const problem = photoFileProblem(file) ?? refusal(event);
    if (problem) return problem;
    try {
      await keepPhoto(attachmentId, file);
    } catch {
      return "The tablet could not keep the photo (its storage may be full). Free some space and take it again.";
    }
    savePhoto({ sessionId: run.sessionId, stepId, attachmentId });
    return send(event);
  };

  return {
    step,
    replayed,
    snapshot,
    can,
    send,
    takePhoto,
    save,
    missingAcks,
    photos,
    photoMissing,
    lastRequest: log.requests.at(-1),
    problem: log.problem,
    dismissProblem: () => store.dismissProblem(),
  };
}

export type SessionRunner = ReturnType<typeof useSessionRunner>;
