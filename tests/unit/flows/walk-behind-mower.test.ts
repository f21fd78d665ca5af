import { describe, expect, it } from "vitest";
import {
  airClear,
  atSeaLevel,
  compiled,
  compression,
  fuelSoundUpToCarb,
  prime,
  profiles,
  run,
  safetyPass,
  sparkGood,
  stepText,
  type Move,
} from "./flow-fixtures.ts";

const flow = compiled("walk-behind-mower-no-start.json");
const input = atSeaLevel(profiles.mower);
const safety = safetyPass({ fuelValve: "open", oil: "ok" });
const bailGood: Move[] = [["bail", "done"], ["bail-result", "yes"]];
const blowerHousingOff: Move[] = [["blade-lead", "done"], ["blade-look", "done"], ["strike-flywheel", "done"]];

describe("walk-behind mower no-start flow", () => {
  it("applies to walk-behind mowers with a 4-stroke engine", () => {
    expect(flow.appliesTo).toEqual({ equipment: ["walk_behind_mower"], cycle: 4 });
  });

  it("a blade strike with rope kickback and a sheared key: the flywheel-key finding, before any spark test", () => {
    // Common practice (no published source): a sheared flywheel key after a blade strike gives rope kickback and no
    // start (trade.md, "Timing").
    const end = run(flow, input, [...safety, ...bailGood, ["strike", "yes"], ...blowerHousingOff, ["strike-flywheel-result", "yes"]]);
    expect(end.findingStepId).toBe("flywheel-key");
    expect(end.context.path.some((s) => s.startsWith("spark/"))).toBe(false);
    const finding = flow.steps["flywheel-key"];
    expect(finding?.kind === "finding" && finding.repairs.map((r) => r.title).join(" ")).toMatch(/blade/i);
  });

  it("a blade strike with the key sound goes on to the spark check", () => {
    const end = run(flow, input, [...safety, ...bailGood, ["strike", "yes"], ...blowerHousingOff, ["strike-flywheel-result", "no"]]);
    expect(end.stepId).toBe("spark/connect");
  });

  it("the plug lead comes off, under a DANGER panel, before anyone touches the blade", () => {
    // Source: references.md section 4 — disconnect the spark plug lead before working on a blade or cutting head;
    // ANSI Z535.4 DANGER for a hazard that will cause death or serious injury.
    for (const id of ["blade-lead", "blade-look", "strike-flywheel", "flywheel", "valves"]) {
      const step = flow.steps[id]!;
      const danger = (step.cautions ?? []).filter((c) => c.signal === "DANGER");
      expect(danger.map((c) => c.text).join(" "), id).toMatch(/spark plug lead/i);
      expect(danger.map((c) => c.text).join(" "), id).toMatch(/blade/i);
    }
    expect(stepText(flow.steps["blade-lead"]!)).toMatch(/before anyone touches the blade/i);
  });

  it("a bail that leaves the brake on: the bail-cable finding", () => {
    // Common practice (no published source): the blade-brake bail is an interlock to check before any test (trade.md).
    const end = run(flow, input, [...safety, ["bail", "done"], ["bail-result", "no"]]);
    expect(end.findingStepId).toBe("bail-cable");
  });

  it("no strike, spark and compression good, fires and dies, vent blocked: the tank-vent finding", () => {
    const fuel = fuelSoundUpToCarb("clean");
    const upToVent = fuel.slice(0, fuel.findIndex(([s]) => s === "prime/fuel/vent-result"));
    const end = run(flow, input, [
      ...safety,
      ...bailGood,
      ["strike", "no"],
      ...sparkGood,
      ...airClear(false),
      ["release", "done"],
      ...compression(65),
      ...prime("fires-dies"),
      ...upToVent,
      ["prime/fuel/vent-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("prime/fuel/tank-vent");
  });

  it("no strike reported, but the key is found sheared at the end of the checks", () => {
    const end = run(flow, input, [
      ...safety,
      ...bailGood,
      ["strike", "no"],
      ...sparkGood,
      ...airClear(false),
      ["release", "done"],
      ...compression(65),
      ...prime("nothing"),
      ["flywheel", "done"],
      ["flywheel-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("flywheel-key");
  });

  it("low oil that tops up and then starts: the low-oil shutdown finding", () => {
    const end = run(flow, input, [
      ...safety.slice(0, 6),
      ["prepare/oil-level", "low"],
      ["prepare/oil-top-up", "done"],
      ["prepare/oil-top-up-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("prepare/low-oil-shutdown");
  });

  it("80 psi on the mower's release engine is marginal and the checks go on", () => {
    // Common practice (no published source): about 80 psi on an engine with a compression release is marginal, not low.
    const end = run(flow, input, [...safety, ...bailGood, ["strike", "no"], ...sparkGood, ...airClear(false), ["release", "done"], ...compression(80)]);
    expect(end.stepId).toBe("compression/marginal");
  });
});
