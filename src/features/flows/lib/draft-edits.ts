// Edits to a draft as pure functions: each returns a new definition and leaves its input alone.
import type { StepKind } from "../../../../shared/flow/schema.ts";
import type { DraftDefinition } from "../api/save-draft.ts";

export type RawStep = Record<string, unknown>;
const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

export function stepsOf(definition: DraftDefinition): Record<string, RawStep> {
  const steps = definition.steps;
  if (!isRecord(steps)) return {};
  return Object.fromEntries(Object.entries(steps).map(([id, step]) => [id, isRecord(step) ? step : {}]));
}

export function stepOf(definition: DraftDefinition, stepId: string): RawStep | null {
  return isRecord(definition.steps) && Object.prototype.hasOwnProperty.call(definition.steps, stepId) ? (stepsOf(definition)[stepId] ?? null) : null;
}

export const kindOf = (step: RawStep): string => (typeof step.kind === "string" ? step.kind : "unknown");
export const titleOf = (step: RawStep): string => (typeof step.title === "string" ? step.title : "");

/** The steps every other step can lead to, with their titles, in the draft's order. */
export function stepChoices(definition: DraftDefinition): Array<{ id: string; title: string }> {
  return Object.entries(stepsOf(definition)).map(([id, step]) => ({ id, title: titleOf(step) }));
}

export function withStep(definition: DraftDefinition, stepId: string, step: RawStep): DraftDefinition {
  return { ...definition, steps: { ...(isRecord(definition.steps) ? definition.steps : {}), [stepId]: step } };
}

export function withoutStep(definition: DraftDefinition, stepId: string): DraftDefinition {
  const { [stepId]: _gone, ...steps } = isRecord(definition.steps) ? definition.steps : {};
  return { ...definition, steps };
}

/** A new step of a kind, with the parts its form needs; the validator names what is still to fill in. */
export function templateStep(kind: Exclude<StepKind, "section">): RawStep {
  switch (kind) {
    case "instruction":
      return { kind, title: "", next: "" };
    case "choice":
      return { kind, title: "", options: [{ value: "yes", label: "Yes", next: "" }, { value: "no", label: "No", next: "" }] };
    case "reading":
      return { kind, title: "", quantity: "pressure", unit: "psi", bands: [{ from: null, to: null, label: "Any reading", verdict: "good", next: "" }] };
    case "finding":
      return { kind, title: "", certainty: "likely", explanation: "", repairs: [] };
  }
}

export function addStep(definition: DraftDefinition, stepId: string, kind: Exclude<StepKind, "section">): DraftDefinition {
  const next = withStep(definition, stepId, templateStep(kind));
  // The first step of an empty flow is where it starts.
  return typeof definition.start === "string" && definition.start !== "" ? next : { ...next, start: stepId };
}

/** Every place a step names where to go next, rewritten by `map`. */
function mapTargets(step: RawStep, map: (target: string) => string): RawStep {
  const out: RawStep = { ...step };
  if (typeof out.next === "string") out.next = map(out.next);
  for (const key of ["options", "bands"] as const) {
    const list = out[key];
    if (Array.isArray(list)) out[key] = list.map((item: unknown) => (isRecord(item) && typeof item.next === "string" ? { ...item, next: map(item.next) } : item));
  }
  if (isRecord(out.evaluation) && isRecord(out.evaluation.next)) {
    const targets = Object.fromEntries(Object.entries(out.evaluation.next).map(([verdict, t]) => [verdict, typeof t === "string" ? map(t) : t]));
    out.evaluation = { ...out.evaluation, next: targets };
  }
  return out;
}

/** Renames a step where it stands in the list, and every reference to it, the start included. */
export function renameStep(definition: DraftDefinition, from: string, to: string): DraftDefinition {
  const rename = (target: string) => (target === from ? to : target);
  const steps = Object.fromEntries(Object.entries(stepsOf(definition)).map(([id, step]) => [id === from ? to : id, mapTargets(step, rename)]));
  const start = typeof definition.start === "string" ? rename(definition.start) : definition.start;
  return { ...definition, start, steps };
}

/** The steps that lead to `stepId`, so deleting it can say what it leaves dangling. */
export function stepsLeadingTo(definition: DraftDefinition, stepId: string): string[] {
  return Object.entries(stepsOf(definition))
    .filter(([id, step]) => {
      if (id === stepId) return false;
      let leads = false;
      mapTargets(step, (target) => {
        if (target === stepId) leads = true;
        return target;
      });
      return leads;
    })
    .map(([id]) => id);
}

/** A form's values as the draft keeps them: plain JSON, without empty optional parts. */
export function cleanStep(values: unknown): RawStep {
  const step = JSON.parse(JSON.stringify(values ?? {})) as RawStep;
  for (const key of ["body", "misleads"]) if (step[key] === "") delete step[key];
  for (const key of ["cautions", "followUp"]) if (Array.isArray(step[key]) && (step[key] as unknown[]).length === 0) delete step[key];
  return step;
}
