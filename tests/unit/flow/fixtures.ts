// Tiny flows and sections for the engine's tests, each written to show one thing.
import type { EngineProfile } from "../../../shared/equipment.ts";
import type { Band, FlowDefinition, FlowStep, SectionDefinition } from "../../../shared/flow/schema.ts";
import type { FlowInput } from "../../../shared/flow/step-rules.ts";

export const instruction = (next: string, extra: Partial<FlowStep> = {}): FlowStep => ({ kind: "instruction", title: "Do the thing", next, ...extra }) as FlowStep;

export const choice = (options: Record<string, string>): FlowStep => ({
  kind: "choice",
  title: "Which is it?",
  options: Object.entries(options).map(([value, next]) => ({ value, label: value, next })),
});

export const finding = (title = "The cause", repairs = true): FlowStep => ({
  kind: "finding",
  title,
  certainty: "likely",
  explanation: `${title}, as the checks showed.`,
  repairs: repairs ? [{ title: "Fix it", labourHours: 0.5, parts: ["part"] }] : [],
});

export const sectionStep = (section: string, next: string): FlowStep => ({ kind: "section", title: `Run ${section}`, section, next });

const bound = (value: number, inclusive: boolean) => ({ value, inclusive });
/** Air-gap bands in mm: below 0.25 too close, 0.25 to 0.36 inclusive good, above too wide. */
export const gapBands = (low: string, good: string, high: string): Band[] => [
  { from: null, to: bound(0.25, false), label: "Too close", verdict: "low", next: low },
  { from: bound(0.25, true), to: bound(0.36, true), label: "Within range", verdict: "good", next: good },
  { from: bound(0.36, false), to: null, label: "Too wide", verdict: "high", next: high },
];

export const gapReading = (bands: Band[], unit = "mm"): FlowStep => ({ kind: "reading", title: "Measure the air gap", quantity: "length", unit, bands });

export const compressionReading = (next: { good: string; marginal: string; low: string; implausible: string }): FlowStep => ({
  kind: "reading",
  title: "Read the compression",
  quantity: "pressure",
  unit: "psi",
  evaluation: { kind: "compression", next },
});

export function flow(steps: Record<string, FlowStep>, start = Object.keys(steps)[0]!, id = "test-flow"): FlowDefinition {
  return { formatVersion: 1, id, title: "Test flow", appliesTo: { equipment: ["chainsaw"], cycle: 2 }, start, steps };
}

export function section(id: string, steps: Record<string, FlowStep>, start = Object.keys(steps)[0]!): SectionDefinition {
  return { formatVersion: 1, id, title: `Section ${id}`, start, steps };
}

export const twoStroke: EngineProfile = { cycle: 2, compressionRelease: "no", displacementCc: 40, specPsi: null };
export const seaLevel: FlowInput = { profile: twoStroke, altitudeM: 0 };

export const answer = (stepId: string, value = "done") => ({ type: "step.answer" as const, stepId, value });
export const record = (stepId: string, value: number, unit: string) => ({ type: "step.record" as const, stepId, value, unit });
export const back = { type: "step.back" as const };
export const restart = { type: "session.restart" as const };

/**
 * A small flow with every kind: check → choice → (gap reading | compression) → findings, with a
 * loop back that has a way out and a section that itself calls a section.
 */
export const innerSection = section("inner", { look: choice({ ok: "@continue", bad: "worn" }), worn: finding("Worn part") });
export const outerSection = section("outer", { clean: instruction("deeper"), deeper: sectionStep("inner", "@continue") });
export const sampleFlow = flow({
  start: instruction("ask"),
  ask: choice({ gap: "gap", compression: "compression", again: "start" }),
  gap: gapReading(gapBands("close", "check", "wide")),
  compression: compressionReading({ good: "check", marginal: "check", low: "rings", implausible: "compression" }),
  check: sectionStep("outer", "done"),
  close: finding("Gap too close"),
  wide: finding("Gap too wide"),
  rings: finding("Worn rings"),
  done: finding("Nothing wrong found"),
});
export const sampleSections = [innerSection, outerSection];
