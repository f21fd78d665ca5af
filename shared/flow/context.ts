// The machine's context and the views the UI and review read from it.
import type { EngineProfile } from "../equipment.ts";
import type { ReadingResult } from "./step-rules.ts";

export interface AnswerRecord {
  stepId: string;
  value: string;
  /** Which accepted event gave it (0-based), so answers and readings interleave in order. */
  seq: number;
}

export type ReadingRecord = Omit<ReadingResult, "ok" | "outcome" | "next"> & { stepId: string; seq: number };

/**
 * Answers and readings are append-only logs rather than records keyed by step id: copying a keyed
 * record on every event costs time in the square of the session (measured about 220 µs an event at
 * 1,000 answers), a log copy stays cheap; answersByStep gives the keyed view.
 */
export interface FlowContext {
  profile: EngineProfile;
  altitudeM: number;
  /** Steps visited, the current one last; step.back pops it. */
  path: string[];
  /** Every answer, in order; an answer given again after going back is a later revision. */
  answers: AnswerRecord[];
  readings: ReadingRecord[];
  /** Events accepted so far. */
  seq: number;
  restarts: number;
}

export function initialContext(input: { profile: EngineProfile; altitudeM: number }, start: string): FlowContext {
  return { profile: input.profile, altitudeM: input.altitudeM, path: [start], answers: [], readings: [], seq: 0, restarts: 0 };
}

export function currentStepId(context: FlowContext): string {
  return context.path[context.path.length - 1]!;
}

/** Every answer by step id, oldest first: the last one stands, the earlier ones are revisions. */
export function answersByStep(context: FlowContext): Record<string, AnswerRecord[]> {
  const out: Record<string, AnswerRecord[]> = {};
  for (const a of context.answers) (out[a.stepId] ??= []).push(a);
  return out;
}

export function readingsByStep(context: FlowContext): Record<string, ReadingRecord[]> {
  const out: Record<string, ReadingRecord[]> = {};
  for (const r of context.readings) (out[r.stepId] ??= []).push(r);
  return out;
}

export function latestAnswer(context: FlowContext, stepId: string): AnswerRecord | null {
  for (let i = context.answers.length - 1; i >= 0; i--) if (context.answers[i]!.stepId === stepId) return context.answers[i]!;
  return null;
}

export function latestReading(context: FlowContext, stepId: string): ReadingRecord | null {
  for (let i = context.readings.length - 1; i >= 0; i--) if (context.readings[i]!.stepId === stepId) return context.readings[i]!;
  return null;
}
