// validateFlow / validateSection: pure, never throw, and report every problem they find.
import { analyseDocument, type AnalysisEnv, type DocAnalysis } from "./analyse.ts";
import { error, hasErrors, type Problem } from "./problems.ts";
import { MAX_STEPS, type FlowDefinition, type SectionDefinition } from "./schema.ts";

export type { Problem, ProblemCode } from "./problems.ts";
export type SectionLibrary = Record<string, SectionDefinition> | readonly SectionDefinition[];

export interface FlowValidation {
  ok: boolean;
  problems: Problem[];
  definition?: FlowDefinition;
  /** Every section the flow reaches, directly or through others, parsed; present when ok. */
  sections?: Record<string, SectionDefinition>;
}
export interface SectionValidation {
  ok: boolean;
  problems: Problem[];
  definition?: SectionDefinition;
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);
const own = (o: Record<string, unknown>, k: string) => (Object.prototype.hasOwnProperty.call(o, k) ? o[k] : undefined);

/** Sections by id from a list or a record; anything else is an empty library. */
export function libraryLookup(library: unknown): (id: string) => unknown {
  if (Array.isArray(library)) {
    const byId = new Map<string, unknown>();
    for (const s of library as unknown[]) if (isRecord(s) && typeof s.id === "string" && !byId.has(s.id)) byId.set(s.id, s);
    return (id) => byId.get(id);
  }
  return isRecord(library) ? (id) => own(library, id) : () => undefined;
}

interface Reached {
  problems: Problem[];
  /** The sections reached, parsed, by id, in the order first met. */
  sections: Map<string, DocAnalysis>;
}

/** Sections a document reaches, each once; their problems are pinned to the document's calling step. */
function reachedSections(top: DocAnalysis, env: AnalysisEnv, skip: string | null): Reached {
  const problems: Problem[] = [];
  const sections = new Map<string, DocAnalysis>();
  const seen = new Set<string>(skip === null ? [] : [skip]);
  const queue = top.calls.map((c) => ({ section: c.section, rootStep: c.stepId }));
  for (let head = 0; head < queue.length; head++) {
    const { section, rootStep } = queue[head]!;
    if (seen.has(section)) continue;
    seen.add(section);
    const analysis = env.done.get(section);
    if (!analysis) continue;
    sections.set(section, analysis);
    for (const p of analysis.problems) {
      problems.push({ ...p, stepId: rootStep, message: `section "${section}"${p.stepId ? `, step "${p.stepId}"` : ""}: ${p.message}` });
    }
    for (const c of analysis.calls) queue.push({ section: c.section, rootStep });
  }
  return { problems, sections };
}

/** Steps after inlining, counted per section once, so nesting cannot make compiling explode. */
function inlinedSize(doc: DocAnalysis, sections: Map<string, DocAnalysis>, memo: Map<string, number>): number {
  let size = doc.ownSteps;
  for (const { section } of doc.calls) {
    let inner = memo.get(section);
    if (inner === undefined) {
      const nested = sections.get(section);
      memo.set(section, 0);
      inner = nested ? inlinedSize(nested, sections, memo) : 0;
      memo.set(section, inner);
    }
    size += inner;
    if (size > MAX_STEPS) return size;
  }
  return size;
}

function sectionDefinitionOf(a: DocAnalysis): SectionDefinition | undefined {
  if (!a.envelope || !a.steps || hasErrors(a.problems)) return undefined;
  return { ...(a.envelope as Omit<SectionDefinition, "steps">), steps: a.steps };
}

export function validateFlow(input: unknown, sections: SectionLibrary): FlowValidation {
  const embedded = isRecord(input) && isRecord(input.sections) ? input.sections : {};
  const library = libraryLookup(sections);
  // A stored version carries its sections; they win over the shop's current library.
  const lookup = (id: string) => own(embedded, id) ?? library(id);
  const env: AnalysisEnv = { lookup, done: new Map(), stack: [] };
  const top = analyseDocument(input, "flow", env);
  const reached = reachedSections(top, env, null);
  const problems = [...top.problems, ...reached.problems];
  for (const id of Object.keys(embedded)) {
    if (env.done.has(id)) continue;
    const unused = analyseDocument(embedded[id], "section", { ...env, stack: [id] });
    for (const p of unused.problems) problems.push({ ...p, stepId: null, message: `embedded section "${id}"${p.stepId ? `, step "${p.stepId}"` : ""}: ${p.message}` });
    env.done.set(id, unused);
  }
  if (hasErrors(problems) || !top.envelope || !top.steps) return { ok: false, problems };
  const size = inlinedSize(top, reached.sections, new Map());
  if (size > MAX_STEPS) {
    problems.push(error(null, "too_many_steps", `with its sections inlined the flow has more than ${MAX_STEPS} steps`));
    return { ok: false, problems };
  }
  const used: Record<string, SectionDefinition> = {};
  for (const [id, analysis] of reached.sections) used[id] = sectionDefinitionOf(analysis)!;
  const { sections: declared, ...rest } = top.envelope;
  const definition = { ...rest, steps: top.steps } as FlowDefinition;
  if (declared !== undefined) {
    definition.sections = {};
    for (const id of Object.keys(embedded)) definition.sections[id] = sectionDefinitionOf(env.done.get(id)!)!;
  }
  return { ok: true, problems, definition, sections: used };
}

export function validateSection(input: unknown, sections: SectionLibrary): SectionValidation {
  const selfId = isRecord(input) && typeof input.id === "string" ? input.id : null;
  const library = libraryLookup(sections);
  // The section under review stands in for any library copy of itself, so self-inclusion is caught.
  const lookup = (id: string) => (id === selfId ? input : library(id));
  const env: AnalysisEnv = { lookup, done: new Map(), stack: selfId === null ? [] : [selfId] };
  const top = analyseDocument(input, "section", env);
  const reached = reachedSections(top, env, selfId);
  const problems = [...top.problems, ...reached.problems];
  const definition = hasErrors(problems) ? undefined : sectionDefinitionOf({ ...top, problems: [] });
  return definition ? { ok: true, problems, definition } : { ok: false, problems };
}
