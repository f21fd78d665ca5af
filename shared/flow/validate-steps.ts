// Checks that look at one step alone, and the list of places a step can lead to.
import { isUnit, quantityOf, unitLabel, unitsByQuantity } from "../calc/units.ts";
import { checkBands } from "./bands.ts";
import { error, warning, type Problem } from "./problems.ts";
import type { FlowStep } from "./schema.ts";

export interface StepTarget {
  /** Where in the step the target is written, e.g. "options[1].next". */
  where: string;
  target: string;
}

export function targetsOf(step: FlowStep): StepTarget[] {
  switch (step.kind) {
    case "instruction":
    case "section":
      return [{ where: "next", target: step.next }];
    case "choice":
      return step.options.map((o, i) => ({ where: `options[${i}].next`, target: o.next }));
    case "reading": {
      const out: StepTarget[] = (step.bands ?? []).map((b, i) => ({ where: `bands[${i}].next`, target: b.next }));
      if (step.evaluation) {
        for (const [verdict, target] of Object.entries(step.evaluation.next)) out.push({ where: `evaluation.next.${verdict}`, target });
      }
      return out;
    }
    case "finding":
      return [];
  }
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

export function checkStep(stepId: string, step: FlowStep): Problem[] {
  const problems: Problem[] = [];
  (step.cautions ?? []).forEach((caution, i) => {
    if ((caution.text ?? "").trim() !== "") return;
    const serious = caution.signal === "DANGER" || caution.signal === "WARNING";
    const message = `cautions[${i}]: a ${caution.signal} panel needs text that says the hazard and how to avoid it`;
    problems.push(serious ? error(stepId, "caution_text_missing", message) : warning(stepId, "caution_text_missing", message));
  });
  if (step.kind === "choice") {
    const seen = new Map<string, number>();
    for (const option of step.options) seen.set(option.value, (seen.get(option.value) ?? 0) + 1);
    for (const [value, count] of seen) {
      if (count > 1) problems.push(error(stepId, "option_duplicate", `option value "${value}" is used ${count} times; each option needs its own value`));
    }
  }
  if (step.kind === "finding" && step.repairs.length === 0) {
    problems.push(warning(stepId, "finding_without_repairs", "this finding lists no repairs, so an estimate cannot start from it"));
  }
  if (step.kind === "reading") problems.push(...checkReadingStep(stepId, step));
  return problems;
}

function checkReadingStep(stepId: string, step: Extract<FlowStep, { kind: "reading" }>): Problem[] {
  const problems: Problem[] = [];
  const allowed = unitsByQuantity[step.quantity].join(", ");
  let label = step.unit;
  if (!isUnit(step.unit)) {
    problems.push(error(stepId, "unit_unknown", `unit "${step.unit}" is not a unit Benchpath knows; ${step.quantity} takes ${allowed}`));
  } else {
    label = unitLabel(step.unit);
    if (quantityOf(step.unit) !== step.quantity) {
      problems.push(error(stepId, "unit_quantity_mismatch", `unit "${step.unit}" measures ${quantityOf(step.unit)}, not ${step.quantity}; ${step.quantity} takes ${allowed}`));
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
  for (const issue of checkBands(step.bands ?? [], label)) problems.push(error(stepId, issue.code, issue.message));
  return problems;
}
