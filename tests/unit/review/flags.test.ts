import { describe, expect, it } from "vitest";
import { compileFlow } from "../../../shared/flow/compile.ts";
import type { FlowDefinition } from "../../../shared/flow/schema.ts";
import type { FlowInput } from "../../../shared/flow/step-rules.ts";
import { sessionFlags, type FlaggedSession } from "../../../shared/review/flags.ts";
import type { SessionEventBody } from "../../../shared/schemas/sessions.ts";

/** A small flow of our own: a timed, guarded instruction with a required photo, a compression reading, then findings. */
const reviewTestFlow: FlowDefinition = {
  formatVersion: 1,
  id: "review-test",
  title: "Trimmer review test",
  appliesTo: { equipment: ["string_trimmer"], cycle: 2 },
  start: "drain",
  steps: {
    drain: {
      kind: "instruction",
      title: "Drain the tank into a fuel can",
      minSeconds: 60,
      cautions: [
        { signal: "DANGER", text: "Fuel vapour: no sparks or flames nearby." },
        { signal: "NOTICE", text: "Keep the old fuel for the customer to see." },
      ],
      photo: { requirement: "required", prompt: "The drained fuel in a clear jar" },
      next: "gauge",
    },
    gauge: {
      kind: "reading",
      title: "Record the highest gauge reading",
      quantity: "pressure",
      unit: "psi",
      evaluation: { kind: "compression", next: { good: "healthy", marginal: "healthy", low: "worn", implausible: "healthy" } },
    },
    healthy: { kind: "finding", title: "Compression is healthy", certainty: "likely", explanation: "The engine seals well enough to start.", repairs: [] },
    worn: { kind: "finding", title: "Worn rings", certainty: "likely", explanation: "The cylinder leaks.", repairs: [{ title: "Replace the rings", labourHours: 2, parts: ["Ring set"] }] },
  },
};
const flow = compileFlow(reviewTestFlow);
const input: FlowInput = { profile: { cycle: 2, compressionRelease: "no", displacementCc: 25, specPsi: null }, altitudeM: 0 };
const start = new Date("2026-04-06T08:00:00.000Z");
const at = (secondsAfterStart: number) => new Date(start.getTime() + secondsAfterStart * 1000).toISOString();
const PHOTO = "0190f0f0-0000-7000-8000-0000000000aa";

/** [seconds after the start, event] pairs as a stored log. */
function session(log: [number, SessionEventBody][], overrides: Partial<FlaggedSession> = {}): FlaggedSession {
  return { flow, input, events: log.map(([s, event]) => ({ recordedAt: at(s), event })), status: "completed", startedAt: start, completedAt: new Date(at(600)), now: new Date(at(600)), ...overrides };
}
const careful: [number, SessionEventBody][] = [
  [10, { type: "caution.acknowledge", stepId: "drain", signal: "DANGER" }],
  [50, { type: "photo.attach", stepId: "drain", attachmentId: PHOTO }],
  [130, { type: "step.answer", stepId: "drain", value: "done" }],
  [300, { type: "step.record", stepId: "gauge", value: 110, unit: "psi" }],
];
const codes = (s: FlaggedSession) => sessionFlags(s).map((f) => `${f.code}:${f.stepId ?? "-"}`);

describe("sessionFlags", () => {
  it("raises nothing for a careful session", () => {
    expect(sessionFlags(session(careful))).toEqual([]);
  });

  it("flags a compression reading no small engine can make, with the evaluation's reason", () => {
    const log = careful.slice(0, 3).concat([[300, { type: "step.record", stepId: "gauge", value: 600, unit: "psi" }]]);
    const flags = sessionFlags(session(log));
    expect(flags).toHaveLength(1);
    expect(flags[0]).toMatchObject({ code: "reading_implausible", stepId: "gauge" });
    expect(flags[0]!.reason).toContain("600 psi");
    expect(flags[0]!.reason).toContain("more than a small engine can make");
  });

  it("flags a gauge reading below zero, but not a low one", () => {
    const negative = careful.slice(0, 3).concat([[300, { type: "step.record", stepId: "gauge", value: -5, unit: "psi" }]]);
    const low = careful.slice(0, 3).concat([[300, { type: "step.record", stepId: "gauge", value: 20, unit: "psi" }]]);
    expect(codes(session(negative))).toEqual(["reading_implausible:gauge"]);
    expect(codes(session(low))).toEqual([]);
  });

  it("flags an instruction answered sooner than its minimum after the previous event", () => {
    // The previous event (the photo) is 80 s before the answer in the careful log; at 110 s it is 20 s before.
    const quick = careful.map(([s, e]): [number, SessionEventBody] => [e.type === "photo.attach" ? 110 : s, e]);
    expect(sessionFlags(session(quick))).toEqual([{ code: "step_too_fast", stepId: "drain", reason: `"Drain the tank into a fuel can" was done in 20 seconds; it takes at least 60 seconds.` }]);
    const justEnough = careful.map(([s, e]): [number, SessionEventBody] => [e.type === "photo.attach" ? 70 : s, e]);
    expect(sessionFlags(session(justEnough))).toEqual([]);
  });

  it("times the first step from the session's start when no event came before it", () => {
    const log: [number, SessionEventBody][] = [
      [0, { type: "caution.acknowledge", stepId: "drain", signal: "DANGER" }],
      [0, { type: "photo.attach", stepId: "drain", attachmentId: PHOTO }],
      [59, { type: "step.answer", stepId: "drain", value: "done" }],
    ];
    expect(codes(session(log))).toEqual(["step_too_fast:drain"]);
    expect(codes(session([[60, log[0]![1]], [60, log[1]![1]], [120, log[2]![1]]]))).toEqual([]);
  });

  it("flags an answered step whose required photo was never attached", () => {
    const log = careful.filter(([, e]) => e.type !== "photo.attach");
    const flags = sessionFlags(session(log));
    expect(flags.map((f) => f.code)).toEqual(["photo_missing"]);
    expect(flags[0]!.reason).toContain("The drained fuel in a clear jar");
  });

  it("flags a DANGER caution left unacknowledged, and never a NOTICE", () => {
    const log = careful.filter(([, e]) => e.type !== "caution.acknowledge");
    const flags = sessionFlags(session(log));
    expect(flags.map((f) => f.code)).toEqual(["caution_not_acknowledged"]);
    expect(flags[0]!.reason).toContain("DANGER");
    expect(flags[0]!.reason).not.toContain("NOTICE");
  });

  it("says nothing about photos or cautions on a step that was never answered", () => {
    expect(sessionFlags(session([], { status: "open", completedAt: null }))).toEqual([]);
  });

  it("flags a session open longer than the limit, and takes the limit it is given", () => {
    const open = session(careful.slice(0, 2), { status: "open", completedAt: null, now: new Date(start.getTime() + 25 * 3_600_000) });
    expect(sessionFlags(open)).toEqual([{ code: "open_too_long", stepId: null, reason: "The session has been open for 25 hours, more than the 24 hours a session should take." }]);
    expect(sessionFlags(open, { openHours: 48 })).toEqual([]);
    const slowCompleted = session(careful, { completedAt: new Date(start.getTime() + 30 * 3_600_000) });
    expect(codes(slowCompleted)).toEqual(["open_too_long:-"]);
    expect(codes(session(careful, { status: "abandoned", completedAt: null, now: new Date(start.getTime() + 99 * 3_600_000) }))).toEqual([]);
  });

  it("raises one flag per code and step, in the order of the log", () => {
    const log: [number, SessionEventBody][] = [
      [5, { type: "step.answer", stepId: "drain", value: "done" }],
      [20, { type: "step.record", stepId: "gauge", value: 600, unit: "psi" }],
      [25, { type: "step.back" }],
      [30, { type: "step.record", stepId: "gauge", value: 700, unit: "psi" }],
    ];
    expect(codes(session(log))).toEqual(["step_too_fast:drain", "photo_missing:drain", "caution_not_acknowledged:drain", "reading_implausible:gauge"]);
  });
});
