import { describe, expect, it } from "vitest";
import { compileFlow } from "../../../shared/flow/compile.ts";
import type { FlowDefinition } from "../../../shared/flow/schema.ts";
import type { FlowInput } from "../../../shared/flow/step-rules.ts";
import { convertedFor, sessionTimeline, type StepEntry, type TimelineEntry, type TimelineSession } from "../../../shared/review/timeline.ts";
import type { SessionEventBody } from "../../../shared/schemas/sessions.ts";

/** A flow of our own: a guarded choice, an instruction that takes a photo, a plug-gap reading with bands, a compression reading. */
const timelineFlow: FlowDefinition = {
  formatVersion: 1,
  id: "timeline-test",
  title: "Trimmer timeline test",
  appliesTo: { equipment: ["string_trimmer"], cycle: 2 },
  start: "guard",
  steps: {
    guard: {
      kind: "choice",
      title: "Is the spark plug cap off?",
      cautions: [{ signal: "WARNING", text: "Pull the plug cap before you touch the cutting head." }],
      options: [
        { value: "yes", label: "Yes, the cap is off", next: "inspect" },
        { value: "no", label: "No, it is still on", next: "cap-on" },
      ],
    },
    inspect: { kind: "instruction", title: "Look the plug over", photo: { requirement: "optional", prompt: "The plug's firing end" }, next: "gap" },
    gap: {
      kind: "reading",
      title: "Measure the plug gap",
      quantity: "length",
      unit: "in",
      bands: [
        { from: null, to: { value: 0.02, inclusive: false }, label: "Too narrow", verdict: "low", next: "gauge" },
        { from: { value: 0.02, inclusive: true }, to: { value: 0.04, inclusive: true }, label: "In range", verdict: "good", next: "gauge" },
        { from: { value: 0.04, inclusive: false }, to: null, label: "Too wide", verdict: "high", next: "gauge" },
      ],
    },
    gauge: {
      kind: "reading",
      title: "Record the highest gauge reading",
      quantity: "pressure",
      unit: "psi",
      evaluation: { kind: "compression", next: { good: "healthy", marginal: "healthy", low: "worn", implausible: "healthy" } },
    },
    healthy: { kind: "finding", title: "Compression is healthy", certainty: "likely", explanation: "The engine seals well enough to start.", repairs: [] },
    worn: { kind: "finding", title: "Worn rings", certainty: "likely", explanation: "The cylinder leaks.", repairs: [] },
    "cap-on": { kind: "finding", title: "Cap left on", certainty: "confirmed", explanation: "Work stopped for safety.", repairs: [] },
  },
};
const flow = compileFlow(timelineFlow);
const input: FlowInput = { profile: { cycle: 2, compressionRelease: "no", displacementCc: 25, specPsi: null }, altitudeM: 0 };
const startedAt = "2026-04-06T08:00:00.000Z";
const at = (secondsAfterStart: number) => new Date(Date.parse(startedAt) + secondsAfterStart * 1000).toISOString();
const PHOTO = "0190f0f0-0000-7000-8000-0000000000aa";

function session(log: [number, SessionEventBody][], overrides: Partial<TimelineSession> = {}): TimelineSession {
  return { flow, input, events: log.map(([s, event]) => ({ recordedAt: at(s), event })), startedAt, status: "completed", ...overrides };
}
const ids = (entries: TimelineEntry[]) => entries.map((e) => `${e.kind}:${"stepId" in e ? e.stepId : "-"}`);
const steps = (entries: TimelineEntry[]) => entries.filter((e): e is StepEntry => e.kind === "step");

/** The tech reads the gap, goes on to the gauge, comes back and measures the gap again, then finishes. */
const withRevision: [number, SessionEventBody][] = [
  [20, { type: "caution.acknowledge", stepId: "guard", signal: "WARNING" }],
  [45, { type: "step.answer", stepId: "guard", value: "yes" }],
  [60, { type: "photo.attach", stepId: "inspect", attachmentId: PHOTO }],
  [100, { type: "note.add", stepId: "inspect", text: "Plug boot is cracked." }],
  [130, { type: "step.answer", stepId: "inspect", value: "done" }],
  [190, { type: "step.record", stepId: "gap", value: 0.76, unit: "mm" }],
  [250, { type: "step.back" }],
  [280, { type: "step.record", stepId: "gap", value: 0.9, unit: "mm" }],
  [400, { type: "step.record", stepId: "gauge", value: 120, unit: "psi" }],
];

describe("sessionTimeline", () => {
  it("lists every step reached, in order, ending with the finding", () => {
    const entries = sessionTimeline(session(withRevision), "imperial");
    expect(ids(entries)).toEqual(["step:guard", "step:inspect", "step:gap", "step:gauge", "step:gap", "step:gauge", "finding:healthy"]);
    expect(entries.map((e) => e.key)).toEqual([...new Set(entries.map((e) => e.key))]);
    expect(entries.at(-1)).toMatchObject({ kind: "finding", title: "Compression is healthy", certainty: "likely", reachedAt: at(400) });
  });

  it("gives each answer's label, when the step was reached, and the time since the event before the answer", () => {
    const [guard, inspect, gap, gaugeLeft, gapAgain, gauge] = steps(sessionTimeline(session(withRevision), "imperial"));
    // Hand-worked: 45 s − 20 s (the acknowledgement), 130 s − 100 s (the note), 190 − 130, 280 − 250 (the back), 400 − 280.
    expect(guard).toMatchObject({ reachedAt: startedAt, answer: { kind: "choice", value: "yes", label: "Yes, the cap is off" }, answeredAt: at(45), seconds: 25 });
    expect(inspect).toMatchObject({ reachedAt: at(45), answer: { kind: "done" }, seconds: 30, left: { by: "answer", at: at(130) } });
    expect(gap).toMatchObject({ reachedAt: at(130), seconds: 60 });
    expect(gaugeLeft).toMatchObject({ reachedAt: at(190), answer: null, seconds: null, left: { by: "back", at: at(250) } });
    expect(gapAgain).toMatchObject({ reachedAt: at(250), seconds: 30 });
    expect(gauge).toMatchObject({ reachedAt: at(280), seconds: 120, left: { by: "answer", at: at(400) } });
  });

  it("keeps the photos, notes and acknowledged cautions on the step they were taken at", () => {
    const [guard, inspect, gap] = steps(sessionTimeline(session(withRevision), "imperial"));
    expect(guard!.cautions).toEqual([{ at: at(20), signal: "WARNING" }]);
    expect(inspect!.photos).toEqual([{ at: at(60), attachmentId: PHOTO }]);
    expect(inspect!.notes).toEqual([{ at: at(100), text: "Plug boot is cracked." }]);
    expect([gap!.photos, gap!.notes, gap!.cautions]).toEqual([[], [], []]);
  });

  it("marks an answer taken back by going back, and shows it as what the new answer changed", () => {
    const [guard, , gap, , gapAgain, gauge] = steps(sessionTimeline(session(withRevision), "imperial"));
    expect(gap!.undone).toBe(true);
    expect([guard!.undone, gapAgain!.undone, gauge!.undone]).toEqual([false, false, false]);
    expect(gapAgain!.changedFrom).toMatchObject({ kind: "reading", entered: { value: 0.76, unit: "mm" } });
    expect(gapAgain!.answer).toMatchObject({ kind: "reading", entered: { value: 0.9, unit: "mm" } });
    expect(gap!.changedFrom).toBeNull();
  });

  it("shows a finding the tech went back from, with the reading taken again and the new finding", () => {
    // A returned session revised: back from the finding, compression taken again lower.
    const log: [number, SessionEventBody][] = [...withRevision, [500, { type: "step.back" }], [560, { type: "step.record", stepId: "gauge", value: 60, unit: "psi" }]];
    const entries = sessionTimeline(session(log), "imperial");
    expect(ids(entries)).toEqual(["step:guard", "step:inspect", "step:gap", "step:gauge", "step:gap", "step:gauge", "finding:healthy", "step:gauge", "finding:worn"]);
    expect(entries[6]).toMatchObject({ kind: "finding", takenBackAt: at(500) });
    expect(entries[8]).toMatchObject({ kind: "finding", takenBackAt: null, reachedAt: at(560) });
    const gauges = steps(entries).filter((e) => e.stepId === "gauge");
    expect(gauges[1]).toMatchObject({ undone: true, answer: { kind: "reading", entered: { value: 120, unit: "psi" } } });
    // 560 s − 500 s (the back from the finding).
    expect(gauges[2]).toMatchObject({ undone: false, seconds: 60, changedFrom: { kind: "reading", entered: { value: 120, unit: "psi" } } });
  });

  it("shows no change when the tech goes back and gives the same answer again", () => {
    const log = withRevision.map(([s, e]): [number, SessionEventBody] => (s === 280 ? [s, { type: "step.record", stepId: "gap", value: 0.76, unit: "mm" }] : [s, e]));
    const [, , gap, , gapAgain] = steps(sessionTimeline(session(log), "imperial"));
    expect(gap!.undone).toBe(true);
    expect(gapAgain!.changedFrom).toBeNull();
  });

  it("gives readings as entered and in the viewer's units, with the verdict and its reason", () => {
    const imperial = steps(sessionTimeline(session(withRevision), "imperial"));
    const metric = steps(sessionTimeline(session(withRevision), "metric"));
    // Source: NIST SP 811 (2008), Appendix B.8, p. 50 — 1 in = 25.4 mm exactly; 0.76 / 25.4 = 0.029921 in, 0.9 / 25.4 = 0.035433 in.
    expect(imperial[2]!.answer).toEqual({
      kind: "reading",
      entered: { value: 0.76, unit: "mm", unitLabel: "mm" },
      converted: { value: 0.02992, unit: "in", unitLabel: "in" },
      verdict: "good",
      band: "In range",
      reason: expect.stringContaining('is in "In range"'),
    });
    expect(imperial[4]!.answer).toMatchObject({ converted: { value: 0.03543, unit: "in" }, verdict: "good" });
    expect(metric[2]!.answer).toMatchObject({ entered: { value: 0.76, unit: "mm" }, converted: null });
    // Source: NIST SP 811 (2008), Appendix B.8, p. 53 — 1 psi = 6.894 757 kPa; 120 × 6.894 757 = 827.37 kPa.
    expect(metric[5]!.answer).toMatchObject({ entered: { value: 120, unit: "psi", unitLabel: "psi" }, converted: { value: 827.4, unit: "kPa", unitLabel: "kPa" }, verdict: "good", band: null });
    expect(imperial[5]!.answer).toMatchObject({ converted: null });
    // Common practice (no published source): a handheld 2-stroke cranks about 90–180 psi, so 120 psi is good.
    expect((metric[5]!.answer as { reason: string }).reason).toContain("within the usual range");
  });

  it("converts each kind of reading the bench takes to the other system", () => {
    // Source: NIST SP 811 (2008), Appendix B.8, p. 53 — 100 psi × 6.894 757 = 689.4757 kPa.
    expect(convertedFor(100, "psi", "metric")).toEqual({ value: 689.5, unit: "kPa", unitLabel: "kPa" });
    // Source: NIST SP 811 (2008), Appendix B.8, p. 45 — 1 bar = 100 kPa exactly; 6.9 bar = 690 kPa = 690 / 6.894 757 psi = 100.08 psi.
    expect(convertedFor(6.9, "bar", "imperial")).toEqual({ value: 100.1, unit: "psi", unitLabel: "psi" });
    expect(convertedFor(6.9, "bar", "metric")).toBeNull();
    // Source: NIST SP 811 (2008), Appendix B.8, p. 48 — °F = °C × 1.8 + 32; 90 °C = 194 °F.
    expect(convertedFor(90, "degC", "imperial")).toEqual({ value: 194, unit: "degF", unitLabel: "°F" });
    // Common practice (no published source): ohms, volts and rpm are the same in both systems, so nothing is converted.
    expect(convertedFor(5.2, "kohm", "imperial")).toBeNull();
  });

  it("takes every answer back on a restart and shows the new first answer as a change", () => {
    const log: [number, SessionEventBody][] = [
      [20, { type: "caution.acknowledge", stepId: "guard", signal: "WARNING" }],
      [45, { type: "step.answer", stepId: "guard", value: "yes" }],
      [70, { type: "session.restart" }],
      [95, { type: "step.answer", stepId: "guard", value: "no" }],
    ];
    const entries = sessionTimeline(session(log), "metric");
    expect(ids(entries)).toEqual(["step:guard", "step:inspect", "step:guard", "finding:cap-on"]);
    const [guard, inspect, guardAgain] = steps(entries);
    expect(guard!.undone).toBe(true);
    expect(inspect!.left).toEqual({ by: "restart", at: at(70) });
    expect(guardAgain).toMatchObject({ reachedAt: at(70), seconds: 25, answer: { label: "No, it is still on" }, changedFrom: { kind: "choice", value: "yes", label: "Yes, the cap is off" } });
    expect(entries.at(-1)).toMatchObject({ kind: "finding", title: "Cap left on", certainty: "confirmed" });
  });

  it("ends an abandoned session at the step it stood at, with the reason", () => {
    const log = withRevision.slice(0, 3);
    const entries = sessionTimeline(session(log, { status: "abandoned", abandonReason: "Customer collected the trimmer." }), "metric");
    expect(entries.map((e) => e.kind)).toEqual(["step", "step", "abandoned"]);
    expect(entries[1]).toMatchObject({ stepId: "inspect", answer: null, left: null, photos: [{ attachmentId: PHOTO }] });
    expect(entries[2]).toMatchObject({ kind: "abandoned", stepId: "inspect", reason: "Customer collected the trimmer." });
  });

  it("leaves an open session standing at its current step", () => {
    const entries = sessionTimeline(session(withRevision.slice(0, 2), { status: "open" }), "metric");
    expect(entries.map((e) => e.kind)).toEqual(["step", "step"]);
    expect(entries[1]).toMatchObject({ stepId: "inspect", answer: null, left: null });
  });

  it("shows a log the flow engine refuses up to the refused event, and says why", () => {
    const log: [number, SessionEventBody][] = [
      [20, { type: "caution.acknowledge", stepId: "guard", signal: "WARNING" }],
      [45, { type: "step.answer", stepId: "guard", value: "yes" }],
      [60, { type: "step.answer", stepId: "gauge", value: "done" }],
      [90, { type: "step.answer", stepId: "inspect", value: "done" }],
    ];
    const entries = sessionTimeline(session(log), "metric");
    expect(entries.map((e) => e.kind)).toEqual(["step", "step", "unreadable"]);
    expect(entries[1]).toMatchObject({ stepId: "inspect", answer: null });
    expect(entries[2]).toMatchObject({ kind: "unreadable", index: 2, reason: expect.stringContaining('stands at "inspect"') });
  });
});
