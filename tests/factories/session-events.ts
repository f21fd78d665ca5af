import { v7 as uuidv7 } from "uuid";
import type { CompiledFlow } from "../../shared/flow/compile.ts";
import { unacknowledged } from "../../shared/flow/session-log.ts";
import type { AppendEventRequest, SessionEventBody } from "../../shared/schemas/sessions.ts";

/** A scripted visit: [step, answer] for choices and instructions ("done"), [step, { value, unit }] for readings. */
export type Move = [stepId: string, answer: string | { value: number; unit: string }];

export function moveEvent([stepId, answer]: Move): SessionEventBody {
  return typeof answer === "string" ? { type: "step.answer", stepId, value: answer } : { type: "step.record", stepId, value: answer.value, unit: answer.unit };
}

/** The shortest way to a finding in the handheld 2-stroke flow: the controls were not set for a start. */
export const handheldToFinding: Move[] = [
  ["prepare/protect", "done"],
  ["prepare/as-received", "done"],
  ["prepare/secure", "done"],
  ["prepare/controls", "no"],
  ["prepare/controls-retry", "done"],
  ["prepare/controls-result", "yes"],
];

/** Each move preceded by what its step asks for first: DANGER/WARNING acknowledgements and a required photo. */
export function gatedEvents(flow: CompiledFlow, moves: readonly Move[], photoId: (stepId: string) => string): SessionEventBody[] {
  return moves.flatMap((move) => {
    const step = flow.steps[move[0]];
    if (!step) return [moveEvent(move)];
    const gates: SessionEventBody[] = unacknowledged(step).map((signal) => ({ type: "caution.acknowledge", stepId: step.id, signal }));
    if (step.photo?.requirement === "required") gates.push({ type: "photo.attach", stepId: step.id, attachmentId: photoId(step.id) });
    return [...gates, moveEvent(move)];
  });
}

/** The request bodies a tablet would send, numbered from `firstSeq`. */
export function appendRequests(events: readonly SessionEventBody[], firstSeq = 1): AppendEventRequest[] {
  return events.map((event, i) => ({ id: uuidv7(), seq: firstSeq + i, recordedAt: new Date().toISOString(), event }));
}
