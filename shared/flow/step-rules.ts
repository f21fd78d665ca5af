// What an answer or a reading does at a step: the one place the machine's guards and replay's reasons come from.
import { z } from "zod";
import { MAX_ALTITUDE_M, MIN_ALTITUDE_M } from "../calc/atmosphere.ts";
import { evaluateCompression } from "../calc/compression.ts";
import { canonicalUnit, checkReading, convert, isUnit, unitLabel, type Unit } from "../calc/units.ts";
import { compressionReleaseValues, type EngineProfile } from "../equipment.ts";
import { bandContains, describeInterval } from "./bands.ts";
import type { CompiledStep } from "./compile.ts";
import { DONE, type Verdict } from "./schema.ts";

export interface FlowInput {
  profile: EngineProfile;
  altitudeM: number;
}

export const flowInputSchema = z.object({
  profile: z.object({
    cycle: z.union([z.literal(2), z.literal(4)]),
    compressionRelease: z.enum(compressionReleaseValues),
    displacementCc: z.number().positive().nullable(),
    specPsi: z
      .object({ min: z.number().positive(), max: z.number().positive() })
      .refine((s) => s.min <= s.max, { error: "the maker's minimum is above its maximum" })
      .nullable()
      .optional(),
  }),
  altitudeM: z.number().min(MIN_ALTITUDE_M).max(MAX_ALTITUDE_M),
});

export type RefusalCode =
  | "invalid_input"
  | "invalid_event"
  | "session_finished"
  | "wrong_step"
  | "wrong_event_for_step"
  | "unknown_option"
  | "not_a_number"
  | "unknown_unit"
  | "wrong_quantity"
  | "out_of_range"
  | "no_band"
  | "evaluation_failed"
  | "nothing_to_go_back_to";

export interface Refusal {
  ok: false;
  code: RefusalCode;
  reason: string;
}

export interface ReadingResult {
  ok: true;
  /** As entered. */
  value: number;
  unit: Unit;
  /** In the step's own unit, the one its bands are written in. */
  stepValue: number;
  stepUnit: Unit;
  canonical: number;
  canonicalUnit: Unit;
  verdict: Verdict;
  reason: string;
  /** The band's label, or null for an evaluation. */
  label: string | null;
  /** Which way the reading leads: "band:<index>" or the evaluation's verdict. */
  outcome: string;
  next: string;
  compression?: { seaLevelKPa: number; seaLevelPsi: number; ruleId: string };
}

/** Rounds to significant digits; toPrecision costs microseconds a call, this a few nanoseconds. */
export function roundSig(n: number, digits: number): number {
  if (n === 0 || !Number.isFinite(n)) return n;
  const exponent = digits - 1 - Math.floor(Math.log10(Math.abs(n)));
  if (exponent > 300) return n;
  // Dividing by an integer power of ten keeps the result the double nearest the decimal.
  return exponent >= 0 ? Math.round(n * 10 ** exponent) / 10 ** exponent : Math.round(n / 10 ** -exponent) * 10 ** -exponent;
}
const fmt = (n: number) => String(roundSig(n, 6));

/** Where an answer leads from a step, or null when the step takes no such answer. */
export function answerTarget(step: CompiledStep, value: string): string | null {
  if (step.kind === "instruction") return value === DONE ? step.next : null;
  if (step.kind === "choice") return step.options.find((o) => o.value === value)?.next ?? null;
  return null;
}

type Outcome = Pick<ReadingResult, "verdict" | "reason" | "label" | "outcome" | "next" | "compression">;

// Written out in full, extra keys first: on this V8, adding keys to an object or after a spread is slow.
function readingResult(check: { value: number; unit: Unit; canonical: number }, stepValue: number, stepUnit: Unit, canonical: Unit, o: Outcome): ReadingResult {
  const result: ReadingResult = {
    ok: true,
    value: check.value,
    unit: check.unit,
    stepValue,
    stepUnit,
    canonical: check.canonical,
    canonicalUnit: canonical,
    verdict: o.verdict,
    reason: o.reason,
    label: o.label,
    outcome: o.outcome,
    next: o.next,
  };
  return o.compression ? { compression: o.compression, ...result } : result;
}

export function evaluateReading(step: CompiledStep, value: unknown, unit: string, input: FlowInput): ReadingResult | Refusal {
  if (step.kind !== "reading" || !isUnit(step.unit)) {
    return { ok: false, code: "wrong_event_for_step", reason: `step "${step.id}" does not take a reading` };
  }
  const check = checkReading({ quantity: step.quantity, value, unit });
  if (!check.ok) return { ok: false, code: check.code, reason: check.reason };
  const stepUnit = step.unit;
  const stepValue = check.unit === stepUnit ? check.value : roundSig(convert(check.value, check.unit, stepUnit), 12);
  const canonical = canonicalUnit[step.quantity];
  if (step.evaluation) {
    let evaluated;
    try {
      evaluated = evaluateCompression({ gaugeKPa: convert(check.value, check.unit, "kPa"), altitudeM: input.altitudeM, profile: input.profile });
    } catch (e) {
      // Only a malformed engine profile or altitude gets here; the reading is refused, not the app.
      return { ok: false, code: "evaluation_failed", reason: `the compression check could not run: ${e instanceof Error ? e.message : String(e)}` };
    }
    const { verdict, reason } = evaluated;
    const compression = { seaLevelKPa: evaluated.seaLevelKPa, seaLevelPsi: evaluated.seaLevelPsi, ruleId: evaluated.rule.id };
    return readingResult(check, stepValue, stepUnit, canonical, { verdict, reason, label: null, outcome: verdict, next: step.evaluation.next[verdict], compression });
  }
  const bands = step.bands ?? [];
  const index = bands.findIndex((b) => bandContains(b, stepValue));
  const band = bands[index];
  const shown = `${fmt(check.value)} ${unitLabel(check.unit)}${check.unit === stepUnit ? "" : ` (${fmt(stepValue)} ${unitLabel(stepUnit)})`}`;
  if (!band) return { ok: false, code: "no_band", reason: `${shown} falls in none of this step's bands` };
  const reason = `${shown} is in "${band.label}" (${describeInterval(band.from, band.to, unitLabel(stepUnit))})`;
  return readingResult(check, stepValue, stepUnit, canonical, { verdict: band.verdict, reason, label: band.label, outcome: `band:${index}`, next: band.next });
}
