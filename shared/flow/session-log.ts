// replaySession: a session's whole log — the flow's own events through the machine, and the tablet's
// notes, photos and caution acknowledgements checked against the step the session stands at.
import { createActor, type Snapshot } from "xstate";
import { sessionEventBodySchema, type SessionEventBody } from "../schemas/sessions.ts";
import type { CompiledFlow, CompiledStep } from "./compile.ts";
import { currentStepId, type FlowContext } from "./context.ts";
import { explainRefusal, machineFor } from "./replay.ts";
import type { SignalWord } from "./schema.ts";
import { flowInputSchema, type FlowInput, type RefusalCode } from "./step-rules.ts";

export type SessionRefusalCode = RefusalCode | "annotation_wrong_step" | "unknown_caution" | "caution_not_acknowledged" | "photo_required";

/** Signal words a tech must acknowledge before answering the step. */
export const ACKNOWLEDGED_SIGNALS: readonly SignalWord[] = ["DANGER", "WARNING"];

export interface NoteRecord {
  text: string;
  /** The event's position in the log. */
  index: number;
}
export interface PhotoRecord {
  attachmentId: string;
  index: number;
}

export interface SessionAnnotations {
  notes: Record<string, NoteRecord[]>;
  photos: Record<string, PhotoRecord[]>;
  acknowledgements: Record<string, SignalWord[]>;
}

export type SessionReplay =
  | ({
      ok: true;
      stepId: string;
      status: "in_progress" | "finding";
      findingStepId: string | null;
      context: FlowContext;
      /** The machine's persisted snapshot: a live actor starts from it with createActor(machine, { snapshot }). */
      snapshot: Snapshot<unknown>;
    } & SessionAnnotations)
  | { ok: false; index: number; event: unknown; code: SessionRefusalCode; reason: string; stepId: string | null };

/** The DANGER and WARNING signals of a step not yet acknowledged, most severe first. */
export function unacknowledged(step: CompiledStep, acknowledged: readonly SignalWord[] = []): SignalWord[] {
  const present = new Set((step.cautions ?? []).map((c) => c.signal));
  return ACKNOWLEDGED_SIGNALS.filter((s) => present.has(s) && !acknowledged.includes(s));
}

/** Why leaving the step forward is not yet allowed, or null when it is. */
function gateOf(step: CompiledStep, a: SessionAnnotations): { code: SessionRefusalCode; reason: string } | null {
  const missing = unacknowledged(step, a.acknowledgements[step.id]);
  if (missing.length > 0) {
    return { code: "caution_not_acknowledged", reason: `step "${step.id}" has a ${missing.join(" and a ")} caution; acknowledge it (caution.acknowledge) before answering` };
  }
  if (step.photo?.requirement === "required" && !(a.photos[step.id]?.length ?? 0)) {
    return { code: "photo_required", reason: `step "${step.id}" needs a photo (${step.photo.prompt}) before the session moves on` };
  }
  return null;
}

const annotationNames = { "note.add": "note", "photo.attach": "photo", "caution.acknowledge": "caution acknowledgement" } as const;

export function replaySession(compiled: CompiledFlow, input: FlowInput, events: readonly SessionEventBody[]): SessionReplay {
  const checked = flowInputSchema.safeParse(input);
  if (!checked.success) return { ok: false, index: -1, event: null, code: "invalid_input", reason: "the session's engine facts are not usable", stepId: null };
  const annotations: SessionAnnotations = { notes: {}, photos: {}, acknowledgements: {} };
  const actor = createActor(machineFor(compiled), { input }).start();
  try {
    let snapshot = actor.getSnapshot();
    for (let index = 0; index < events.length; index++) {
      const raw: unknown = events[index];
      const refuse = (code: SessionRefusalCode, reason: string): SessionReplay => ({ ok: false, index, event: raw, code, reason, stepId: currentStepId(snapshot.context) });
      const parsed = sessionEventBodySchema.safeParse(raw);
      if (!parsed.success) return refuse("invalid_event", `the event is not a session event: ${parsed.error.issues.map((i) => i.message).join("; ")}`);
      const event = parsed.data;
      const here = currentStepId(snapshot.context);
      const step = compiled.steps[here]!;
      if (event.type === "note.add" || event.type === "photo.attach" || event.type === "caution.acknowledge") {
        if (event.stepId !== here) return refuse("annotation_wrong_step", `the ${annotationNames[event.type]} is for step "${event.stepId}", but the session stands at "${here}"`);
        if (event.type === "note.add") (annotations.notes[here] ??= []).push({ text: event.text, index });
        else if (event.type === "photo.attach") (annotations.photos[here] ??= []).push({ attachmentId: event.attachmentId, index });
        else {
          if (!(step.cautions ?? []).some((c) => c.signal === event.signal)) return refuse("unknown_caution", `step "${here}" has no ${event.signal} caution to acknowledge`);
          const acks = (annotations.acknowledgements[here] ??= []);
          if (!acks.includes(event.signal)) acks.push(event.signal);
        }
        continue;
      }
      if (snapshot.hasTag("finding") && event.type !== "step.back") return refuse("session_finished", `the session already reached the finding "${here}"; only going back can follow it`);
      if ((event.type === "step.answer" || event.type === "step.record") && event.stepId === here) {
        const gate = gateOf(step, annotations);
        if (gate) return refuse(gate.code, gate.reason);
      }
      actor.send(event);
      const next = actor.getSnapshot();
      // The machine leaves the very same snapshot when it refuses an event.
      if (next === snapshot) {
        const why = explainRefusal(compiled, snapshot.context, event);
        return refuse(why.code, why.reason);
      }
      snapshot = next;
    }
    const stepId = currentStepId(snapshot.context);
    const finished = snapshot.hasTag("finding");
    return {
      ok: true,
      stepId,
      status: finished ? "finding" : "in_progress",
      findingStepId: finished ? stepId : null,
      context: snapshot.context,
      snapshot: actor.getPersistedSnapshot(),
      ...annotations,
    };
  } finally {
    actor.stop();
  }
}
