// Check-order advice: from completed sessions, how often each finding occurred, how long each
// top-level check took, and whether the flow's independent checks would find the fault sooner in
// another order (the p/c rule of shared/calc/sequencing.ts). Pure: the server feeds it rows, the
// editor applies a suggestion with applyCheckOrder.
import { expectedCost, orderByRatio, type Cause } from "../calc/sequencing.ts";
import type { AdviceResponse } from "../schemas/flows.ts";

/** Below this many completed sessions the advice withholds its suggestion. */
export const MINIMUM_SESSIONS = 20;

export interface AdviceEvent {
  /** The compiled step the event concerns (`spark/tester`); null for step.back and session.restart. */
  stepId: string | null;
  /** When the tablet recorded it (ISO text or a Date). */
  recordedAt: string | Date;
}

export interface AdviceSession {
  findingStepId: string | null;
  /** The finding's title in the session's own version, when the caller knows it. */
  findingTitle?: string | null;
  /** In log order. */
  events: readonly AdviceEvent[];
}

export interface AdviceOptions {
  minimumSessions?: number;
}

type Steps = Record<string, Record<string, unknown>>;
const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);
const own = (o: Record<string, unknown>, k: string): unknown => (Object.prototype.hasOwnProperty.call(o, k) ? o[k] : undefined);

function stepsOf(definition: unknown): Steps {
  const steps = isRecord(definition) ? own(definition, "steps") : undefined;
  if (!isRecord(steps)) return {};
  const out: Steps = {};
  for (const [id, step] of Object.entries(steps)) if (isRecord(step)) out[id] = step;
  return out;
}

const titleOf = (step: Record<string, unknown> | undefined, fallback: string) => (typeof step?.title === "string" && step.title ? step.title : fallback);
const isSectionStep = (step: Record<string, unknown> | undefined) => step?.kind === "section" && typeof step.next === "string";

/** Where a step leads: its next, its options', bands' and evaluation's targets. */
function targetsOf(step: Record<string, unknown>): string[] {
  const out: string[] = [];
  const add = (v: unknown) => typeof v === "string" && out.push(v);
  add(step.next);
  for (const list of [step.options, step.bands]) if (Array.isArray(list)) for (const o of list) if (isRecord(o)) add(o.next);
  if (isRecord(step.evaluation) && isRecord(step.evaluation.next)) Object.values(step.evaluation.next).forEach(add);
  return out;
}

/**
 * The flow's top-level section steps (its checks) in the order a session meets them: breadth first
 * from the start, then any unreachable ones. Not in key order: a definition read back from jsonb has
 * its keys sorted by length.
 */
export function topLevelChecks(definition: unknown): { stepId: string; title: string }[] {
  const steps = stepsOf(definition);
  const start = isRecord(definition) ? own(definition, "start") : undefined;
  const order: string[] = [];
  const seen = new Set<string>();
  const queue = typeof start === "string" ? [start] : [];
  for (let head = 0; head < queue.length; head++) {
    const id = queue[head]!;
    const step = own(steps, id) as Record<string, unknown> | undefined;
    if (seen.has(id) || !step) continue;
    seen.add(id);
    order.push(id);
    queue.push(...targetsOf(step));
  }
  for (const id of Object.keys(steps)) if (!seen.has(id)) order.push(id);
  return order.filter((id) => steps[id]!.kind === "section").map((stepId) => ({ stepId, title: titleOf(steps[stepId], stepId) }));
}

/**
 * The reorderable independent checks: the top-level section steps that follow the start step one
 * after another (`start → spark → air → compression → prime → leak-test` gives spark, air,
 * compression, prime). The start step itself is never part of it.
 */
export function checkChain(definition: unknown): string[] {
  const steps = stepsOf(definition);
  const start = isRecord(definition) ? own(definition, "start") : undefined;
  if (typeof start !== "string") return [];
  const first = steps[start];
  if (!first || typeof first.next !== "string" || (first.kind !== "instruction" && first.kind !== "section")) return [];
  const chain: string[] = [];
  const seen = new Set([start]);
  for (let id = first.next as string; isSectionStep(own(steps, id) as Record<string, unknown> | undefined) && !seen.has(id); id = steps[id]!.next as string) {
    seen.add(id);
    chain.push(id);
  }
  return chain;
}

/**
 * The definition with its chain of checks rewired into `order` (a permutation of checkChain): the
 * start step leads to the first, each leads to the next, the last to where the chain used to end.
 * Nothing else changes; the input is not modified.
 */
export function applyCheckOrder<T extends object>(definition: T, order: readonly string[]): T {
  const chain = checkChain(definition);
  const same = order.length === chain.length && [...order].sort().join("\n") === [...chain].sort().join("\n");
  if (!same) throw new RangeError(`The order must name each of the checks ${chain.map((c) => `"${c}"`).join(", ") || "(none)"} once.`);
  if (chain.length === 0) return definition;
  const d = definition as Record<string, unknown>;
  const steps = d.steps as Steps;
  const start = d.start as string;
  const exit = steps[chain[chain.length - 1]!]!.next;
  const rewired: Steps = { ...steps, [start]: { ...steps[start]!, next: order[0] } };
  order.forEach((id, i) => {
    rewired[id] = { ...steps[id]!, next: order[i + 1] ?? exit };
  });
  return { ...d, steps: rewired } as T;
}

/** The median, or null for no values. */
export function median(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/** A compiled step's title found through the definition's embedded sections (`spark/no-spark`). */
function compiledTitle(definition: unknown, stepId: string): string | null {
  const sections = isRecord(definition) && isRecord(own(definition, "sections")) ? (own(definition, "sections") as Record<string, unknown>) : {};
  let steps = stepsOf(definition);
  const parts = stepId.split("/");
  for (let i = 0; i < parts.length; i++) {
    const step = own(steps, parts[i]!) as Record<string, unknown> | undefined;
    if (!isRecord(step)) return null;
    if (i === parts.length - 1) return titleOf(step, stepId);
    if (step.kind !== "section" || typeof step.section !== "string") return null;
    steps = stepsOf(own(sections, step.section));
  }
  return null;
}

const checkOf = (stepId: string, checks: ReadonlySet<string>) => {
  const slash = stepId.indexOf("/");
  const top = slash < 0 ? null : stepId.slice(0, slash);
  return top !== null && checks.has(top) ? top : null;
};

const time = (t: string | Date) => (t instanceof Date ? t.getTime() : Date.parse(t));

/**
 * Minutes a session spent in each check it reached. The time before an event counts for the step it
 * concerns, from the event before it (tablet clocks only, so no server/tablet skew); an event
 * without a step (going back, restarting) counts for the step of the event before it.
 */
export function minutesPerCheck(events: readonly AdviceEvent[], checks: ReadonlySet<string>): Map<string, number> {
  const out = new Map<string, number>();
  let previous: number | null = null;
  let stepId: string | null = null;
  for (const e of events) {
    const at = time(e.recordedAt);
    stepId = e.stepId ?? stepId;
    const check = stepId === null ? null : checkOf(stepId, checks);
    const ms = previous === null || !Number.isFinite(at) || !Number.isFinite(previous) ? 0 : Math.max(0, at - previous);
    if (check !== null) out.set(check, (out.get(check) ?? 0) + ms / 60_000);
    if (Number.isFinite(at)) previous = at;
  }
  return out;
}

/** orderByRatio breaks ties by id; among checks of equal p/c, today's order stands instead. */
function keepOrderOnTies(order: Cause[], today: readonly string[]): Cause[] {
  const index = (c: Cause) => today.indexOf(c.id);
  const tie = (a: Cause, b: Cause) => {
    const x = a.probability * b.cost;
    const y = b.probability * a.cost;
    return Math.abs(x - y) <= 1e-12 * Math.max(Math.abs(x), Math.abs(y));
  };
  const out: Cause[] = [];
  for (let i = 0; i < order.length; ) {
    let j = i + 1;
    while (j < order.length && tie(order[j - 1]!, order[j]!)) j++;
    out.push(...order.slice(i, j).sort((a, b) => index(a) - index(b)));
    i = j;
  }
  return out;
}

const percent = (p: number) => `${Math.round(p * 100)}%`;
const minutes = (m: number) => `${Math.round(m * 10) / 10} min`;

/** The advice for a flow (its latest definition) from its completed sessions on any version. */
export function computeAdvice(definition: unknown, sessions: readonly AdviceSession[], options: AdviceOptions = {}): AdviceResponse {
  const minimumSessions = options.minimumSessions ?? MINIMUM_SESSIONS;
  const sessionCount = sessions.length;
  const checks = topLevelChecks(definition);
  const checkIds = new Set(checks.map((c) => c.stepId));

  const findings = new Map<string, { title: string; count: number }>();
  const samples = new Map<string, number[]>(checks.map((c) => [c.stepId, []]));
  for (const s of sessions) {
    if (s.findingStepId !== null) {
      const f = findings.get(s.findingStepId) ?? { title: s.findingTitle || compiledTitle(definition, s.findingStepId) || s.findingStepId, count: 0 };
      f.count += 1;
      findings.set(s.findingStepId, f);
    }
    for (const [check, m] of minutesPerCheck(s.events, checkIds)) samples.get(check)!.push(m);
  }

  const checkRows = checks.map((c) => ({ ...c, medianMinutes: median(samples.get(c.stepId)!), samples: samples.get(c.stepId)!.length }));
  const findingRows = [...findings]
    .map(([stepId, f]) => ({ stepId, title: f.title, count: f.count, share: f.count / sessionCount }))
    .sort((a, b) => b.count - a.count || (a.stepId < b.stepId ? -1 : a.stepId > b.stepId ? 1 : 0));
  const enough = sessionCount >= minimumSessions;
  const base = { sessionCount, minimumSessions, enough, findings: findingRows, checks: checkRows };

  const chain = checkChain(definition);
  const byId = new Map(checkRows.map((c) => [c.stepId, c]));
  if (!enough || chain.length < 2 || chain.some((id) => byId.get(id)?.medianMinutes == null)) return { ...base, suggestion: null };

  // p: the share of all findings made inside the check; c: its median minutes. expectedCost rescales
  // the shares to the findings made in these checks: the minutes expected in them to a finding there.
  const share = (id: string) => findingRows.filter((f) => checkOf(f.stepId, checkIds) === id).reduce((sum, f) => sum + f.share, 0);
  const causes: Cause[] = chain.map((id) => ({ id, probability: share(id), cost: byId.get(id)!.medianMinutes! }));
  if (causes.every((c) => c.probability === 0)) return { ...base, suggestion: null };
  const cost = (order: readonly Cause[]) => expectedCost(order, "check-every-reached");
  const now = cost(causes);
  const ratio = keepOrderOnTies(orderByRatio(causes), chain);
  // Keep today's order when the p/c order is no quicker.
  const better = cost(ratio) < now - 1e-9 * Math.max(1, now);
  const suggested = better ? ratio : causes;
  const after = better ? cost(ratio) : now;
  const facts = suggested.map((c) => `${byId.get(c.id)!.title} finds ${percent(c.probability)} of faults in a median ${minutes(c.cost)}`).join("; ");
  const scope = "counting every check reached, when the fault lies in one of these checks";
  const explanation = better
    ? `From ${sessionCount} completed sessions: ${facts}. Checking the highest share of faults per minute first brings the expected time to a finding in these checks from ${minutes(now)} to ${minutes(after)} (${scope}).`
    : `From ${sessionCount} completed sessions: ${facts}. Today's order already finds the fault soonest: ${minutes(now)} expected to a finding in these checks (${scope}).`;
  return {
    ...base,
    suggestion: {
      current: chain,
      suggested: suggested.map((c) => c.id),
      expectedMinutesNow: now,
      expectedMinutesSuggested: after,
      explanation,
    },
  };
}
