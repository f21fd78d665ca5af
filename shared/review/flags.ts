// Automatic review flags: what a shop lead should look at twice in a session's log.
import type { CompiledFlow } from "../flow/compile.ts";
import type { SignalWord } from "../flow/schema.ts";
import { unacknowledged } from "../flow/session-log.ts";
import { evaluateReading, type FlowInput } from "../flow/step-rules.ts";
import { sessionEventBodySchema } from "../schemas/sessions.ts";

export const flagCodes = ["reading_implausible", "step_too_fast", "photo_missing", "caution_not_acknowledged", "open_too_long"] as const;
export type FlagCode = (typeof flagCodes)[number];

export interface SessionFlag {
  code: FlagCode;
  /** The step the flag is about, or null for the session as a whole. */
  stepId: string | null;
  reason: string;
}

export interface FlagLimits {
  /** A session still open (or completed) this many hours after it began is flagged. */
  openHours: number;
}
export const DEFAULT_FLAG_LIMITS: FlagLimits = { openHours: 24 };

export interface FlaggedSession {
  flow: CompiledFlow;
  input: FlowInput;
  /** The stored log in order; recordedAt is the tablet's ISO time. */
  events: readonly { recordedAt: string; event: unknown }[];
  status: "open" | "completed" | "abandoned";
  startedAt: Date;
  /** When the session was completed, if it was. */
  completedAt?: Date | null;
  /** The time an open session is judged at. */
  now: Date;
}

const seconds = (ms: number) => Math.round(ms / 1000);
const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;

/**
 * The session's flags, in the order of the log; each step gets at most one flag of each code.
 * Works on the raw log, so a log the flow engine would refuse is still flagged as far as it can be read.
 */
export function sessionFlags(session: FlaggedSession, limits: FlagLimits = DEFAULT_FLAG_LIMITS): SessionFlag[] {
  const { flow, input } = session;
  const flags: SessionFlag[] = [];
  const seen = new Set<string>();
  const add = (flag: SessionFlag) => {
    const key = `${flag.code} ${flag.stepId ?? ""}`;
    if (seen.has(key)) return;
    seen.add(key);
    flags.push(flag);
  };
  const photos = new Set<string>();
  const acknowledged: Record<string, SignalWord[]> = {};
  let previous = session.startedAt.getTime();
  for (const stored of session.events) {
    const at = Date.parse(stored.recordedAt);
    const since = previous;
    if (Number.isFinite(at)) previous = at;
    const parsed = sessionEventBodySchema.safeParse(stored.event);
    if (!parsed.success) continue;
    const event = parsed.data;
    if (event.type === "photo.attach") photos.add(event.stepId);
    if (event.type === "caution.acknowledge") (acknowledged[event.stepId] ??= []).push(event.signal);
    if (event.type !== "step.answer" && event.type !== "step.record") continue;
    const step = flow.steps[event.stepId];
    if (!step) continue;
    if (event.type === "step.record") {
      const result = evaluateReading(step, event.value, event.unit, input);
      if (result.ok && result.verdict === "implausible") {
        add({ code: "reading_implausible", stepId: step.id, reason: `"${step.title}": ${event.value} ${event.unit} is implausible for this engine (${result.reason}). Check the gauge and the entry.` });
      }
    }
    if (step.kind === "instruction" && step.minSeconds !== undefined && Number.isFinite(at)) {
      const spent = seconds(at - since);
      if (spent < step.minSeconds) {
        add({ code: "step_too_fast", stepId: step.id, reason: `"${step.title}" was done in ${plural(spent, "second")}; it takes at least ${plural(step.minSeconds, "second")}.` });
      }
    }
    if (step.photo?.requirement === "required" && !photos.has(step.id)) {
      add({ code: "photo_missing", stepId: step.id, reason: `"${step.title}" needs a photo (${step.photo.prompt}), and none was attached.` });
    }
    const missing = unacknowledged(step, acknowledged[step.id]);
    if (missing.length > 0) {
      add({ code: "caution_not_acknowledged", stepId: step.id, reason: `"${step.title}" was answered without acknowledging its ${missing.join(" and ")} caution.` });
    }
  }
  const end = session.status === "open" ? session.now : (session.completedAt ?? null);
  if (end && session.status !== "abandoned") {
    const hours = (end.getTime() - session.startedAt.getTime()) / 3_600_000;
    if (hours > limits.openHours) {
      const shown = Math.floor(hours);
      const still = session.status === "open" ? "has been open" : "was open";
      add({ code: "open_too_long", stepId: null, reason: `The session ${still} for ${plural(shown, "hour")}, more than the ${plural(limits.openHours, "hour")} a session should take.` });
    }
  }
  return flags;
}
