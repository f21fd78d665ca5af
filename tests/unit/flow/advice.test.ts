import { describe, expect, it } from "vitest";
import { applyCheckOrder, checkChain, computeAdvice, median, minutesPerCheck, topLevelChecks, type AdviceEvent, type AdviceSession } from "../../../shared/flow/advice.ts";
import { resolveSections } from "../../../shared/flow/compile.ts";
import { orderByRatio } from "../../../shared/calc/sequencing.ts";
import { validateFlow } from "../../../shared/flow/validate.ts";
import type { FlowDefinition } from "../../../shared/flow/schema.ts";
import { loadFlow, loadSections } from "../flows/flow-fixtures.ts";
import { choice, finding, flow, instruction, section, sectionStep } from "./fixtures.ts";

const handheld = resolveSections(loadFlow("handheld-2-stroke-no-start.json"), loadSections());
const TODAY = ["spark", "air", "compression", "prime"];

// Source: references.md §6 worked example — spark (p 0.25, c 5), air (0.10, 2.5), fuel (0.45, 12),
// compression (0.20, 15); the flow's fuel check is its "prime" section.
const worked = { spark: { findings: 5, minutes: 5 }, air: { findings: 2, minutes: 2.5 }, prime: { findings: 9, minutes: 12 }, compression: { findings: 4, minutes: 15 } };
const findingIn: Record<string, string> = { spark: "spark/coil-failed", air: "air/filter-clogged", compression: "compression/worn", prime: "prime/starts-when-primed" };

const t0 = Date.UTC(2026, 0, 5, 8, 0, 0);
const at = (minutes: number) => new Date(t0 + minutes * 60_000).toISOString();

/** A session through the safety section, then the checks in `order` until the one holding its finding, each taking its minutes. */
function sessionEndingIn(check: string, order = TODAY, minutesOf = (c: string) => worked[c as keyof typeof worked].minutes, findingStepId = findingIn[check]!): AdviceSession {
  const events: AdviceEvent[] = [
    { stepId: "prepare/protect", recordedAt: at(0) },
    { stepId: "prepare/controls", recordedAt: at(1) },
  ];
  let now = 1;
  for (const c of order) {
    const m = minutesOf(c);
    events.push({ stepId: `${c}/first`, recordedAt: at(now + m / 2) }, { stepId: `${c}/last`, recordedAt: at(now + m) });
    now += m;
    if (c === check) break;
  }
  return { findingStepId, events };
}

const workedSessions = (): AdviceSession[] => Object.entries(worked).flatMap(([check, w]) => Array.from({ length: w.findings }, () => sessionEndingIn(check)));

describe("computeAdvice", () => {
  it("reproduces the worked example: p from the findings, c from the median minutes, 17.675 minutes in the p/c order", () => {
    const advice = computeAdvice(handheld, workedSessions());
    expect(advice).toMatchObject({ sessionCount: 20, minimumSessions: 20, enough: true });
    expect(advice.checks.map((c) => [c.stepId, c.medianMinutes, c.samples])).toEqual([
      ["prepare", 1, 20],
      ["spark", 5, 20],
      ["air", 2.5, 15],
      ["compression", 15, 13],
      ["prime", 12, 9],
    ]);
    expect(advice.findings.map((f) => [f.stepId, f.count, f.share])).toEqual([
      ["prime/starts-when-primed", 9, 0.45],
      ["spark/coil-failed", 5, 0.25],
      ["compression/worn", 4, 0.2],
      ["air/filter-clogged", 2, 0.1],
    ]);
    // Titles come from the definition's embedded sections when the session gives none.
    expect(advice.findings[1]!.title).toBe("Ignition module failed");
    expect(advice.suggestion).not.toBeNull();
    const s = advice.suggestion!;
    expect(s.current).toEqual(TODAY);
    // Source: references.md §6 — optimal order spark, air, fuel, compression; 5 + 0.75·2.5 + 0.65·12 + 0.20·15 = 17.675
    expect(s.suggested).toEqual(["spark", "air", "prime", "compression"]);
    expect(s.expectedMinutesSuggested).toBeCloseTo(17.675, 9);
    // Worked by hand, today's order: 5 + 0.75·2.5 + 0.65·15 + 0.45·12 = 22.025
    expect(s.expectedMinutesNow).toBeCloseTo(22.025, 9);
    expect(s.explanation).toContain("from 22 min to 17.7 min");
  });

  it("withholds the suggestion below the minimum of sessions, but still counts findings and times", () => {
    const advice = computeAdvice(handheld, workedSessions().slice(1));
    expect(advice).toMatchObject({ sessionCount: 19, enough: false, suggestion: null });
    expect(advice.findings.reduce((n, f) => n + f.count, 0)).toBe(19);
    expect(advice.checks.find((c) => c.stepId === "spark")!.medianMinutes).toBe(5);
    expect(computeAdvice(handheld, workedSessions().slice(1), { minimumSessions: 19 }).suggestion).not.toBeNull();
    expect(computeAdvice(handheld, [])).toMatchObject({ sessionCount: 0, enough: false, findings: [], suggestion: null });
  });

  it("keeps today's order when no other order is quicker, and counts findings outside the checks only in the shares", () => {
    // 10 found at the spark check, 10 at the crankcase leak test after every check.
    const sessions = [...Array.from({ length: 10 }, () => sessionEndingIn("spark")), ...Array.from({ length: 10 }, () => sessionEndingIn("none", TODAY, (c) => worked[c as keyof typeof worked].minutes, "air-leak"))];
    const advice = computeAdvice(handheld, sessions);
    const s = advice.suggestion!;
    // Worked by hand: every finding made in these checks is at the first one: 5 minutes, whatever comes after it
    expect(s.expectedMinutesNow).toBeCloseTo(5, 9);
    expect(s.suggested).toEqual(TODAY);
    expect(s.expectedMinutesSuggested).toBe(s.expectedMinutesNow);
    expect(s.explanation).toContain("already finds the fault soonest");
    expect(advice.findings[0]).toMatchObject({ stepId: "air-leak", title: "Air leak into the crankcase", count: 10, share: 0.5 });
    expect(advice.checks.find((c) => c.stepId === "prime")).toMatchObject({ medianMinutes: 12, samples: 10 });
  });

  it("keeps today's order among checks of equal p/c (orderByRatio breaks such ties by id)", () => {
    // spark p 0.2 / 5 min and air p 0.1 / 2.5 min tie at 0.04 a minute; prime (0.4 / 12) beats compression (0.3 / 15).
    const counts = { spark: 4, air: 2, compression: 6, prime: 8 };
    const sessions = Object.entries(counts).flatMap(([check, n]) => Array.from({ length: n }, () => sessionEndingIn(check)));
    const causes = [
      { id: "spark", probability: 0.2, cost: 5 },
      { id: "air", probability: 0.1, cost: 2.5 },
    ];
    expect(orderByRatio(causes).map((c) => c.id)).toEqual(["air", "spark"]);
    const s = computeAdvice(handheld, sessions).suggestion!;
    expect(s.suggested).toEqual(["spark", "air", "prime", "compression"]);
    // Worked by hand: now 5 + 0.8·2.5 + 0.7·15 + 0.4·12 = 22.3; suggested 5 + 0.8·2.5 + 0.7·12 + 0.3·15 = 19.9
    expect(s.expectedMinutesNow).toBeCloseTo(22.3, 9);
    expect(s.expectedMinutesSuggested).toBeCloseTo(19.9, 9);
  });

  it("gives no suggestion when no finding was made in the checks", () => {
    const sessions = Array.from({ length: 20 }, () => sessionEndingIn("none", TODAY, (c) => worked[c as keyof typeof worked].minutes, "air-leak"));
    const advice = computeAdvice(handheld, sessions);
    expect(advice.checks.find((c) => c.stepId === "compression")).toMatchObject({ medianMinutes: 15, samples: 20 });
    expect(advice.suggestion).toBeNull();
  });

  it("gives no suggestion when a check in the chain was never reached, or there is nothing to reorder", () => {
    const onlySpark = Array.from({ length: 20 }, () => sessionEndingIn("spark"));
    const advice = computeAdvice(handheld, onlySpark);
    expect(advice.checks.find((c) => c.stepId === "air")).toMatchObject({ medianMinutes: null, samples: 0 });
    expect(advice.suggestion).toBeNull();
    const single = flow({ a: instruction("s"), s: sectionStep("sec", "end"), end: finding() });
    expect(computeAdvice(single, onlySpark).suggestion).toBeNull();
  });

  it("prefers the finding title the session's own version gave", () => {
    const sessions = workedSessions().map((s) => ({ ...s, findingTitle: "Old wording" }));
    expect(computeAdvice(handheld, sessions).findings.every((f) => f.title === "Old wording")).toBe(true);
  });
});

describe("minutesPerCheck", () => {
  const checks = new Set(["spark", "air"]);

  it("counts the time before each event for its step's check, and a step-less event for the step before it", () => {
    const minutes = minutesPerCheck(
      [
        { stepId: "prepare/a", recordedAt: at(0) },
        { stepId: "spark/x", recordedAt: at(4) },
        { stepId: null, recordedAt: at(5) }, // step.back inside spark
        { stepId: "spark/x", recordedAt: at(6) },
        { stepId: "air/y", recordedAt: new Date(at(8)) },
        { stepId: "leak-test", recordedAt: at(20) },
      ],
      checks,
    );
    expect(Object.fromEntries(minutes)).toEqual({ spark: 6, air: 2 });
  });

  it("never counts time backwards when a tablet clock jumps, nor a first event", () => {
    const minutes = minutesPerCheck(
      [
        { stepId: "spark/x", recordedAt: at(10) },
        { stepId: "spark/y", recordedAt: at(3) },
        { stepId: "spark/z", recordedAt: at(5) },
        { stepId: "air/q", recordedAt: "not a time" },
      ],
      checks,
    );
    expect(Object.fromEntries(minutes)).toEqual({ spark: 2, air: 0 });
  });
});

describe("median", () => {
  it("takes the middle value, or the mean of the two middle ones", () => {
    expect(median([])).toBeNull();
    expect(median([7, 1, 3])).toBe(3);
    expect(median([4, 1, 3, 10])).toBe(3.5);
  });
});

describe("checkChain and topLevelChecks", () => {
  it("finds the independent checks after the start of each built-in flow", () => {
    expect(checkChain(handheld)).toEqual(TODAY);
    expect(checkChain(loadFlow("handheld-4-stroke-no-start.json"))).toEqual(["spark", "air"]);
    expect(checkChain(loadFlow("walk-behind-mower-no-start.json"))).toEqual([]);
    expect(topLevelChecks(handheld).map((c) => c.stepId)).toEqual(["prepare", ...TODAY]);
  });

  it("copes with unfinished drafts and loops", () => {
    expect(checkChain({})).toEqual([]);
    expect(checkChain({ start: "a", steps: { a: { kind: "choice" } } })).toEqual([]);
    expect(checkChain({ start: "a", steps: { a: { kind: "instruction", next: "b" }, b: { kind: "section", next: "c" }, c: { kind: "section", next: "b" } } })).toEqual(["b", "c"]);
    expect(checkChain(null)).toEqual([]);
  });
});

describe("applyCheckOrder", () => {
  it("rewires the chain into the order and leaves the start's other fields and every other step alone", () => {
    const before = structuredClone(handheld);
    const out = applyCheckOrder(handheld, ["spark", "air", "prime", "compression"]);
    expect(handheld).toEqual(before);
    const next = (d: FlowDefinition, id: string) => (d.steps[id] as { next: string }).next;
    expect(["prepare", "spark", "air", "prime", "compression"].map((id) => next(out, id))).toEqual(["spark", "air", "prime", "compression", "leak-test"]);
    expect(checkChain(out)).toEqual(["spark", "air", "prime", "compression"]);
    for (const id of Object.keys(handheld.steps)) expect({ ...out.steps[id], next: null }).toEqual({ ...handheld.steps[id], next: null });
    expect({ ...out, steps: null }).toEqual({ ...handheld, steps: null });
    expect(validateFlow(out, []).problems.filter((p) => p.severity === "error")).toEqual([]);
  });

  it("moves the start step's next to a new first check", () => {
    const out = applyCheckOrder(handheld, ["prime", "compression", "spark", "air"]);
    expect((out.steps.prepare as { next: string }).next).toBe("prime");
    expect((out.steps.air as { next: string }).next).toBe("leak-test");
  });

  it("works on a loose draft, and refuses an order that is not the chain's checks", () => {
    const sections = [section("s", { go: instruction("@continue") })];
    const draft = flow({ start: instruction("a"), a: sectionStep("s", "b"), b: sectionStep("s", "end"), end: choice({ x: "f", y: "f" }), f: finding() }, "start");
    expect(validateFlow(applyCheckOrder(draft, ["b", "a"]), sections).ok).toBe(true);
    expect(() => applyCheckOrder(draft, ["a"])).toThrow(RangeError);
    expect(() => applyCheckOrder(draft, ["a", "a"])).toThrow(RangeError);
    expect(() => applyCheckOrder(draft, ["a", "end"])).toThrow(/"a", "b"/);
    expect(applyCheckOrder({ steps: {} }, [])).toEqual({ steps: {} });
  });
});

describe("topLevelChecks order", () => {
  it("lists the checks in the order a session meets them, whatever the key order (jsonb sorts keys by length)", () => {
    const shuffled = { ...handheld, steps: Object.fromEntries(Object.entries(handheld.steps).sort(([a], [b]) => a.length - b.length || (a < b ? -1 : 1))) };
    expect(Object.keys(shuffled.steps).slice(0, 3)).toEqual(["air", "prime", "spark"]);
    expect(topLevelChecks(shuffled).map((c) => c.stepId)).toEqual(["prepare", ...TODAY]);
    const orphan = flow({ a: instruction("end"), end: finding(), lost: sectionStep("s", "end") });
    expect(topLevelChecks(orphan).map((c) => c.stepId)).toEqual(["lost"]);
  });
});
