// fast-check material: flows that are valid by construction, and documents that are mostly garbage.
import fc from "fast-check";
import type { Band, FlowDefinition, FlowStep, SectionDefinition } from "../../../shared/flow/schema.ts";

/** A small deterministic generator, so one fast-check seed builds one flow. */
function random(seed: number) {
  let a = seed >>> 0;
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const int = (lo: number, hi: number) => lo + Math.floor(next() * (hi - lo + 1));
  const pick = <T>(xs: readonly T[]): T => xs[int(0, xs.length - 1)]!;
  return { next, int, pick };
}
type Rng = ReturnType<typeof random>;

/** Bands over [1, 100] mm cut at random points, each edge held by exactly one side. */
function randomBands(rng: Rng, targets: string[]): Band[] {
  const cuts = [...new Set(Array.from({ length: targets.length - 1 }, () => rng.int(100, 10_000)))].sort((x, y) => x - y).map((c) => c / 100);
  const bands: Band[] = [];
  let from: Band["from"] = null;
  cuts.forEach((cut, i) => {
    const leftHolds = rng.next() < 0.5;
    bands.push({ from, to: { value: cut, inclusive: leftHolds }, label: `Band ${i}`, verdict: rng.pick(["good", "low", "high", "marginal"]), next: targets[i]! });
    from = { value: cut, inclusive: !leftHolds };
  });
  bands.push({ from, to: null, label: `Band ${cuts.length}`, verdict: "high", next: targets[cuts.length]! });
  return bands;
}

const findingStep = (i: number): FlowStep => ({ kind: "finding", title: `Finding ${i}`, certainty: "likely", explanation: "Generated.", repairs: [{ title: "Repair", labourHours: 1, parts: [] }] });

/**
 * Steps s0..s(n-1) on a spine (each one's first way out goes to the next, the last to an exit), so
 * every step is reachable and can reach an exit; further options may go anywhere, loops included.
 */
function buildSteps(rng: Rng, n: number, exit: string, callable: string[]): Record<string, FlowStep> {
  const steps: Record<string, FlowStep> = {};
  const findings = rng.int(exit === "@continue" ? 0 : 1, 3);
  const ids = Array.from({ length: n }, (_, i) => `s${i}`);
  const ends = Array.from({ length: findings }, (_, i) => `f${i}`);
  const used = new Set<string>();
  const anywhere = () => {
    const t = rng.pick([...ids, ...ends, ...(exit === "@continue" ? [exit] : [])]);
    used.add(t);
    return t;
  };
  ids.forEach((id, i) => {
    const spine = i + 1 < n ? ids[i + 1]! : exit;
    used.add(spine);
    const kinds = ["instruction", "choice", "choice", "reading", "compression", ...(callable.length ? ["section"] : [])] as const;
    const kind = rng.pick(kinds);
    if (kind === "instruction") steps[id] = { kind, title: `Step ${id}`, next: spine };
    else if (kind === "choice") {
      const targets = [spine, ...Array.from({ length: rng.int(1, 3) }, anywhere)];
      steps[id] = { kind, title: `Question ${id}?`, options: targets.map((next, k) => ({ value: `o${k}`, label: `Option ${k}`, next })) };
    } else if (kind === "reading") {
      steps[id] = { kind, title: `Measure ${id}`, quantity: "length", unit: "mm", bands: randomBands(rng, [spine, ...Array.from({ length: rng.int(0, 3) }, anywhere)]) };
    } else if (kind === "compression") {
      // Verdicts lead on only along the spine or out, so an unlucky reading can never trap a walk.
      const on = () => {
        const t = rng.pick([spine, ...ends.slice(0, 1)]);
        used.add(t);
        return t;
      };
      steps[id] = { kind: "reading", title: `Compression ${id}`, quantity: "pressure", unit: "psi", evaluation: { kind: "compression", next: { good: spine, marginal: on(), low: on(), implausible: on() } } };
    } else steps[id] = { kind: "section", title: `Run a section`, section: rng.pick(callable), next: spine };
  });
  // A finding no option happens to name would be unreachable: only the named ones are kept.
  ends.forEach((id, i) => {
    if (used.has(id)) steps[id] = findingStep(i);
  });
  if (exit !== "@continue") steps[exit] = findingStep(99);
  return steps;
}

export interface BuiltFlow {
  flow: FlowDefinition;
  sections: SectionDefinition[];
}

export function buildFlow(seed: number, size: number): BuiltFlow {
  const rng = random(seed);
  const sections: SectionDefinition[] = [];
  for (let k = 0; k < rng.int(0, 3); k++) {
    // A section may call only the ones built before it, so none can reach itself.
    const id = `sec-${k}`;
    sections.push({ formatVersion: 1, id, title: `Section ${k}`, start: "s0", steps: buildSteps(rng, rng.int(1, 4), "@continue", sections.map((s) => s.id)) });
  }
  const steps = buildSteps(rng, size, "end", sections.map((s) => s.id));
  return { flow: { formatVersion: 1, id: `random-${seed >>> 0}`, title: "Random flow", appliesTo: { equipment: ["other"], cycle: "any" }, start: "s0", steps }, sections };
}

export const validFlowArb = fc.record({ seed: fc.integer(), size: fc.integer({ min: 1, max: 30 }) }).map(({ seed, size }) => buildFlow(seed, size));

// Garbage with enough structure to reach the deeper checks: steps of real kinds with mostly sound
// fields, a few ids so targets often hit, small numbers so bands often meet, gap or overlap, and now
// and then anything at all in any place.
const maybe = <T>(arb: fc.Arbitrary<T>) => fc.oneof({ weight: 9, arbitrary: arb }, { weight: 1, arbitrary: fc.anything() });
const slugArb = fc.constantFrom("a", "b", "c", "d", "f", "sec", "loop");
const targetArb = fc.oneof({ weight: 10, arbitrary: slugArb }, { weight: 1, arbitrary: fc.constant("@continue") }, { weight: 1, arbitrary: fc.anything() });
const titleArb = maybe(fc.constantFrom("Check it", "Is it worn?", ""));
const boundArb = fc.option(fc.record({ value: maybe(fc.constantFrom(0, 0.25, 0.36, 1, 2)), inclusive: maybe(fc.boolean()) }), { freq: 3 });
const bandArb = fc.record({ from: boundArb, to: boundArb, label: maybe(fc.constantFrom("Low", "Good", "High")), verdict: maybe(fc.constantFrom("good", "low", "high")), next: targetArb });
const cautionsArb = fc.array(fc.record({ signal: fc.constantFrom("DANGER", "WARNING", "NOTICE"), text: fc.option(fc.constantFrom("Hot muffler.", " ")) }, { requiredKeys: ["signal"] }), { maxLength: 2 });
const base = { title: titleArb, cautions: cautionsArb };
const stepArb = fc.oneof(
  fc.record({ kind: fc.constant("instruction"), ...base, next: targetArb }, { requiredKeys: ["kind", "title", "next"] }),
  fc.record({ kind: fc.constant("choice"), title: titleArb, options: maybe(fc.array(fc.record({ value: maybe(fc.constantFrom("yes", "no", "maybe")), label: fc.constant("An option"), next: targetArb }), { minLength: 1, maxLength: 4 })) }),
  fc.record(
    { kind: fc.constant("reading"), title: titleArb, quantity: maybe(fc.constantFrom("length", "pressure")), unit: maybe(fc.constantFrom("mm", "in", "psi", "furlong")), bands: maybe(fc.array(bandArb, { minLength: 1, maxLength: 4 })), evaluation: fc.record({ kind: maybe(fc.constant("compression")), next: fc.record({ good: targetArb, marginal: targetArb, low: targetArb, implausible: targetArb }) }) },
    { requiredKeys: ["kind", "title", "quantity", "unit"] },
  ),
  fc.record({ kind: fc.constant("finding"), title: titleArb, certainty: maybe(fc.constantFrom("likely", "confirmed")), explanation: fc.constant("Because."), repairs: maybe(fc.array(fc.record({ title: fc.constant("Fix"), labourHours: maybe(fc.constantFrom(0, 1.5)), parts: fc.constant([]) }), { maxLength: 2 })) }),
  fc.record({ kind: fc.constant("section"), title: titleArb, section: maybe(slugArb), next: targetArb }),
  fc.anything(),
);
const documentFields = {
  formatVersion: maybe(fc.constant(1)),
  id: maybe(slugArb),
  title: maybe(fc.constant("A document")),
  start: maybe(slugArb),
  steps: maybe(fc.dictionary(slugArb, stepArb, { maxKeys: 7 })),
};
export const garbageSectionArb = fc.record(documentFields);
export const garbageFlowArb = fc.record(
  { ...documentFields, appliesTo: maybe(fc.constant({ equipment: ["chainsaw"], cycle: 2 })), sections: fc.dictionary(slugArb, garbageSectionArb, { maxKeys: 2 }) },
  { requiredKeys: ["formatVersion", "id", "title", "start", "steps", "appliesTo"] },
);
export const garbageLibraryArb = maybe(fc.array(garbageSectionArb, { maxLength: 4 }));

/** A flow built valid, then changed in one place: often still valid, often not, never garbage. */
export const mutatedFlowArb = fc.record({ built: validFlowArb, what: fc.nat(5), at: fc.nat(), to: fc.nat() }).map(({ built, what, at, to }) => {
  const copy: BuiltFlow = JSON.parse(JSON.stringify(built));
  const docs = [copy.flow, ...copy.sections];
  const doc = docs[at % docs.length]!;
  const ids = Object.keys(doc.steps);
  const id = ids[at % ids.length]!;
  const other = [...ids, "@continue", "ghost"][to % (ids.length + 2)]!;
  const step = doc.steps[id] as Record<string, unknown>;
  if (what === 0) delete doc.steps[id];
  else if (what === 1 && "next" in step) step.next = other;
  else if (what === 2 && Array.isArray(step.options)) (step.options as Array<{ next: string }>)[to % step.options.length]!.next = other;
  else if (what === 3 && Array.isArray(step.bands)) (step.bands as Band[])[to % step.bands.length]!.from = { value: (to % 50) + 1, inclusive: to % 2 === 0 };
  else if (what === 4 && copy.sections.length) doc.steps[id] = { kind: "section", title: "Call", section: copy.sections[to % copy.sections.length]!.id, next: other };
  else doc.start = other;
  return copy;
});
