import { describe, expect, it } from "vitest";
import { replaySession } from "../../../shared/flow/session-log.ts";
import type { SessionEventBody } from "../../../shared/schemas/sessions.ts";
import { gatedEvents, type Move } from "../../factories/session-events.ts";
import { airClear, atSeaLevel, compiled, fuelSoundUpToCarb, prime, profiles, safetyPass, sparkGood } from "../flows/flow-fixtures.ts";

const flow = compiled("handheld-2-stroke-no-start.json");
const input = atSeaLevel(profiles.handheld2);
const photoId = "0190f0c0-0000-7000-8000-000000000001";

const withGates = (moves: readonly Move[]) => gatedEvents(flow, moves, () => photoId);
const safety = safetyPass({ fuelValve: "none", oil: "none" });
const toCompression: Move[] = [...safety, ...sparkGood, ...airClear(true), ["compression/prep", "done"], ["compression/crank", "done"]];
const toFinding: Move[] = [...toCompression, ["compression/reading", { value: 130, unit: "psi" }], ...prime("fires-dies"), ...fuelSoundUpToCarb("varnish")];

describe("replaySession", () => {
  it("runs answers with their acknowledgements and photos, and collects notes, photos and acknowledgements by step", () => {
    const events = withGates(safety);
    events.splice(1, 0, { type: "note.add", stepId: "prepare/protect", text: "Bench cleared of the grinder" });
    const result = replaySession(flow, input, events);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.status).toBe("in_progress");
    expect(result.stepId).toBe("spark/connect");
    expect(result.notes["prepare/protect"]).toEqual([{ text: "Bench cleared of the grinder", index: 1 }]);
    expect(result.photos["prepare/as-received"]).toEqual([expect.objectContaining({ attachmentId: photoId })]);
    expect(result.acknowledgements["prepare/protect"]).toEqual(["WARNING"]);
  });

  it("refuses answering a step with a WARNING caution before it is acknowledged", () => {
    const result = replaySession(flow, input, [{ type: "step.answer", stepId: "prepare/protect", value: "done" }]);
    expect(result).toMatchObject({ ok: false, index: 0, code: "caution_not_acknowledged", stepId: "prepare/protect" });
    if (!result.ok) expect(result.reason).toMatch(/WARNING caution; acknowledge it/);
  });

  it("refuses leaving a step whose photo is required without a photo for it", () => {
    const events = withGates([["prepare/protect", "done"]]);
    events.push({ type: "step.answer", stepId: "prepare/as-received", value: "done" });
    const result = replaySession(flow, input, events);
    expect(result).toMatchObject({ ok: false, index: events.length - 1, code: "photo_required", stepId: "prepare/as-received" });
  });

  it("refuses an annotation for a step the session is not on, and an acknowledgement of a caution the step lacks", () => {
    const wrongStep = replaySession(flow, input, [{ type: "note.add", stepId: "spark/connect", text: "too early" }]);
    expect(wrongStep).toMatchObject({ ok: false, code: "annotation_wrong_step", stepId: "prepare/protect" });
    if (!wrongStep.ok) expect(wrongStep.reason).toBe('the note is for step "spark/connect", but the session stands at "prepare/protect"');
    const noSuchCaution = replaySession(flow, input, [{ type: "caution.acknowledge", stepId: "prepare/protect", signal: "DANGER" }]);
    expect(noSuchCaution).toMatchObject({ ok: false, code: "unknown_caution" });
  });

  it("names the machine's own refusal: a forged step, a reading in an unknown unit or not a number", () => {
    const forged = replaySession(flow, input, [{ type: "step.answer", stepId: "spark/flash", value: "every" }]);
    expect(forged).toMatchObject({ ok: false, index: 0, code: "wrong_step", stepId: "prepare/protect" });
    const events: SessionEventBody[] = [...withGates(toCompression), { type: "photo.attach", stepId: "compression/reading", attachmentId: photoId }];
    const unknownUnit = replaySession(flow, input, [...events, { type: "step.record", stepId: "compression/reading", value: 90, unit: "furlongs" }]);
    expect(unknownUnit).toMatchObject({ ok: false, index: events.length, code: "unknown_unit", stepId: "compression/reading" });
    const nan = replaySession(flow, input, [...events, { type: "step.record", stepId: "compression/reading", value: Number.NaN, unit: "psi" }]);
    expect(nan).toMatchObject({ ok: false, index: events.length, code: "invalid_event" });
  });

  it("ends at a finding, takes a note on it, and refuses any step event after it but going back", () => {
    const events = withGates(toFinding);
    const done = replaySession(flow, input, [...events, { type: "note.add", stepId: "prime/fuel/carb-varnish", text: "Varnish in the bowl" }]);
    expect(done).toMatchObject({ ok: true, status: "finding", findingStepId: "prime/fuel/carb-varnish" });
    const after = replaySession(flow, input, [...events, { type: "step.answer", stepId: "prime/fuel/carb-varnish", value: "done" }]);
    expect(after).toMatchObject({ ok: false, code: "session_finished", index: events.length });
    const back = replaySession(flow, input, [...events, { type: "step.back" }]);
    expect(back).toMatchObject({ ok: true, status: "in_progress", findingStepId: null });
  });

  it("goes back to the start on a restart, keeping the acknowledgements already given", () => {
    const restarted = replaySession(flow, input, [...withGates(safety), { type: "session.restart" }, { type: "step.answer", stepId: "prepare/protect", value: "done" }]);
    expect(restarted).toMatchObject({ ok: true, stepId: "prepare/as-received" });
  });

  it("refuses events that are not session events, and unusable engine facts", () => {
    expect(replaySession(flow, input, [{ type: "step.jump" } as never])).toMatchObject({ ok: false, code: "invalid_event" });
    expect(replaySession(flow, { ...input, altitudeM: Number.NaN }, [])).toMatchObject({ ok: false, index: -1, code: "invalid_input" });
  });
});
