// Checks that look at one step alone, and the list of places a step can lead to.
import { isUnit, quantityOf, unitLabel, unitsByQuantity, type Quantity } from "../calc/units.ts";
import { checkBands } from "./bands.ts";
import { error, warning, type Problem } from "./problems.ts";
import type { FlowStep } from "./schema.ts";

export interface StepTarget {
  /** Where in the step the target is written, e.g. "options[1].next". */
  where: string;
  target: string;
}

const VERDICT_KEYS = ["good", "marginal", "low", "implausible"] as const;

/** The targets of a parsed step, in a fixed order; whereOf names the place of the k-th one. */
export function targetsOf(step: FlowStep): string[] {
  switch (step.kind) {
    case "instruction":
    case "section":
      return [step.next];
    case "choice":
      return step.options.map((o) => o.next);
    case "reading": {
      const out = step.bands ? step.bands.map((b) => b.next) : [];
      if (step.evaluation) for (const v of VERDICT_KEYS) out.push(step.evaluation.next[v]);
      return out;
    }
    case "finding":
      return [];
  }
}

// Built only when a problem needs it: most targets are fine, and strings cost time at 10,000 steps.
export function whereOf(step: FlowStep, k: number): string {
  if (step.kind === "choice") return `options[${k}].next`;
  if (step.kind === "reading") {
    const bands = step.bands?.length ?? 0;
    return k < bands ? `bands[${k}].next` : `evaluation.next.${VERDICT_KEYS[k - bands]}`;
  }
  return "next";
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

/** Targets of a step that failed its schema, read leniently so one typo does not hide the rest. */
export function rawTargetsOf(raw: unknown): StepTarget[] {
  if (!isRecord(raw)) return [];
  const out: StepTarget[] = [];
  if (typeof raw.next === "string") out.push({ where: "next", target: raw.next });
  for (const key of ["options", "bands"] as const) {
    const list = raw[key];
    if (!Array.isArray(list)) continue;
    list.forEach((item: unknown, i) => {
      if (isRecord(item) && typeof item.next === "string") out.push({ where: `${key}[${i}].next`, target: item.next });
    });
  }
  const evaluation = raw.evaluation;
  if (isRecord(evaluation) && isRecord(evaluation.next)) {
    for (const [verdict, target] of Object.entries(evaluation.next)) {
      if (typeof target === "string") out.push({ where: `evaluation.next.${verdict}`, target });
    }
  }
  return out;
}

/** Pushes the step's own problems onto `problems`. */
export function checkStep(stepId: string, step: FlowStep, problems: Problem[]): void {
  const cautions = step.cautions;
  if (cautions) {
    for (let i = 0; i < cautions.length; i++) {
      const caution = cautions[i]!;
      if ((caution.text ?? "").trim() !== "") continue;
      const serious = caution.signal === "DANGER" || caution.signal === "WARNING";
      const message = `cautions[${i}]: a ${caution.signal} panel needs text that says the hazard and how to avoid it`;
      problems.push(serious ? error(stepId, "caution_text_missing", message) : warning(stepId, "caution_text_missing", message));
    }
  }
  if (step.kind === "choice") {
    // At most twelve options: a pairwise look costs less than building a map for every choice.
    const options = step.options;
    for (let i = 0; i < options.length; i++) {
      const value = options[i]!.value;
      let count = 0;
      let first = true;
      for (let j = 0; j < options.length; j++) {
        if (options[j]!.value !== value) continue;
        count++;
        if (j < i) first = false;
      }
      if (count > 1 && first) problems.push(error(stepId, "option_duplicate", `option value "${value}" is used ${count} times; each option needs its own value`));
    }
  }
  if (step.kind === "finding" && step.repairs.length === 0) {
    problems.push(warning(stepId, "finding_without_repairs", "this finding lists no repairs, so an estimate cannot start from it"));
  }
  if (step.kind === "reading") checkReadingStep(stepId, step, problems);
}

const allowedUnits = (quantity: Quantity) => unitsByQuantity[quantity].join(", ");

function checkReadingStep(stepId: string, step: Extract<FlowStep, { kind: "reading" }>, problems: Problem[]): void {
  let label = step.unit;
  if (!isUnit(step.unit)) {
    problems.push(error(stepId, "unit_unknown", `unit "${step.unit}" is not a unit Benchpath knows; ${step.quantity} takes ${allowedUnits(step.quantity)}`));
  } else {
    label = unitLabel(step.unit);
    if (quantityOf(step.unit) !== step.quantity) {
      problems.push(error(stepId, "unit_quantity_mismatch", `unit "${step.unit}" measures ${quantityOf(step.unit)}, not ${step.quantity}; ${step.quantity} takes ${allowedUnits(step.quantity)}`));
    }
  }
  if (step.evaluation && step.bands) {
    problems.push(error(stepId, "reading_outcome_conflict", "a reading has either an evaluation or bands, not both"));
  } else if (!step.evaluation && !step.bands) {
    problems.push(error(stepId, "reading_outcome_missing", "a reading needs an evaluation or bands to decide where to go next"));
  }
  if (step.evaluation?.kind === "compression" && step.quantity !== "pressure") {
    problems.push(error(stepId, "evaluation_quantity_mismatch", `the compression evaluation reads a pressure, not ${step.quantity}`));
  }
  if (step.bands) for (const issue of checkBands(step.bands, label)) problems.push(error(stepId, issue.code, issue.message));
}
