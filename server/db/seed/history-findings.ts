// How often each finding of the built-in flows is the answer in the invented history. Fuel problems
// come first (the trade's rule of thumb: fuel and the carburettor behind most no-starts), then
// spark, then air and exhaust, then compression, then everything else.
import type { CompiledFlow, CompiledStep } from "../../../shared/flow/compile.ts";

export const faultAreas = ["fuel", "spark", "air", "compression", "other"] as const;
export type FaultArea = (typeof faultAreas)[number];

export const areaWeights: Record<FaultArea, number> = { fuel: 55, spark: 18, air: 10, compression: 7, other: 10 };

/** Keyed by where the finding is written: its section (or its flow, for a flow's own step) and its id there. */
export const findingWeights: Record<string, { area: FaultArea; weight: number }> = {
  "safety-and-reproduce/stale-fuel": { area: "fuel", weight: 6 },
  "fuel-delivery/carb-varnish": { area: "fuel", weight: 6 },
  "fuel-delivery/carb-parts": { area: "fuel", weight: 2.5 },
  "fuel-delivery/filter-blocked": { area: "fuel", weight: 2.5 },
  "fuel-delivery/lines-cracked": { area: "fuel", weight: 2.5 },
  "fuel-delivery/primer-bulb": { area: "fuel", weight: 2 },
  "fuel-delivery/lines-swapped": { area: "fuel", weight: 0.6 },
  "fuel-delivery/tank-vent": { area: "fuel", weight: 1.5 },
  "air-and-exhaust/flooding": { area: "fuel", weight: 1 },
  "generator-no-start/choke-stuck": { area: "fuel", weight: 1 },
  "spark-check/plug-fouled": { area: "spark", weight: 4 },
  "spark-check/stop-switch-grounding": { area: "spark", weight: 2 },
  "spark-check/wiring-damaged": { area: "spark", weight: 1 },
  "spark-check/air-gap-out": { area: "spark", weight: 1.5 },
  "spark-check/coil-failed": { area: "spark", weight: 2 },
  "air-and-exhaust/filter-clogged": { area: "air", weight: 3 },
  "air-and-exhaust/filter-oily": { area: "air", weight: 1 },
  "air-and-exhaust/filter-overfill": { area: "air", weight: 1 },
  "air-and-exhaust/arrestor-blocked": { area: "air", weight: 2 },
  "air-and-exhaust/port-carbon": { area: "air", weight: 1.5 },
  "compression-check/head-bolts": { area: "compression", weight: 1 },
  "compression-check/worn": { area: "compression", weight: 2 },
  "handheld-4-stroke-no-start/valves-out": { area: "compression", weight: 1.5 },
  "walk-behind-mower-no-start/valves-out": { area: "compression", weight: 1.5 },
  "generator-no-start/valves-out": { area: "compression", weight: 1.5 },
  "handheld-2-stroke-no-start/air-leak": { area: "compression", weight: 1.5 },
  "safety-and-reproduce/controls-not-set": { area: "other", weight: 2 },
  "safety-and-reproduce/fuel-valve-closed": { area: "other", weight: 1.5 },
  "safety-and-reproduce/tank-empty": { area: "other", weight: 1 },
  "safety-and-reproduce/low-oil-shutdown": { area: "other", weight: 1.5 },
  "safety-and-reproduce/no-fault": { area: "other", weight: 1 },
  "prime-and-spray/starts-when-primed": { area: "other", weight: 1.5 },
  "spark-check/oil-sensor-failed": { area: "other", weight: 0.5 },
  "walk-behind-mower-no-start/bail-cable": { area: "other", weight: 2 },
  "walk-behind-mower-no-start/flywheel-key": { area: "other", weight: 2 },
  "handheld-2-stroke-no-start/flywheel-key": { area: "other", weight: 0.5 },
  "handheld-4-stroke-no-start/flywheel-key": { area: "other", weight: 0.5 },
  "generator-no-start/flywheel-key": { area: "other", weight: 0.3 },
  "generator-no-start/not-level": { area: "other", weight: 1 },
  "generator-no-start/sensor-failed": { area: "other", weight: 1 },
  "handheld-2-stroke-no-start/no-cause": { area: "other", weight: 0.5 },
  "handheld-4-stroke-no-start/no-cause": { area: "other", weight: 0.5 },
  "walk-behind-mower-no-start/no-cause": { area: "other", weight: 0.5 },
  "generator-no-start/no-cause": { area: "other", weight: 0.5 },
};

export function findingKey(flow: CompiledFlow, step: CompiledStep): string {
  return `${step.origin.section ?? flow.id}/${step.origin.stepId}`;
}

/** Findings after which the unit goes back as it came: nothing to repair or quote. */
export const nothingToRepair = new Set(["safety-and-reproduce/controls-not-set", "safety-and-reproduce/fuel-valve-closed", "safety-and-reproduce/tank-empty", "safety-and-reproduce/no-fault"]);
