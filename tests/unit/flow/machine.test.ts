import { describe, expect, it } from "vitest";
import { createActor, type Snapshot } from "xstate";
import { compileFlow } from "../../../shared/flow/compile.ts";
import { answersByStep, currentStepId, latestAnswer, latestReading, readingsByStep } from "../../../shared/flow/context.ts";
import { createFlowMachine } from "../../../shared/flow/machine.ts";
import { answer, back, record, restart, sampleFlow, sampleSections, seaLevel, twoStroke } from "./fixtures.ts";

const machine = createFlowMachine(compileFlow(sampleFlow, sampleSections));
const start = (input = seaLevel) => createActor(machine, { input }).start();
const at = (actor: ReturnType<typeof start>) => currentStepId(actor.getSnapshot().context);

describe("createFlowMachine", () => {
  it("starts at the flow's start, in the state of its kind, with its kind as a tag", () => {
    const actor = start();
    const snapshot = actor.getSnapshot();
    expect(at(actor)).toBe("start");
    expect(snapshot.value).toBe("instruction");
    expect(snapshot.hasTag("instruction")).toBe(true);
    expect(snapshot.context.path).toEqual(["start"]);
    expect(snapshot.context.profile).toEqual(twoStroke);
  });

  it("accepts only an event that names the current step with a value it takes", () => {
    const snapshot = start().getSnapshot();
    expect(snapshot.can(answer("start"))).toBe(true);
    expect(snapshot.can(answer("start", "yes"))).toBe(false);
    expect(snapshot.can(answer("ask", "gap"))).toBe(false);
    expect(snapshot.can(record("start", 1, "mm"))).toBe(false);
    expect(snapshot.can(back)).toBe(false);
  });

  it("moves along options and records each answer against its step", () => {
    const actor = start();
    actor.send(answer("start"));
    expect(at(actor)).toBe("ask");
    expect(actor.getSnapshot().hasTag("choice")).toBe(true);
    actor.send(answer("ask", "gap"));
    expect(at(actor)).toBe("gap");
    expect(actor.getSnapshot().hasTag("reading")).toBe(true);
    expect(actor.getSnapshot().context.answers).toEqual([
      { stepId: "start", value: "done", seq: 0 },
      { stepId: "ask", value: "gap", seq: 1 },
    ]);
  });

  it("reads a gap entered in inches against bands written in mm", () => {
    const actor = start();
    actor.send(answer("start"));
    actor.send(answer("ask", "gap"));
    actor.send(record("gap", 0.012, "in"));
    expect(at(actor)).toBe("check/clean");
    const reading = latestReading(actor.getSnapshot().context, "gap")!;
    // Source: NIST SP 811 (2008), Appendix B.8, p. 50 — 1 in = 25.4 mm exactly, so 0.012 in = 0.3048 mm.
    expect(reading).toMatchObject({ value: 0.012, unit: "in", stepValue: 0.3048, stepUnit: "mm", canonical: 0.3048, canonicalUnit: "mm", verdict: "good", label: "Within range" });
    expect(reading.reason).toBe('0.012 in (0.3048 mm) is in "Within range" (0.25 to 0.36 mm)');
  });

  it("lands a converted value on an inclusive band edge", () => {
    const actor = start();
    actor.send(answer("start"));
    actor.send(answer("ask", "gap"));
    // Source: NIST SP 811 (2008), Appendix B.8 — 0.36 mm is 0.36 / 25.4 in; converted back it must read 0.36 mm.
    actor.send(record("gap", 0.36 / 25.4, "in"));
    expect(latestReading(actor.getSnapshot().context, "gap")).toMatchObject({ stepValue: 0.36, verdict: "good" });
  });

  it("refuses readings checkReading refuses, and leaves the session where it was", () => {
    const actor = start();
    actor.send(answer("start"));
    actor.send(answer("ask", "gap"));
    const before = actor.getSnapshot();
    for (const bad of [record("gap", Number.NaN, "mm"), record("gap", 0.3, "psi"), record("gap", 0.3, "furlong"), record("gap", -1, "mm")]) {
      expect(before.can(bad)).toBe(false);
      actor.send(bad);
    }
    expect(actor.getSnapshot()).toBe(before);
  });

  it("lets the compression verdict pick the next step, with the shop's altitude", () => {
    const go = (psi: number, altitudeM: number) => {
      const actor = start({ profile: twoStroke, altitudeM });
      actor.send(answer("start"));
      actor.send(answer("ask", "compression"));
      actor.send(record("compression", psi, "psi"));
      return actor;
    };
    // Common practice (no published source): a handheld 2-stroke reads about 90-180 psi; well under 90 it will not start.
    expect(at(go(130, 0))).toBe("check/clean");
    expect(at(go(60, 0))).toBe("rings");
    // From memory (standard atmosphere, references.md §2): gauge readings fall with altitude, so 85 psi read at
    // 1,500 m is about 102 psi at sea level, inside the usual range, while 85 psi at sea level is just under it.
    expect(latestReading(go(85, 0).getSnapshot().context, "compression")?.verdict).toBe("marginal");
    const high = latestReading(go(85, 1500).getSnapshot().context, "compression")!;
    expect(high.verdict).toBe("good");
    expect(high.compression?.ruleId).toBe("two_stroke");
    expect(high.reason).toContain("1500 m");
    // Source: references.md §3 — P2 = P1·r^n at r = 12, n = 1.4 bounds a cranking gauge near 462 psi; 600 psi is implausible, so read again.
    const implausible = go(600, 0);
    expect(at(implausible)).toBe("compression");
    expect(latestReading(implausible.getSnapshot().context, "compression")?.verdict).toBe("implausible");
  });

  it("goes back along the path and keeps the earlier answer as a revision", () => {
    const actor = start();
    actor.send(answer("start"));
    actor.send(answer("ask", "gap"));
    expect(actor.getSnapshot().can(back)).toBe(true);
    actor.send(back);
    expect(at(actor)).toBe("ask");
    expect(actor.getSnapshot().value).toBe("choice");
    actor.send(answer("ask", "compression"));
    const context = actor.getSnapshot().context;
    expect(context.path).toEqual(["start", "ask", "compression"]);
    expect(answersByStep(context).ask!.map((a) => a.value)).toEqual(["gap", "compression"]);
    expect(latestAnswer(context, "ask")?.value).toBe("compression");
    expect(context.seq).toBe(4);
  });

  it("follows a loop back and can step back out of it", () => {
    const actor = start();
    actor.send(answer("start"));
    actor.send(answer("ask", "again"));
    expect(actor.getSnapshot().context.path).toEqual(["start", "ask", "start"]);
    actor.send(back);
    expect(at(actor)).toBe("ask");
  });

  it("restarts at the first step with a fresh path, answers and readings", () => {
    const actor = start();
    actor.send(answer("start"));
    actor.send(answer("ask", "gap"));
    actor.send(record("gap", 0.3, "mm"));
    actor.send(restart);
    const context = actor.getSnapshot().context;
    expect(at(actor)).toBe("start");
    expect(actor.getSnapshot().value).toBe("instruction");
    expect(context).toMatchObject({ path: ["start"], answers: [], readings: [], restarts: 1, seq: 4 });
  });

  it("stops at a finding, takes nothing there but going back, and goes back to the step before it", () => {
    const actor = start();
    actor.send(answer("start"));
    actor.send(answer("ask", "gap"));
    actor.send(record("gap", 0.1, "mm"));
    const snapshot = actor.getSnapshot();
    expect(snapshot.hasTag("finding")).toBe(true);
    expect(currentStepId(snapshot.context)).toBe("close");
    expect(snapshot.can(restart)).toBe(false);
    expect(snapshot.can(answer("close"))).toBe(false);
    expect(snapshot.can(back)).toBe(true);
    actor.send(back);
    expect(actor.getSnapshot().hasTag("reading")).toBe(true);
    expect(currentStepId(actor.getSnapshot().context)).toBe("gap");
    // The reading taken before going back stays in the record.
    expect(readingsByStep(actor.getSnapshot().context).gap).toHaveLength(1);
  });

  it("walks through both nested sections to the flow's own finding", () => {
    const actor = start();
    for (const e of [answer("start"), answer("ask", "gap"), record("gap", 0.3, "mm"), answer("check/clean"), answer("check/deeper/look", "ok")]) actor.send(e);
    expect(actor.getSnapshot().hasTag("finding")).toBe(true);
    expect(currentStepId(actor.getSnapshot().context)).toBe("done");
    expect(readingsByStep(actor.getSnapshot().context).gap).toHaveLength(1);
  });

  it("persists a snapshot that survives JSON and carries on where it stopped", () => {
    const actor = start();
    actor.send(answer("start"));
    actor.send(answer("ask", "gap"));
    actor.send(record("gap", 0.3, "mm"));
    const stored: unknown = JSON.parse(JSON.stringify(actor.getPersistedSnapshot()));
    actor.stop();
    const restored = createActor(machine, { snapshot: stored as Snapshot<unknown>, input: seaLevel }).start();
    expect(restored.getSnapshot().context).toEqual(actor.getSnapshot().context);
    expect(restored.getSnapshot().hasTag("instruction")).toBe(true);
    restored.send(answer("check/clean"));
    expect(at(restored)).toBe("check/deeper/look");
  });
});
