// Builds large valid flows for the benchmark: repeating blocks of every step kind, bands and sections.
import type { FlowDefinition, FlowStep, SectionDefinition } from "../../shared/flow/schema.ts";

const finding = (title: string): FlowStep => ({
  kind: "finding",
  title,
  certainty: "likely",
  explanation: `${title}: generated for the benchmark.`,
  repairs: [{ title: `Repair: ${title}`, labourHours: 0.5, parts: ["Generated part"] }],
});

/** A section that itself calls another, so inlining nests prefixes. */
export const benchSections: SectionDefinition[] = [
  {
    formatVersion: 1,
    id: "bench-inner",
    title: "Inner check",
    start: "look",
    steps: {
      look: { kind: "choice", title: "Is the part intact?", options: [
        { value: "yes", label: "Yes", next: "@continue" },
        { value: "no", label: "No", next: "broken" },
      ] },
      broken: finding("Broken part"),
    },
  },
  {
    formatVersion: 1,
    id: "bench-check",
    title: "Block check",
    start: "clean",
    steps: {
      clean: { kind: "instruction", title: "Clean the area", cautions: [{ signal: "WARNING", text: "Hot surfaces: let the engine cool." }], next: "inner" },
      inner: { kind: "section", title: "Inner check", section: "bench-inner", next: "@continue" },
    },
  },
];

// Each block has 5 steps of its own and 7 once its section (and the section inside it) is inlined.
const BLOCK_COMPILED_STEPS = 7;

/** A flow of about `steps` runnable steps once compiled, the size the machine has to handle. */
export function benchFlow(steps: number): FlowDefinition {
  const blocks = Math.max(1, Math.floor((steps - 1) / BLOCK_COMPILED_STEPS));
  const all: Record<string, FlowStep> = {};
  for (let i = 0; i < blocks; i++) {
    const b = `b${i}`;
    const after = i + 1 < blocks ? `b${i + 1}-prep` : "end";
    const measure: FlowStep =
      i % 5 === 4
        ? { kind: "reading", title: "Test compression", quantity: "pressure", unit: "psi", evaluation: { kind: "compression", next: { good: `${b}-sec`, marginal: `${b}-sec`, low: `${b}-fix`, implausible: `${b}-prep` } } }
        : {
            kind: "reading",
            title: "Measure the air gap",
            quantity: "length",
            unit: "mm",
            bands: [
              { from: null, to: { value: 0.25, inclusive: false }, label: "Too close", verdict: "low", next: `${b}-fix` },
              { from: { value: 0.25, inclusive: true }, to: { value: 0.36, inclusive: true }, label: "Within range", verdict: "good", next: `${b}-sec` },
              { from: { value: 0.36, inclusive: false }, to: null, label: "Too wide", verdict: "high", next: `${b}-fix` },
            ],
          };
    all[`${b}-prep`] = { kind: "instruction", title: "Prepare the unit", minSeconds: 10, next: `${b}-ask` };
    all[`${b}-ask`] = {
      kind: "choice",
      title: "Does it turn over?",
      options: [
        { value: "yes", label: "Yes", next: `${b}-measure` },
        { value: "no", label: "No", next: `${b}-fix` },
        { value: "again", label: "Check again", next: `${b}-prep` },
      ],
    };
    all[`${b}-measure`] = measure;
    all[`${b}-sec`] = { kind: "section", title: "Block check", section: "bench-check", next: after };
    all[`${b}-fix`] = finding(`Fault in block ${i}`);
  }
  all.end = finding("No fault found");
  return { formatVersion: 1, id: `bench-${steps}`, title: `Benchmark flow of ${steps} steps`, appliesTo: { equipment: ["chainsaw"], cycle: 2 }, start: "b0-prep", steps: all };
}

/**
 * A long session: block after block to the end, going back once every third block and answering
 * again, readings in both units; it stops at `maxEvents`.
 */
export function benchPath(flow: FlowDefinition, maxEvents: number): unknown[] {
  const events: unknown[] = [];
  const blocks = Object.keys(flow.steps).filter((id) => id.endsWith("-prep")).length;
  for (let i = 0; i < blocks && events.length < maxEvents; i++) {
    const b = `b${i}`;
    events.push({ type: "step.answer", stepId: `${b}-prep`, value: "done" });
    if (i % 3 === 0) events.push({ type: "step.back" }, { type: "step.answer", stepId: `${b}-prep`, value: "done" });
    events.push({ type: "step.answer", stepId: `${b}-ask`, value: "yes" });
    events.push(
      i % 5 === 4
        ? { type: "step.record", stepId: `${b}-measure`, value: 120, unit: "psi" }
        : i % 2 === 0
          ? { type: "step.record", stepId: `${b}-measure`, value: 0.3, unit: "mm" }
          : { type: "step.record", stepId: `${b}-measure`, value: 0.012, unit: "in" },
    );
    events.push({ type: "step.answer", stepId: `${b}-sec/clean`, value: "done" });
    events.push({ type: "step.answer", stepId: `${b}-sec/inner/look`, value: "yes" });
  }
  return events;
}
