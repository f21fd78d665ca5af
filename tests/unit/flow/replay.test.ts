import { describe, expect, it } from "vitest";
import { createActor, type Snapshot } from "xstate";
import { compileFlow } from "../../../shared/flow/compile.ts";
import { machineFor, replay } from "../../../shared/flow/replay.ts";
import { answer, back, record, restart, sampleFlow, sampleSections, seaLevel, twoStroke } from "./fixtures.ts";

const compiled = compileFlow(sampleFlow, sampleSections);
const toGap = [answer("start"), answer("ask", "gap")];
const refused = (events: unknown[], input = seaLevel) => {
  const result = replay(compiled, input, events);
  if (result.ok) throw new Error("expected a refusal");
  return result;
};

describe("replay, accepted", () => {
  it("answers where the session stands, with its context and a snapshot to cache", () => {
    const result = replay(compiled, seaLevel, [...toGap, record("gap", 0.3, "mm")]);
    expect(result).toMatchObject({ ok: true, stepId: "check/clean", status: "in_progress", findingStepId: null });
    if (!result.ok) return;
    expect(result.context.readings).toHaveLength(1);
    const restored = createActor(machineFor(compiled), { snapshot: JSON.parse(JSON.stringify(result.snapshot)) as Snapshot<unknown>, input: seaLevel }).start();
    expect(restored.getSnapshot().context).toEqual(result.context);
  });

  it("reports a finding once the session reaches one", () => {
    expect(replay(compiled, seaLevel, [...toGap, record("gap", 0.5, "mm")])).toMatchObject({ ok: true, status: "finding", findingStepId: "wide", stepId: "wide" });
  });

  it("takes events as the server stores them, with id and seq beside the payload", () => {
    const stored = toGap.map((e, seq) => ({ id: `event-${seq}`, seq, ...e }));
    expect(replay(compiled, seaLevel, stored)).toMatchObject({ ok: true, stepId: "gap" });
  });

  it("replays back-steps and restarts", () => {
    const result = replay(compiled, seaLevel, [...toGap, back, answer("ask", "compression"), restart, answer("start")]);
    expect(result).toMatchObject({ ok: true, stepId: "ask" });
    expect(result.ok && result.context.restarts).toBe(1);
  });

  it("starts at the first step with no events", () => {
    expect(replay(compiled, seaLevel, [])).toMatchObject({ ok: true, stepId: "start", status: "in_progress" });
  });
});

describe("replay, refused", () => {
  it("refuses a forged path: an answer for a step the session has not reached", () => {
    const r = refused([answer("start"), answer("ask", "gap"), answer("check/clean")]);
    expect(r).toMatchObject({ index: 2, code: "wrong_step", stepId: "gap" });
    expect(r.reason).toBe('the event answers step "check/clean", but the session stands at "gap"');
  });

  it("says so when the step named is not in the flow at all", () => {
    expect(refused([answer("nowhere")]).reason).toContain("not a step of this flow");
  });

  it("refuses an option the step does not offer, naming the ones it does", () => {
    const r = refused([answer("start"), answer("ask", "maybe")]);
    expect(r).toMatchObject({ index: 1, code: "unknown_option", stepId: "ask" });
    expect(r.reason).toContain('"gap", "compression", "again"');
    expect(refused([answer("start", "yes")]).code).toBe("unknown_option");
  });

  it("refuses a reading in a unit of another quantity, or an unknown unit", () => {
    expect(refused([...toGap, record("gap", 0.3, "psi")])).toMatchObject({ index: 2, code: "wrong_quantity" });
    expect(refused([...toGap, record("gap", 0.3, "furlong")])).toMatchObject({ index: 2, code: "unknown_unit" });
  });

  it("refuses NaN as a malformed event before the machine sees it", () => {
    const r = refused([...toGap, record("gap", Number.NaN, "mm")]);
    expect(r).toMatchObject({ index: 2, code: "invalid_event", stepId: "gap" });
    expect(r.reason).toContain("value");
  });

  it("refuses a reading beyond the bench's sanity limits with checkReading's reason", () => {
    const r = refused([...toGap, record("gap", -0.2, "mm")]);
    expect(r).toMatchObject({ code: "out_of_range" });
    expect(r.reason).toContain("cannot be negative");
  });

  it("refuses the wrong kind of event for the step", () => {
    expect(refused([record("start", 1, "mm")])).toMatchObject({ code: "wrong_event_for_step" });
    expect(refused([...toGap, answer("gap", "done")])).toMatchObject({ code: "wrong_event_for_step" });
  });

  it("refuses anything after a finding but going back", () => {
    const r = refused([...toGap, record("gap", 0.1, "mm"), answer("close")]);
    expect(r).toMatchObject({ index: 3, code: "session_finished", stepId: "close" });
    expect(refused([...toGap, record("gap", 0.1, "mm"), restart]).code).toBe("session_finished");
  });

  it("goes back from a finding and reaches another one with the reading taken again", () => {
    const r = replay(compiled, seaLevel, [...toGap, record("gap", 0.1, "mm"), back, record("gap", 0.3, "mm"), answer("check/clean"), answer("check/deeper/look", "ok")]);
    expect(r).toMatchObject({ ok: true, status: "finding", findingStepId: "done" });
  });

  it("refuses going back from the first step", () => {
    expect(refused([back])).toMatchObject({ index: 0, code: "nothing_to_go_back_to", stepId: "start" });
  });

  it("refuses events that are not flow events", () => {
    expect(refused([{ type: "step.skip" }])).toMatchObject({ index: 0, code: "invalid_event" });
    expect(refused([answer("start"), "step.back"])).toMatchObject({ index: 1, code: "invalid_event", stepId: "ask" });
    expect(replay(compiled, seaLevel, "events" as never)).toMatchObject({ ok: false, index: -1, code: "invalid_event" });
  });

  it("refuses engine facts it cannot use, before any event", () => {
    expect(refused([], { profile: twoStroke, altitudeM: 20_000 })).toMatchObject({ index: -1, code: "invalid_input", stepId: null });
    expect(refused([], { profile: { ...twoStroke, cycle: 3 as never }, altitudeM: 0 }).code).toBe("invalid_input");
  });

  it("stops at the first refusal and ignores the rest", () => {
    expect(refused([answer("ask", "gap"), { junk: true }]).index).toBe(0);
  });
});
