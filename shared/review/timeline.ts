// A session's timeline for review: every step the tech reached, in order, with what they did there.
import { createActor } from "xstate";
import { convert, preferredUnit, quantityOf, systemOf, unitLabel, type Unit } from "../calc/units.ts";
import type { UnitSystem } from "../equipment.ts";
import type { CompiledFlow, CompiledStep } from "../flow/compile.ts";
import { currentStepId } from "../flow/context.ts";
import { machineFor } from "../flow/replay.ts";
import type { SignalWord, Verdict } from "../flow/schema.ts";
import { replaySession } from "../flow/session-log.ts";
import { roundSig, type FlowInput } from "../flow/step-rules.ts";
import { sessionEventBodySchema, type SessionEventBody } from "../schemas/sessions.ts";

export interface Amount {
  value: number;
  unit: Unit;
  /** The unit as printed: "psi", "kPa", "Ω". */
  unitLabel: string;
}

export type TimelineAnswer =
  | { kind: "done" }
  | { kind: "choice"; value: string; label: string }
  | {
      kind: "reading";
      /** As the tech entered it. */
      entered: Amount;
      /** In the viewer's unit system, or null when that is the unit it was entered in. */
      converted: Amount | null;
      verdict: Verdict;
      reason: string;
      /** The band's label, or null for an evaluation. */
      band: string | null;
    };

export interface Stamped {
  /** The tablet's ISO time. */
  at: string;
}

/** What the tech added at a step besides the answer. */
export interface Annotations {
  photos: (Stamped & { attachmentId: string })[];
  notes: (Stamped & { text: string })[];
  cautions: (Stamped & { signal: SignalWord })[];
}

export interface StepEntry extends Annotations {
  kind: "step";
  /** Unique within the timeline, for keys and anchors. */
  key: string;
  stepId: string;
  title: string;
  stepKind: "instruction" | "choice" | "reading";
  /** When the session got to the step: the event that led here, or the session's start. */
  reachedAt: string;
  answer: TimelineAnswer | null;
  answeredAt: string | null;
  /** From the event before the answer to the answer (the measure the step_too_fast flag uses); null without an answer or a readable time. */
  seconds: number | null;
  /** The answer this one replaced after the tech went back, when it was different. */
  changedFrom: TimelineAnswer | null;
  /** A later step.back or session.restart took this answer back. */
  undone: boolean;
  /** How the tech left the step, or null when the session ended (or stands) here. */
  left: { by: "answer" | "back" | "restart"; at: string } | null;
}

export interface FindingEntry extends Annotations {
  kind: "finding";
  key: string;
  stepId: string;
  title: string;
  certainty: "confirmed" | "likely";
  reachedAt: string;
  /** When the tech went back from this finding (a returned session being revised); null while it stands. */
  takenBackAt: string | null;
}

export interface AbandonedEntry {
  kind: "abandoned";
  key: string;
  /** The step the session stood at. */
  stepId: string;
  reason: string | null;
}

/** The stored log stops making sense here (the flow engine refuses the event); nothing after it is shown. */
export interface UnreadableEntry {
  kind: "unreadable";
  key: string;
  index: number;
  reason: string;
}

export type TimelineEntry = StepEntry | FindingEntry | AbandonedEntry | UnreadableEntry;

export interface TimelineSession {
  flow: CompiledFlow;
  input: FlowInput;
  events: readonly { recordedAt: string; event: unknown }[];
  startedAt: string;
  status: "open" | "completed" | "abandoned";
  abandonReason?: string | null;
}

function amount(value: number, unit: Unit): Amount {
  return { value, unit, unitLabel: unitLabel(unit) };
}

/** The reading in the viewer's unit system, to four significant figures; null when it was entered in that system (or one both share). */
export function convertedFor(value: number, unit: Unit, system: UnitSystem): Amount | null {
  const own = systemOf(unit);
  if (own === null || own === system) return null;
  const target = preferredUnit(quantityOf(unit), system);
  return amount(roundSig(convert(value, unit, target), 4), target);
}

function sameAnswer(a: TimelineAnswer, b: TimelineAnswer): boolean {
  if (a.kind === "choice" && b.kind === "choice") return a.value === b.value;
  if (a.kind === "reading" && b.kind === "reading") return a.entered.value === b.entered.value && a.entered.unit === b.entered.unit;
  return a.kind === b.kind;
}

function answerOf(step: CompiledStep, value: string): TimelineAnswer {
  if (step.kind !== "choice") return { kind: "done" };
  return { kind: "choice", value, label: step.options.find((o) => o.value === value)?.label ?? value };
}

const seconds = (from: number, to: number) => (Number.isFinite(from) && Number.isFinite(to) ? (to - from) / 1000 : null);

/**
 * The session as review reads it. Runs the flow's own machine over the log, so every branch and
 * verdict is the one the bench saw; a log the engine refuses is shown up to the refused event.
 */
export function sessionTimeline(session: TimelineSession, unitSystem: UnitSystem): TimelineEntry[] {
  const { flow, input, events } = session;
  const replayed = replaySession(flow, input, events.map((e) => e.event as SessionEventBody));
  const readable = replayed.ok ? events.length : Math.max(0, replayed.index);
  const entries: TimelineEntry[] = [];
  const actor = createActor(machineFor(flow), { input }).start();
  // The visits whose answers stand, oldest first, and answers taken back, by step, until answered again.
  const standing: StepEntry[] = [];
  const takenBack = new Map<string, TimelineAnswer>();
  const visit = (stepId: string, at: string): StepEntry | FindingEntry => {
    const step = flow.steps[stepId]!;
    const key = `${entries.length}-${stepId}`;
    const entry: StepEntry | FindingEntry =
      step.kind === "finding"
        ? { kind: "finding", key, stepId, title: step.title, certainty: step.certainty, reachedAt: at, takenBackAt: null, photos: [], notes: [], cautions: [] }
        : { kind: "step", key, stepId, title: step.title, stepKind: step.kind, reachedAt: at, answer: null, answeredAt: null, seconds: null, changedFrom: null, undone: false, left: null, photos: [], notes: [], cautions: [] };
    entries.push(entry);
    return entry;
  };
  const takeBack = (entry: StepEntry) => {
    entry.undone = true;
    if (entry.answer) takenBack.set(entry.stepId, entry.answer);
  };
  let here = visit(flow.start, session.startedAt);
  try {
    let previous = Date.parse(session.startedAt);
    for (let index = 0; index < readable; index++) {
      const { recordedAt: at, event: raw } = events[index]!;
      const since = previous;
      const time = Date.parse(at);
      if (Number.isFinite(time)) previous = time;
      const event = sessionEventBodySchema.parse(raw);
      const current = here;
      if (event.type === "photo.attach") current.photos.push({ at, attachmentId: event.attachmentId });
      else if (event.type === "note.add") current.notes.push({ at, text: event.text });
      else if (event.type === "caution.acknowledge") current.cautions.push({ at, signal: event.signal });
      // At a finding only going back is taken (the replay stops before anything else).
      else if (current.kind === "finding") {
        actor.send(event);
        current.takenBackAt = at;
        const returnedTo = standing.pop();
        if (returnedTo) takeBack(returnedTo);
        here = visit(currentStepId(actor.getSnapshot().context), at);
      } else {
        actor.send(event);
        const context = actor.getSnapshot().context;
        if (event.type === "step.back") {
          current.left = { by: "back", at };
          const returnedTo = standing.pop();
          if (returnedTo) takeBack(returnedTo);
        } else if (event.type === "session.restart") {
          current.left = { by: "restart", at };
          standing.splice(0).forEach(takeBack);
        } else {
          const step = flow.steps[event.stepId]!;
          const reading = event.type === "step.record" ? context.readings.at(-1) : undefined;
          const answer: TimelineAnswer = reading
            ? { kind: "reading", entered: amount(reading.value, reading.unit), converted: convertedFor(reading.value, reading.unit, unitSystem), verdict: reading.verdict, reason: reading.reason, band: reading.label }
            : answerOf(step, event.type === "step.answer" ? event.value : "");
          const earlier = takenBack.get(step.id);
          takenBack.delete(step.id);
          current.answer = answer;
          current.answeredAt = at;
          current.seconds = seconds(since, time);
          current.changedFrom = earlier && !sameAnswer(earlier, answer) ? earlier : null;
          current.left = { by: "answer", at };
          standing.push(current);
        }
        here = visit(currentStepId(context), at);
      }
    }
  } finally {
    actor.stop();
  }
  if (!replayed.ok) entries.push({ kind: "unreadable", key: `${entries.length}-unreadable`, index: replayed.index, reason: replayed.reason });
  if (session.status === "abandoned") entries.push({ kind: "abandoned", key: `${entries.length}-abandoned`, stepId: here.stepId, reason: session.abandonReason ?? null });
  return entries;
}
