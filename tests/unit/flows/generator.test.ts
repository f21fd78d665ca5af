import { describe, expect, it } from "vitest";
import {
  airClear,
  atSeaLevel,
  compiled,
  compression,
  noSparkThroughWiring,
  prime,
  profiles,
  run,
  safetyPass,
  sparkGood,
  stepText,
  type Move,
} from "./flow-fixtures.ts";

const flow = compiled("generator-no-start.json");
const input = atSeaLevel(profiles.generator);
const safety = safetyPass({ fuelValve: "open", oil: "ok" });
const outdoors: Move[] = [["outdoors", "done"]];
const noLamp: Move[] = [["shutdown-watch", "done"], ["lamp", "no"]];
const chokeGood: Move[] = [["choke", "done"], ["choke-result", "yes"]];

describe("generator no-start flow", () => {
  it("applies to generators with a 4-stroke engine", () => {
    expect(flow.appliesTo).toEqual({ equipment: ["generator"], cycle: 4 });
  });

  it("opens with a DANGER panel on carbon monoxide, before any other step", () => {
    // Source: 16 CFR 1407 (references.md section 4) — never run a generator indoors; ANSI Z535.4 DANGER.
    expect(flow.start).toBe("outdoors");
    const danger = flow.steps.outdoors?.cautions?.find((c) => c.signal === "DANGER");
    expect(danger?.text).toMatch(/carbon monoxide/i);
    expect(danger?.text).toMatch(/outside/i);
    expect(danger?.text).toMatch(/doors, windows/i);
  });

  it("low oil topped up and then it runs: the low-oil shutdown finding", () => {
    // Common practice (no published source): some 4-strokes have a low-oil shutdown that trips on low oil (trade.md).
    const end = run(flow, input, [
      ...outdoors,
      ...safety.slice(0, 6),
      ["prepare/oil-level", "low"],
      ["prepare/oil-top-up", "done"],
      ["prepare/oil-top-up-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("prepare/low-oil-shutdown");
  });

  it("shutdown lamp on a slope, runs once level: the not-level finding", () => {
    // Common practice (no published source): a low-oil shutdown trips when the unit is not level (trade.md).
    const end = run(flow, input, [
      ...outdoors,
      ...safety,
      ["shutdown-watch", "done"],
      ["lamp", "yes"],
      ["level", "no"],
      ["level-retry", "done"],
      ["level-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("not-level");
  });

  it("shutdown lamp with the oil full and the unit level, runs with the sensor off: the failed-sensor finding", () => {
    // Common practice (no published source): a failed low-oil sensor shuts the engine down with the oil full (trade.md).
    const end = run(flow, input, [
      ...outdoors,
      ...safety,
      ["shutdown-watch", "done"],
      ["lamp", "yes"],
      ["level", "yes"],
      ["sensor-test", "done"],
      ["sensor-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("sensor-failed");
  });

  it("no spark with a sound stop circuit and gap, spark back with the sensor lead off: the spark-check sensor finding", () => {
    const end = run(flow, input, [
      ...outdoors,
      ...safety,
      ...noLamp,
      ...chokeGood,
      ...noSparkThroughWiring,
      ["spark/air-gap", { value: 0.3, unit: "mm" }],
      ["spark/oil-sensor", "yes"],
      ["spark/oil-sensor-test", "done"],
      ["spark/oil-sensor-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("spark/oil-sensor-failed");
  });

  it("a closed fuel valve that opens and runs: the fuel-valve finding", () => {
    const end = run(flow, input, [
      ...outdoors,
      ...safety.slice(0, 4),
      ["prepare/fuel-valve", "closed"],
      ["prepare/fuel-valve-open", "done"],
      ["prepare/fuel-valve-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("prepare/fuel-valve-closed");
  });

  it("a choke that sticks part-way: the choke finding", () => {
    const end = run(flow, input, [...outdoors, ...safety, ...noLamp, ["choke", "done"], ["choke-result", "no"]]);
    expect(end.findingStepId).toBe("choke-stuck");
  });

  it("everything sound through the valves and the key: deeper diagnosis", () => {
    const end = run(flow, input, [
      ...outdoors,
      ...safety,
      ...noLamp,
      ...chokeGood,
      ...sparkGood,
      ...airClear(false),
      ["release", "done"],
      ...compression(70),
      ...prime("nothing"),
      ["valves", "done"],
      ["valves-result", "yes"],
      ["flywheel", "done"],
      ["flywheel-result", "no"],
    ]);
    expect(end.findingStepId).toBe("no-cause");
  });

  it("every start the generator flow asks for itself sits under the carbon-monoxide DANGER", () => {
    // Source: 16 CFR 1407 (references.md section 4) — carbon monoxide: never run a generator indoors.
    const own = Object.values(flow.steps).filter((s) => s.origin.section === null && s.kind === "instruction");
    const starts = own.filter((s) => /try to start|pull the starter/i.test(stepText(s)));
    expect(starts.map((s) => s.id)).toEqual(["shutdown-watch", "level-retry", "sensor-test"]);
    for (const step of starts) {
      expect(step.cautions?.some((c) => c.signal === "DANGER" && /carbon monoxide/i.test(c.text ?? "")), step.id).toBe(true);
    }
  });
});
