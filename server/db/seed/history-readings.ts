// Gauge and feeler readings for the invented history: a plausible value for the outcome the walk
// needs, in the tech's own units, checked against the flow's own rules before it is used.
import { seaLevelEquivalentGauge } from "../../../shared/calc/atmosphere.ts";
import { evaluateCompression } from "../../../shared/calc/compression.ts";
import { convert, preferredUnit, type Unit } from "../../../shared/calc/units.ts";
import type { UnitSystem } from "../../../shared/equipment.ts";
import type { CompiledStep } from "../../../shared/flow/compile.ts";
import { evaluateReading, type FlowInput } from "../../../shared/flow/step-rules.ts";
import type { Move } from "./history-guide.ts";
import type { Random } from "./random.ts";

type Range = readonly [number, number];

// Sea-level cranking pressure in psi a healthy, tired or failing engine of each kind reads: the
// middle of each band of shared/calc/compression.ts, where a real gauge usually lands.
const typical: Record<string, Record<"good" | "marginal" | "low", readonly Range[]>> = {
  two_stroke: { good: [[100, 165]], marginal: [[80, 89]], low: [[40, 75]] },
  four_stroke_release: { good: [[60, 75]], marginal: [[32, 58], [77, 88]], low: [[8, 24]] },
  four_stroke_release_unknown: { good: [[60, 75]], marginal: [[32, 58], [77, 88]], low: [[8, 24]] },
  four_stroke_no_release: { good: [[90, 135]], marginal: [[80, 89]], low: [[35, 75]] },
};

function rounded(value: number, unit: Unit): number {
  switch (unit) {
    case "psi":
      return Math.round(value);
    case "kPa":
      return Math.round(value / 5) * 5;
    case "in":
      return Math.round(value * 1000) / 1000;
    default:
      return Math.round(value * 100) / 100;
  }
}

function outcomeOf(step: CompiledStep, value: number, unit: Unit, input: FlowInput): string | null {
  const result = evaluateReading(step, value, unit, input);
  return result.ok ? result.outcome : null;
}

function compressionTry(step: CompiledStep, verdict: string, input: FlowInput, unit: Unit, rng: Random): number {
  const toGauge = 1 / seaLevelEquivalentGauge(1, input.altitudeM);
  const ruleId = evaluateCompression({ gaugeKPa: 400, altitudeM: input.altitudeM, profile: input.profile }).rule.id;
  const good = rng.between(...(typical[ruleId] ?? typical.two_stroke!).good[0]!) * toGauge;
  if (verdict === "implausible") {
    // Two slips a shop sees: the kPa figure typed into a psi field, or a needle resting below zero.
    if (rng.chance(0.55)) return rounded(unit === "psi" ? convert(good, "psi", "kPa") : convert(good, "psi", "kPa") * 10, unit);
    return rounded(convert(-rng.between(2, 6), "psi", unit), unit);
  }
  const ranges = (typical[ruleId] ?? typical.two_stroke!)[verdict as "good" | "marginal" | "low"];
  const psi = rng.between(...rng.pick(ranges)) * toGauge;
  return rounded(convert(psi, "psi", unit), unit);
}

function bandTry(step: CompiledStep & { kind: "reading" }, move: Extract<Move, { kind: "band" }>, unit: Unit, rng: Random): number {
  const { from, to } = move.band;
  const stepUnit = step.unit as Unit;
  const lo = from?.value ?? Math.max(0, (to?.value ?? 1) * 0.4);
  const hi = to?.value ?? lo * 1.8 + 0.1;
  return rounded(convert(rng.between(lo, hi), stepUnit, unit), unit);
}

const fallbacks = new Map<string, number[]>();

/** Every value on a fine grid the step sends the same way: used only when sampling keeps missing a narrow band. */
function scan(step: CompiledStep, outcome: string, unit: Unit, input: FlowInput): number[] {
  const key = `${step.id} ${outcome} ${unit} ${JSON.stringify(input)}`;
  const hit = fallbacks.get(key);
  if (hit) return hit;
  if (step.kind !== "reading") return [];
  // Up to 1,000 psi for a compression gauge, 10 of the step's unit for a feeler or meter.
  const top = convert(step.evaluation ? 1000 : 10, step.unit as Unit, unit);
  const found: number[] = [];
  for (let i = -200; i <= 2000; i++) {
    const value = rounded((top * i) / 2000, unit);
    if (outcomeOf(step, value, unit, input) === outcome) found.push(value);
  }
  fallbacks.set(key, found);
  return found;
}

export function readingFor(step: CompiledStep, move: Move, input: FlowInput, system: UnitSystem, rng: Random): { value: number; unit: Unit } {
  if (step.kind !== "reading" || move.kind === "answer") throw new Error(`step "${step.id}" takes no reading`);
  const unit = preferredUnit(step.quantity, system);
  const outcome = move.kind === "band" ? `band:${move.index}` : move.verdict;
  for (let attempt = 0; attempt < 25; attempt++) {
    const value = move.kind === "band" ? bandTry(step, move, unit, rng) : compressionTry(step, move.verdict, input, unit, rng);
    if (outcomeOf(step, value, unit, input) === outcome) return { value, unit };
  }
  const values = scan(step, outcome, unit, input);
  if (values.length === 0) throw new Error(`no ${unit} reading at step "${step.id}" leads to ${outcome}`);
  return { value: rng.pick(values), unit };
}
