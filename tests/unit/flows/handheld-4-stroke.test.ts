import { describe, expect, it } from "vitest";
import {
  airClear,
  atSeaLevel,
  compiled,
  compression,
  prime,
  profiles,
  run,
  safetyPass,
  sparkGood,
  type Move,
} from "./flow-fixtures.ts";
import type { EngineProfile } from "../../../shared/equipment.ts";

const flow = compiled("handheld-4-stroke-no-start.json");
const input = atSeaLevel(profiles.handheld4);
const safety = safetyPass({ fuelValve: "none", oil: "ok" });
const upToCompression: Move[] = [...safety, ...sparkGood, ...airClear(false), ["release", "done"]];

describe("handheld 4-stroke no-start flow", () => {
  it("applies to the handheld kinds with a 4-stroke engine", () => {
    expect(flow.appliesTo).toEqual({ equipment: ["string_trimmer", "chainsaw", "leaf_blower", "hedge_trimmer"], cycle: 4 });
  });

  it("asks for the compression release on the record before the gauge goes in", () => {
    const order = Object.keys(flow.steps);
    expect(order.indexOf("release")).toBeLessThan(order.indexOf("compression/prep"));
    expect(flow.steps["air/two-stroke"]?.kind === "choice" && flow.steps["air/two-stroke"].options.find((o) => o.value === "no")?.next).toBe("release");
  });

  it("80 psi with a compression release is marginal, not low: the flow carries on to fuel", () => {
    // Common practice (no published source): a 4-stroke with an automatic compression release reads low on a cranking
    // gauge; about 80 psi on such an engine is marginal, not a failure, and it may still start (references.md section 5).
    const end = run(flow, input, [...upToCompression, ...compression(80), ["compression/marginal", "done"]]);
    expect(end.context.readings.at(-1)?.verdict).toBe("marginal");
    expect(end.context.path).not.toContain("compression/bolts");
    expect(end.stepId).toBe("prime/intake");
  });

  it("the same 70 psi reads good with a release and low without one", () => {
    // Weak published source (a general engine-testing guide, via references.md section 5): 60-75 psi is ordinary for
    // small 4-strokes with a compression release.
    // Common practice (no published source): without a release the whole stroke is compressed, like a 2-stroke (90 psi and up).
    const withRelease = run(flow, input, [...upToCompression, ...compression(70)]);
    expect(withRelease.stepId).toBe("prime/intake");
    const noRelease: EngineProfile = { ...profiles.handheld4, compressionRelease: "no" };
    const without = run(flow, atSeaLevel(noRelease), [...upToCompression, ...compression(70)]);
    expect(without.stepId).toBe("compression/bolts");
  });

  it("20 psi with a release is low: head bolts, then worn rings or cylinder", () => {
    // Weak published source (references.md section 5): below about 25 psi something is wrong even with a release.
    const end = run(flow, input, [...upToCompression, ...compression(20), ["compression/bolts", "done"], ["compression/bolts-result", "no"]]);
    expect(end.findingStepId).toBe("compression/worn");
  });

  it("an overfilled crankcase and an oil-soaked filter: the overfill finding", () => {
    // Common practice (no published source): an overfilled 4-stroke crankcase pushes oil through the breather into the
    // air box and soaks the filter (references.md section 5).
    const end = run(flow, input, [
      ...safety.slice(0, 6),
      ["prepare/oil-level", "over"],
      ["prepare/oil-drain", "done"],
      ["prepare/reproduce", "done"],
      ["prepare/reproduce-result", "no"],
      ...sparkGood,
      ["air/filter", "done"],
      ["air/filter-result", "oil"],
      ["air/oil-source", "yes"],
    ]);
    expect(end.findingStepId).toBe("air/filter-overfill");
  });

  it("a fuel-wet air filter: the carburettor-flooding finding", () => {
    const end = run(flow, input, [...safety, ...sparkGood, ["air/filter", "done"], ["air/filter-result", "fuel"]]);
    expect(end.findingStepId).toBe("air/flooding");
  });

  it("starts on the shot and keeps running: the cold-starting finding", () => {
    const end = run(flow, input, [...upToCompression, ...compression(65), ...prime("runs")]);
    expect(end.findingStepId).toBe("prime/starts-when-primed");
  });

  it("no fire on the shot, valve clearances out: the valve finding", () => {
    const end = run(flow, input, [...upToCompression, ...compression(65), ...prime("nothing"), ["valves", "done"], ["valves-result", "no"]]);
    expect(end.findingStepId).toBe("valves-out");
  });

  it("valves right, key sheared: the flywheel-key finding; key sound: deeper diagnosis", () => {
    const tail: Move[] = [...upToCompression, ...compression(65), ...prime("nothing"), ["valves", "done"], ["valves-result", "yes"], ["flywheel", "done"]];
    expect(run(flow, input, [...tail, ["flywheel-result", "yes"]]).findingStepId).toBe("flywheel-key");
    expect(run(flow, input, [...tail, ["flywheel-result", "no"]]).findingStepId).toBe("no-cause");
  });

  it("a rodent-chewed lead behind no spark: the ignition-wiring finding", () => {
    // Common practice (no published source): look for rodent damage when there is no spark (trade.md, "Spark test").
    const end = run(flow, input, [
      ...safety,
      ["spark/connect", "done"],
      ["spark/pull", "done"],
      ["spark/flash", "some"],
      ["spark/stop-lead", "done"],
      ["spark/stop-lead-result", "no"],
      ["spark/wiring", "done"],
      ["spark/wiring-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("spark/wiring-damaged");
  });
});
