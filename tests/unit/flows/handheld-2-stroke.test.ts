import { describe, expect, it } from "vitest";
import { answersByStep } from "../../../shared/flow/context.ts";
import { replay } from "../../../shared/flow/replay.ts";
import {
  airClear,
  atSeaLevel,
  compiled,
  compression,
  fuelSoundUpToCarb,
  noSparkThroughWiring,
  prime,
  profiles,
  run,
  safetyPass,
  sparkGood,
  toEvents,
  type Move,
} from "./flow-fixtures.ts";

const flow = compiled("handheld-2-stroke-no-start.json");
const input = atSeaLevel(profiles.handheld2);
const safety = safetyPass({ fuelValve: "none", oil: "none" });
const upToPrime = (psi = 130): Move[] => [...safety, ...sparkGood, ...airClear(true), ...compression(psi)];

describe("handheld 2-stroke no-start flow", () => {
  it("applies to the handheld kinds with a 2-stroke engine", () => {
    expect(flow.appliesTo).toEqual({ equipment: ["string_trimmer", "chainsaw", "leaf_blower", "hedge_trimmer"], cycle: 2 });
  });

  it("spark and compression good, fires on the shot and dies, varnish inside: the carburettor finding", () => {
    // Common practice (no published source; a 2010 trade article agrees): spark OK + compression OK + fires on a
    // spray into the intake and dies points to fuel delivery or the carburettor.
    const end = run(flow, input, [...upToPrime(), ...prime("fires-dies"), ...fuelSoundUpToCarb("varnish")]);
    expect(end.status).toBe("finding");
    expect(end.findingStepId).toBe("prime/fuel/carb-varnish");
    expect(end.context.path).toContain("prime/fuel/photos");
  });

  it.each([
    ["a clogged filter", [["prime/fuel/filter-result", "yes"]], "prime/fuel/filter-blocked"],
    ["cracked lines", [["prime/fuel/lines-result", "yes"]], "prime/fuel/lines-cracked"],
    ["a hard primer bulb", [["prime/fuel/bulb", "failed"]], "prime/fuel/primer-bulb"],
    ["pickup and return lines swapped", [["prime/fuel/bulb", "swapped"]], "prime/fuel/lines-swapped"],
    ["a blocked tank vent", [["prime/fuel/vent-result", "yes"]], "prime/fuel/tank-vent"],
  ] as Array<[string, Move[], string]>)("fires and dies with %s: a fuel-delivery finding", (_what, change, finding) => {
    // Common practice (no published source): tank vent, filter, lines and primer are the fuel-delivery causes
    // to check once the engine fires on a shot and dies (trade.md, "No-start diagnosis").
    const fuel = fuelSoundUpToCarb("varnish");
    const [changedStep] = change[0]!;
    const cut = fuel.findIndex(([stepId]) => stepId === changedStep);
    const end = run(flow, input, [...upToPrime(), ...prime("fires-dies"), ...fuel.slice(0, cut), ...change]);
    expect(end.findingStepId).toBe(finding);
  });

  it("no spark that comes back with the stop-switch lead disconnected: the stop-switch finding", () => {
    // Common practice (no published source): a shorted stop switch or chafed wire grounds the ignition, so the
    // spark returns once its lead is off (trade.md, "Spark test").
    const end = run(flow, input, [
      ...safety,
      ["spark/connect", "done"],
      ["spark/pull", "done"],
      ["spark/flash", "none"],
      ["spark/stop-lead", "done"],
      ["spark/stop-lead-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("spark/stop-switch-grounding");
  });

  it("an air gap of 0.50 mm is too wide; reset, the spark returns: the air-gap finding", () => {
    // Common practice (no published source): module air gap about 0.010-0.014 in (0.25-0.36 mm); references.md section 5.
    const end = run(flow, input, [
      ...safety,
      ...noSparkThroughWiring,
      ["spark/air-gap", { value: 0.5, unit: "mm" }],
      ["spark/gap-reset", "done"],
      ["spark/gap-reset-result", "yes"],
    ]);
    expect(end.context.readings.at(-1)?.verdict).toBe("high");
    expect(end.findingStepId).toBe("spark/air-gap-out");
  });

  it("an air gap of 0.012 in is in range, no low-oil sensor, still no spark: the ignition module finding", () => {
    // Common practice (no published source): 0.012 in lies within 0.010-0.014 in; 1 in = 25.4 mm exactly (NIST SP 811, B.8).
    const end = run(flow, input, [
      ...safety,
      ...noSparkThroughWiring,
      ["spark/air-gap", { value: 0.012, unit: "in" }],
      ["spark/oil-sensor", "no"],
    ]);
    expect(end.context.readings.at(-1)?.verdict).toBe("good");
    expect(end.findingStepId).toBe("spark/coil-failed");
  });

  it("a flash on every pull but a sooty plug that a new one cures: the fouled-plug finding", () => {
    // Common practice (no published source): an inline tester can flash with a fouled plug (trade.md, "Spark test").
    const end = run(flow, input, [
      ...safety,
      ["spark/connect", "done"],
      ["spark/pull", "done"],
      ["spark/flash", "every"],
      ["spark/plug-remove", "done"],
      ["spark/plug-look", "fouled"],
      ["spark/plug-swap", "done"],
      ["spark/plug-swap-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("spark/plug-fouled");
  });

  it("70 psi on a 2-stroke takes the low-compression branch; tight bolts: worn rings or cylinder", () => {
    // Common practice (no published source): 2-stroke handhelds typically read about 90-180 psi; below about 90 psi
    // they start hard or not at all (references.md section 5).
    const end = run(flow, input, [...upToPrime(70), ["compression/bolts", "done"], ["compression/bolts-result", "no"]]);
    expect(end.context.readings.at(-1)?.verdict).toBe("low");
    expect(end.context.path).toContain("compression/bolts");
    expect(end.findingStepId).toBe("compression/worn");
  });

  it("70 psi, loose bolts, 120 psi after tightening: the loose-head-bolts finding", () => {
    // Common practice (no published source): vibration loosens head bolts and leaks compression; check them when low.
    const end = run(flow, input, [
      ...upToPrime(70),
      ["compression/bolts", "done"],
      ["compression/bolts-result", "yes"],
      ["compression/bolts-retest", "done"],
      ["compression/reading-after-bolts", { value: 120, unit: "psi" }],
    ]);
    expect(end.findingStepId).toBe("compression/head-bolts");
  });

  it("the same 75 psi reading is low at sea level but good at 2000 m", () => {
    // Source: U.S. Standard Atmosphere 1976, 79 501 Pa at 2000 m (references.md section 2); a gauge reading scales with
    // ambient pressure (section 3), so 75 psi there is about 75 x 101325 / 79501 = 95.6 psi at sea level.
    // Common practice (no published source): 90 psi and up is normal for a 2-stroke handheld.
    const low = run(flow, input, upToPrime(75));
    expect(low.stepId).toBe("compression/bolts");
    const high = run(flow, { ...input, altitudeM: 2000 }, upToPrime(75));
    expect(high.stepId).toBe("prime/intake");
  });

  it("a reading entered in kPa is judged the same as in psi", () => {
    // Source: NIST SP 811 (2008), B.8: 1 psi = 6.894 757 kPa, so 482.6 kPa is about 70 psi.
    const end = run(flow, input, [...safety, ...sparkGood, ...airClear(true), ...compression(482.6, "kPa")]);
    expect(end.stepId).toBe("compression/bolts");
  });

  it("an impossible gauge reading asks for a recheck and then takes the new one", () => {
    // Source: references.md section 3 — isentropic compression at r = 8 from 14.7 psia gives 270.2 psia, so a
    // 900 psi cranking reading is far beyond what a small engine can make.
    const end = run(flow, input, [
      ...upToPrime(900),
      ["compression/recheck", "done"],
      ["compression/crank", "done"],
      ["compression/reading", { value: 140, unit: "psi" }],
    ]);
    expect(end.stepId).toBe("prime/intake");
  });

  it("a carbon-blocked spark arrestor screen is found before compression is tested", () => {
    // Common practice (no published source): a carbon-blocked arrestor screen on a 2-stroke gives a hard or no start.
    const end = run(flow, input, [
      ...safety,
      ...sparkGood,
      ["air/filter", "done"],
      ["air/filter-result", "clean"],
      ["air/arrestor", "done"],
      ["air/arrestor-result", "blocked"],
    ]);
    expect(end.findingStepId).toBe("air/arrestor-blocked");
    expect(end.context.path.some((s) => s.startsWith("compression/"))).toBe(false);
  });

  it("a clear screen but a carboned exhaust port: the exhaust-port finding", () => {
    const end = run(flow, input, [
      ...safety,
      ...sparkGood,
      ...airClear(true).slice(0, -1),
      ["air/port-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("air/port-carbon");
  });

  it("no fire at all on the shot, crankcase leaks down: the crankcase air-leak finding", () => {
    // Common practice (no published source): air leaks are a 2-stroke fuel-delivery cause (trade.md).
    const end = run(flow, input, [...upToPrime(), ...prime("nothing"), ["leak-test", "done"], ["leak-result", "no"]]);
    expect(end.findingStepId).toBe("air-leak");
  });

  it("carburettor clean, crankcase sound, key sheared: the flywheel-key finding", () => {
    const end = run(flow, input, [
      ...upToPrime(),
      ...prime("fires-dies"),
      ...fuelSoundUpToCarb("clean"),
      ["leak-test", "done"],
      ["leak-result", "yes"],
      ["flywheel", "done"],
      ["flywheel-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("flywheel-key");
  });

  it("everything checks good: the deeper-diagnosis finding, never a silent end", () => {
    const end = run(flow, input, [
      ...upToPrime(),
      ...prime("nothing"),
      ["leak-test", "done"],
      ["leak-result", "yes"],
      ["flywheel", "done"],
      ["flywheel-result", "no"],
    ]);
    expect(end.status).toBe("finding");
    expect(end.findingStepId).toBe("no-cause");
  });

  it("starts and runs when the obvious is put right: the no-fault and control findings", () => {
    const started = run(flow, input, [...safety.slice(0, -1), ["prepare/reproduce-result", "yes"]]);
    expect(started.findingStepId).toBe("prepare/no-fault");
    const switchOff = run(flow, input, [
      ...safety.slice(0, 3),
      ["prepare/controls", "no"],
      ["prepare/controls-retry", "done"],
      ["prepare/controls-result", "yes"],
    ]);
    expect(switchOff.findingStepId).toBe("prepare/controls-not-set");
  });

  it("stale fuel that fresh fuel cures: the stale-fuel finding", () => {
    // Common practice (no published source): stale fuel is a leading no-start cause (references.md section 5).
    const end = run(flow, input, [
      ...safety.slice(0, 5),
      ["prepare/fuel-tank", "stale"],
      ["prepare/fuel-replace", "done"],
      ["prepare/fuel-replace-try", "done"],
      ["prepare/fuel-replace-result", "yes"],
    ]);
    expect(end.findingStepId).toBe("prepare/stale-fuel");
  });

  it("a revised answer after going back changes the branch", () => {
    const moves: Move[] = [...safety, ["spark/connect", "done"], ["spark/pull", "done"], ["spark/flash", "none"]];
    expect(run(flow, input, moves).stepId).toBe("spark/stop-lead");
    const events = [...toEvents(moves), { type: "step.back" as const }, ...toEvents([["spark/flash", "every"]])];
    const revised = replay(flow, input, events);
    expect(revised.ok && revised.stepId).toBe("spark/plug-remove");
    expect(revised.ok && answersByStep(revised.context)["spark/flash"]?.map((a) => a.value)).toEqual(["none", "every"]);
  });
});
