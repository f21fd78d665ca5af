// Loads the built-in flows from disk and drives them through the real compiler, machine and replay.
import { readdirSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import type { EngineProfile } from "../../../shared/equipment.ts";
import { compileFlow, type CompiledFlow, type CompiledStep } from "../../../shared/flow/compile.ts";
import { replay } from "../../../shared/flow/replay.ts";
import type { FlowEvent, SectionDefinition } from "../../../shared/flow/schema.ts";
import type { FlowInput } from "../../../shared/flow/step-rules.ts";

export const flowsDir = fileURLToPath(new URL("../../../flows/", import.meta.url));
export const repoRoot = fileURLToPath(new URL("../../../", import.meta.url));

const readJson = (path: string): unknown => JSON.parse(readFileSync(path, "utf8"));

export const flowFiles = readdirSync(flowsDir).filter((f) => f.endsWith(".json")).sort();
export const sectionFiles = readdirSync(`${flowsDir}sections`).filter((f) => f.endsWith(".json")).sort();

export function loadFlow(file: string): unknown {
  return readJson(`${flowsDir}${file}`);
}

export function loadSections(): SectionDefinition[] {
  return sectionFiles.map((f) => readJson(`${flowsDir}sections/${f}`) as SectionDefinition);
}

export function compiled(file: string): CompiledFlow {
  return compileFlow(loadFlow(file), loadSections());
}

export const profiles = {
  handheld2: { cycle: 2, compressionRelease: "no", displacementCc: 25, specPsi: null },
  handheld4: { cycle: 4, compressionRelease: "yes", displacementCc: 25, specPsi: null },
  mower: { cycle: 4, compressionRelease: "yes", displacementCc: 160, specPsi: null },
  generator: { cycle: 4, compressionRelease: "yes", displacementCc: 200, specPsi: null },
} satisfies Record<string, EngineProfile>;

export const atSeaLevel = (profile: EngineProfile): FlowInput => ({ profile, altitudeM: 0 });

/** A scripted visit: [step, answer] for choices and instructions ("done"), [step, { value, unit }] for readings. */
export type Move = [stepId: string, answer: string | { value: number; unit: string }];

export function toEvents(moves: readonly Move[]): FlowEvent[] {
  return moves.map(([stepId, answer]) =>
    typeof answer === "string"
      ? { type: "step.answer", stepId, value: answer }
      : { type: "step.record", stepId, value: answer.value, unit: answer.unit },
  );
}

/** Replays the moves and returns where the session ended; throws with the machine's own reason if it refuses one. */
export function run(flow: CompiledFlow, input: FlowInput, moves: readonly Move[]) {
  const result = replay(flow, input, toEvents(moves));
  if (!result.ok) throw new Error(`move ${result.index} (${JSON.stringify(moves[result.index])}) refused at "${result.stepId}": ${result.reason}`);
  return result;
}

/** Steps as the tech sees them: every compiled step that is not a finding. */
export function actionSteps(flow: CompiledFlow): CompiledStep[] {
  return Object.values(flow.steps).filter((s) => s.kind !== "finding");
}

export const stepText = (step: CompiledStep) => `${step.title}\n${step.body ?? ""}`;

// Common passages through the shared sections, by the id the flow gives the calling step.

export function safetyPass(opts: { fuelValve: "open" | "none"; oil: "ok" | "none" }): Move[] {
  return [
    ["prepare/protect", "done"],
    ["prepare/as-received", "done"],
    ["prepare/secure", "done"],
    ["prepare/controls", "yes"],
    ["prepare/fuel-valve", opts.fuelValve],
    ["prepare/fuel-tank", "fresh"],
    ["prepare/oil-level", opts.oil],
    ["prepare/reproduce", "done"],
    ["prepare/reproduce-result", "no"],
  ];
}

export const sparkGood: Move[] = [
  ["spark/connect", "done"],
  ["spark/pull", "done"],
  ["spark/flash", "every"],
  ["spark/plug-remove", "done"],
  ["spark/plug-look", "dry"],
];

export const noSparkThroughWiring: Move[] = [
  ["spark/connect", "done"],
  ["spark/pull", "done"],
  ["spark/flash", "none"],
  ["spark/stop-lead", "done"],
  ["spark/stop-lead-result", "no"],
  ["spark/wiring", "done"],
  ["spark/wiring-result", "no"],
];

export function airClear(twoStroke: boolean): Move[] {
  const head: Move[] = [
    ["air/filter", "done"],
    ["air/filter-result", "clean"],
    ["air/arrestor", "done"],
    ["air/arrestor-result", "clear"],
  ];
  return twoStroke
    ? [...head, ["air/two-stroke", "yes"], ["air/port", "done"], ["air/port-result", "no"]]
    : [...head, ["air/two-stroke", "no"]];
}

export function compression(psi: number, unit = "psi"): Move[] {
  return [
    ["compression/prep", "done"],
    ["compression/crank", "done"],
    ["compression/reading", { value: psi, unit }],
  ];
}

export function prime(result: "fires-dies" | "runs" | "nothing"): Move[] {
  return [
    ["prime/intake", "done"],
    ["prime/spray", "done"],
    ["prime/try", "done"],
    ["prime/result", result],
  ];
}

/** Through the fuel-delivery section with nothing wrong, up to the carburettor's verdict. */
export function fuelSoundUpToCarb(carb: "varnish" | "parts" | "clean"): Move[] {
  return [
    ["prime/fuel/photos", "done"],
    ["prime/fuel/fresh", "yes"],
    ["prime/fuel/filter", "done"],
    ["prime/fuel/filter-result", "no"],
    ["prime/fuel/lines", "done"],
    ["prime/fuel/lines-result", "no"],
    ["prime/fuel/primer", "yes"],
    ["prime/fuel/trace", "done"],
    ["prime/fuel/bulb", "good"],
    ["prime/fuel/vent", "done"],
    ["prime/fuel/vent-result", "no"],
    ["prime/fuel/carb", "done"],
    ["prime/fuel/carb-result", carb],
  ];
}
