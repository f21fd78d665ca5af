// Analyses one flow or section document: schema, each step, then the graph in two linear passes.
import type { z } from "zod";
import { analyseGraph } from "./graph.ts";
import { error, warning, type Problem } from "./problems.ts";
import {
  CONTINUE,
  MAX_STEPS,
  flowEnvelopeSchema,
  flowStepSchema,
  SLUG,
  sectionEnvelopeSchema,
  type FlowStep,
} from "./schema.ts";
import { checkStep, rawTargetsOf, targetsOf, whereOf, type StepTarget } from "./validate-steps.ts";

/** What a caller needs to know about a section: can it end in a finding, can it hand back. */
export interface SectionSummary {
  canFinish: boolean;
  canContinue: boolean;
}
// Assumed for a section that is missing or broken, so its own problem is reported once, not echoed.
const OPTIMISTIC: SectionSummary = { canFinish: true, canContinue: true };

export interface DocAnalysis {
  /** Problems of this document alone, by its own step ids. */
  problems: Problem[];
  /** The parsed envelope and steps, when every part parsed. */
  envelope: Record<string, unknown> | null;
  steps: Record<string, FlowStep> | null;
  summary: SectionSummary;
  calls: Array<{ stepId: string; section: string }>;
  /** Steps that are not section calls: what this document adds once inlined, besides its calls. */
  ownSteps: number;
}

export interface AnalysisEnv {
  lookup: (sectionId: string) => unknown;
  done: Map<string, DocAnalysis>;
  /** Sections being analysed, outermost first: meeting one again is a self-inclusion. */
  stack: string[];
}


const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

function formatPath(path: readonly PropertyKey[]): string {
  return path.map((p, i) => (typeof p === "number" ? `[${p}]` : `${i === 0 ? "" : "."}${String(p)}`)).join("");
}

export function schemaProblems(stepId: string | null, issues: readonly z.core.$ZodIssue[]): Problem[] {
  return issues.map((issue) => {
    const where = formatPath(issue.path);
    return error(stepId, "schema_invalid", where ? `${where}: ${issue.message}` : issue.message);
  });
}

const whereAt = (step: FlowStep | null, lenient: StepTarget[] | null, k: number) => (step ? whereOf(step, k) : lenient![k]!.where);

function summaryOf(sectionId: string, callerStepId: string, problems: Problem[], env: AnalysisEnv): SectionSummary {
  // The stack is as deep as sections nest, a few at most: a look along it beats keeping a set too.
  if (env.stack.includes(sectionId)) {
    const chain = [...env.stack.slice(env.stack.indexOf(sectionId)), sectionId].map((s) => `"${s}"`).join(" → ");
    problems.push(error(callerStepId, "section_cycle", `section "${sectionId}" includes itself: ${chain}`));
    return OPTIMISTIC;
  }
  const cached = env.done.get(sectionId);
  if (cached) return cached.summary;
  const raw = env.lookup(sectionId);
  if (raw === undefined) {
    problems.push(error(callerStepId, "section_missing", `section "${sectionId}" is not in the section library`));
    return OPTIMISTIC;
  }
  env.stack.push(sectionId);
  const analysis = analyseDocument(raw, "section", env);
  env.stack.pop();
  env.done.set(sectionId, analysis);
  return analysis.summary;
}

export function analyseDocument(raw: unknown, mode: "flow" | "section", env: AnalysisEnv): DocAnalysis {
  const problems: Problem[] = [];
  const calls: DocAnalysis["calls"] = [];
  const broken = (): DocAnalysis => ({ problems, envelope: null, steps: null, summary: OPTIMISTIC, calls, ownSteps: 0 });
  if (!isRecord(raw)) {
    problems.push(error(null, "schema_invalid", `a ${mode} is a JSON object`));
    return broken();
  }
  const envelope = (mode === "flow" ? flowEnvelopeSchema : sectionEnvelopeSchema).safeParse(raw);
  if (!envelope.success) problems.push(...schemaProblems(null, envelope.error.issues));
  const rawSteps = isRecord(raw.steps) ? raw.steps : {};
  const ids = Object.keys(rawSteps);
  if (ids.length > MAX_STEPS) {
    problems.push(error(null, "too_many_steps", `a ${mode} has at most ${MAX_STEPS} steps; this one has ${ids.length}`));
    return broken();
  }

  const n = ids.length;
  const index = new Map<string, number>();
  for (let i = 0; i < n; i++) index.set(ids[i]!, i);
  const parsed: Array<FlowStep | null> = new Array(n);
  const offsets = new Int32Array(n + 1);
  const targetsOut: number[] = [];
  const exits = new Uint8Array(n);
  const continues = new Uint8Array(n);
  const finishes = new Uint8Array(n);
  let allParsed = true;

  for (let i = 0; i < n; i++) {
    const id = ids[i]!;
    if (id.length > 80 || !SLUG.test(id)) {
      problems.push(error(id, "step_id_invalid", `step id "${id}" must use lowercase letters, digits and single hyphens (at most 80 characters)`));
    }
    const result = flowStepSchema.safeParse(rawSteps[id]);
    const step = result.success ? result.data : null;
    if (result.success) checkStep(id, result.data, problems);
    else {
      allParsed = false;
      problems.push(...schemaProblems(id, result.error.issues));
    }
    parsed[i] = step;
    let exit = step === null || step.kind === "finding";
    let finish = exit;
    let followNext = true;
    if (step?.kind === "section") {
      calls.push({ stepId: id, section: step.section });
      const summary = summaryOf(step.section, id, problems, env);
      exit = exit || summary.canFinish;
      finish = finish || summary.canFinish;
      if (!summary.canContinue) {
        followNext = false;
        const ends = summary.canFinish ? "always ends in a finding" : "never hands back";
        problems.push(warning(id, "section_never_continues", `section "${step.section}" ${ends}, so next "${step.next}" is never used`));
      }
    }
    let continuesHere = step === null;
    const lenient = step ? null : rawTargetsOf(rawSteps[id]);
    const targets = step ? targetsOf(step) : lenient!.map((t) => t.target);
    for (let k = 0; k < targets.length; k++) {
      const target = targets[k]!;
      if (target === CONTINUE) {
        if (mode === "flow") problems.push(error(id, "continue_in_flow", `${whereAt(step, lenient, k)} is "${CONTINUE}", which only a section can use`));
        exit = true;
        continuesHere = true;
        continue;
      }
      const to = index.get(target);
      if (to === undefined) problems.push(error(id, "target_unknown", `${whereAt(step, lenient, k)} goes to "${target}", which is not a step`));
      else if (followNext) targetsOut.push(to);
    }
    offsets[i + 1] = targetsOut.length;
    exits[i] = exit ? 1 : 0;
    continues[i] = continuesHere ? 1 : 0;
    finishes[i] = finish ? 1 : 0;
  }

  const start = typeof raw.start === "string" ? index.get(raw.start) : undefined;
  if (start === undefined) {
    problems.push(error(null, "start_missing", `start ${typeof raw.start === "string" ? `"${raw.start}" is not a step` : "is missing"}`));
  }
  const { reached, canExit } = analyseGraph({ offsets, targets: targetsOut, exits }, start ?? null);
  const stuck = mode === "flow" ? "no finding can be reached from this step (a loop needs a way out)" : `neither a finding nor "${CONTINUE}" can be reached from this step`;
  let canFinish = start === undefined;
  let canContinue = start === undefined;
  const steps: Record<string, FlowStep> = {};
  for (let i = 0; i < n; i++) {
    const id = ids[i]!;
    if (start !== undefined && !reached[i]) problems.push(error(id, "step_unreachable", "no path from the start leads to this step"));
    if (!canExit[i]) problems.push(error(id, "no_finding_reachable", stuck));
    if (reached[i]) {
      canFinish = canFinish || finishes[i] === 1;
      canContinue = canContinue || continues[i] === 1;
    }
    const step = parsed[i];
    if (step) steps[id] = step;
  }
  return {
    problems,
    envelope: envelope.success ? envelope.data : null,
    steps: allParsed ? steps : null,
    summary: { canFinish, canContinue },
    calls,
    ownSteps: ids.length - calls.length,
  };
}
