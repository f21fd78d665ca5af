// Compiling: validate, then inline sections into one flat map of steps the machine can run.
import { FlowInvalidError } from "./problems.ts";
import {
  CONTINUE,
  type AppliesTo,
  type ChoiceStep,
  type FindingStep,
  type FlowDefinition,
  type FlowStep,
  type InstructionStep,
  type ReadingStep,
  type SectionDefinition,
} from "./schema.ts";
import { validateFlow, type SectionLibrary } from "./validate.ts";

export { FlowInvalidError } from "./problems.ts";

export interface StepOrigin {
  /** The section the step came from, or null for the flow's own steps. */
  section: string | null;
  /** The step's id inside its own document. */
  stepId: string;
}

type Runnable = InstructionStep | ChoiceStep | ReadingStep | FindingStep;
/** A step after inlining: its id is the path of calling steps, e.g. "spark/tester". */
export type CompiledStep = Runnable & { id: string; origin: StepOrigin };

export interface CompiledFlow {
  id: string;
  title: string;
  summary?: string;
  appliesTo: AppliesTo;
  start: string;
  /** Every step, in document order with sections expanded in place; no section steps remain. */
  steps: Record<string, CompiledStep>;
}

type Steps = Record<string, FlowStep>;
type Sections = Record<string, SectionDefinition>;
/** One document being inlined: where its ids go, and where its "@continue" leads. */
interface Scope {
  prefix: string;
  steps: Steps;
  sectionId: string | null;
  continueTo: string | null;
}

function sectionOf(sections: Sections, id: string): SectionDefinition {
  const s = sections[id];
  if (!s) throw new Error(`section "${id}" passed validation but is not resolved`);
  return s;
}

/** Where a step id leads once sections are inlined: a section step leads to its section's start. */
function entry(sections: Sections, prefix: string, steps: Steps, id: string): string {
  const step = steps[id];
  if (step?.kind !== "section") return prefix + id;
  const section = sectionOf(sections, step.section);
  return entry(sections, `${prefix}${id}/`, section.steps, section.start);
}

function resolve(sections: Sections, scope: Scope, target: string): string {
  if (target !== CONTINUE) return entry(sections, scope.prefix, scope.steps, target);
  if (scope.continueTo === null) throw new Error(`"${CONTINUE}" in a flow passed validation`);
  return scope.continueTo;
}

// One copy per step, its new keys first: on this V8, adding keys to an existing object or after a
// spread costs microseconds each, which at 10,000 steps was most of the compile.
function compiledStep(sections: Sections, scope: Scope, id: string, step: Runnable): CompiledStep {
  const out = { id: scope.prefix + id, origin: { section: scope.sectionId, stepId: id }, ...step } as CompiledStep;
  switch (out.kind) {
    case "instruction":
      out.next = resolve(sections, scope, out.next);
      break;
    case "choice":
      out.options = out.options.map((o) => ({ ...o, next: resolve(sections, scope, o.next) }));
      break;
    case "reading":
      if (out.bands) out.bands = out.bands.map((b) => ({ ...b, next: resolve(sections, scope, b.next) }));
      if (out.evaluation) {
        const { good, marginal, low, implausible } = out.evaluation.next;
        const next = { good: resolve(sections, scope, good), marginal: resolve(sections, scope, marginal), low: resolve(sections, scope, low), implausible: resolve(sections, scope, implausible) };
        out.evaluation = { kind: out.evaluation.kind, next };
      }
      break;
    case "finding":
      break;
  }
  return out;
}

function inline(definition: FlowDefinition, sections: Sections): CompiledFlow {
  const out: Record<string, CompiledStep> = {};
  const emit = (scope: Scope) => {
    for (const id of Object.keys(scope.steps)) {
      const step = scope.steps[id]!;
      if (step.kind !== "section") out[scope.prefix + id] = compiledStep(sections, scope, id, step);
      else {
        const inner = sectionOf(sections, step.section);
        emit({ prefix: `${scope.prefix}${id}/`, steps: inner.steps, sectionId: step.section, continueTo: resolve(sections, scope, step.next) });
      }
    }
  };
  emit({ prefix: "", steps: definition.steps, sectionId: null, continueTo: null });
  return {
    id: definition.id,
    title: definition.title,
    ...(definition.summary === undefined ? {} : { summary: definition.summary }),
    appliesTo: definition.appliesTo,
    start: entry(sections, "", definition.steps, definition.start),
    steps: out,
  };
}

function validated(definition: unknown, sections: SectionLibrary) {
  const result = validateFlow(definition, sections);
  if (!result.ok || !result.definition || !result.sections) throw new FlowInvalidError(result.problems);
  return { definition: result.definition, sections: result.sections };
}

/** Validates (throwing FlowInvalidError on any error) and inlines the flow's sections. */
export function compileFlow(definition: FlowDefinition | unknown, sections: SectionLibrary = []): CompiledFlow {
  const v = validated(definition, sections);
  return inline(v.definition, v.sections);
}

/** The flow with exactly the sections it reaches embedded, so a stored version needs nothing else. */
export function resolveSections(definition: FlowDefinition | unknown, sections: SectionLibrary = []): FlowDefinition {
  const v = validated(definition, sections);
  return { ...v.definition, sections: v.sections };
}
