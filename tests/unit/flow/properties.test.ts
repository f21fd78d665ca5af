import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { createActor } from "xstate";
import { compileFlow, type CompiledFlow, type CompiledStep } from "../../../shared/flow/compile.ts";
import { currentStepId } from "../../../shared/flow/context.ts";
import { createFlowMachine } from "../../../shared/flow/machine.ts";
import { replay } from "../../../shared/flow/replay.ts";
import type { FlowEvent } from "../../../shared/flow/schema.ts";
import { answerTarget, evaluateReading } from "../../../shared/flow/step-rules.ts";
import { validateFlow, validateSection } from "../../../shared/flow/validate.ts";
import { garbageFlowArb, garbageLibraryArb, garbageSectionArb, mutatedFlowArb, validFlowArb } from "./arbitraries.ts";
import { seaLevel } from "./fixtures.ts";

const targetsOf = (step: CompiledStep): string[] => {
  if (step.kind === "instruction") return [step.next];
  if (step.kind === "choice") return step.options.map((o) => o.next);
  if (step.kind === "reading") return step.bands ? step.bands.map((b) => b.next) : Object.values(step.evaluation!.next);
  return [];
};

/** Steps to the nearest finding, by one reverse breadth-first pass over the compiled flow. */
function distances(flow: CompiledFlow): Map<string, number> {
  const into = new Map<string, string[]>();
  for (const step of Object.values(flow.steps)) for (const t of targetsOf(step)) into.set(t, [...(into.get(t) ?? []), step.id]);
  const dist = new Map<string, number>();
  const queue = Object.values(flow.steps).filter((s) => s.kind === "finding").map((s) => s.id);
  for (const id of queue) dist.set(id, 0);
  for (let head = 0; head < queue.length; head++) {
    const id = queue[head]!;
    for (const from of into.get(id) ?? []) {
      if (!dist.has(from)) {
        dist.set(from, dist.get(id)! + 1);
        queue.push(from);
      }
    }
  }
  return dist;
}

/** Every event a tech could give at the step, with where the step's own rules say it leads. */
function candidates(step: CompiledStep, inInches: boolean): Array<{ event: FlowEvent; next: string }> {
  const out: Array<{ event: FlowEvent; next: string }> = [];
  const add = (event: FlowEvent, next: string | null) => {
    if (next !== null) out.push({ event, next });
  };
  if (step.kind === "instruction") add({ type: "step.answer", stepId: step.id, value: "done" }, answerTarget(step, "done"));
  if (step.kind === "choice") for (const o of step.options) add({ type: "step.answer", stepId: step.id, value: o.value }, answerTarget(step, o.value));
  if (step.kind === "reading") {
    // Inside each band (midpoints, or one past an open end), and compression readings covering every verdict.
    const values = step.bands
      ? step.bands.map((b) => (b.from && b.to ? (b.from.value + b.to.value) / 2 : b.to ? b.to.value - 0.5 : b.from ? b.from.value + 1 : 10))
      : [40, 85, 130, 600];
    for (const mm of values) {
      const [value, unit] = step.bands && inInches ? [mm / 25.4, "in"] : [mm, step.unit];
      const result = evaluateReading(step, value, unit, seaLevel);
      add({ type: "step.record", stepId: step.id, value, unit }, result.ok ? result.next : null);
    }
  }
  return out;
}

describe("validator properties", () => {
  it("never throws on garbage, and what it passes always compiles", () => {
    fc.assert(
      fc.property(fc.oneof(garbageFlowArb, fc.anything(), fc.jsonValue()), garbageLibraryArb, (input, library) => {
        const result = validateFlow(input, library as never);
        expect(Array.isArray(result.problems)).toBe(true);
        expect(result.ok).toBe(!result.problems.some((p) => p.severity === "error"));
        for (const p of result.problems) expect(typeof p.code === "string" && typeof p.message === "string").toBe(true);
        if (result.ok) {
          const compiled = compileFlow(input, library as never);
          expect(replay(compiled, seaLevel, []).ok).toBe(true);
        }
      }),
      { numRuns: 400 },
    );
  });

  it("never throws on a valid flow changed in one place, and what it passes compiles to a closed step map", () => {
    fc.assert(
      fc.property(mutatedFlowArb, ({ flow, sections }) => {
        const result = validateFlow(flow, sections);
        if (!result.ok) return;
        const compiled = compileFlow(flow, sections);
        expect(Object.values(compiled.steps).every((s) => s.kind !== ("section" as string))).toBe(true);
        expect(compiled.steps[compiled.start]).toBeDefined();
        for (const step of Object.values(compiled.steps)) for (const t of targetsOf(step)) expect(compiled.steps[t]).toBeDefined();
      }),
      { numRuns: 300 },
    );
  });

  it("never throws on garbage sections", () => {
    fc.assert(
      fc.property(fc.oneof(garbageSectionArb, fc.anything()), garbageLibraryArb, (input, library) => {
        const result = validateSection(input, library as never);
        expect(result.ok).toBe(!result.problems.some((p) => p.severity === "error"));
      }),
      { numRuns: 300 },
    );
  });
});

describe("machine properties", () => {
  it("accepts every flow built valid, and random answers always end at a finding", () => {
    fc.assert(
      fc.property(validFlowArb, fc.infiniteStream(fc.nat()), fc.boolean(), ({ flow, sections }, picks, inInches) => {
        const result = validateFlow(flow, sections);
        expect(result.problems.filter((p) => p.severity === "error")).toEqual([]);
        const compiled = compileFlow(flow, sections);
        const dist = distances(compiled);
        const actor = createActor(createFlowMachine(compiled), { input: seaLevel }).start();
        const visits = new Map<string, number>();
        const events: FlowEvent[] = [];
        const stream = picks[Symbol.iterator]();
        // Random answers, except that a step met three times takes its way nearest a finding: loops must end.
        for (let k = 0; k < Object.keys(compiled.steps).length * 4 + 10 && !actor.getSnapshot().hasTag("finding"); k++) {
          const snapshot = actor.getSnapshot();
          const step = compiled.steps[currentStepId(snapshot.context)]!;
          const seen = (visits.get(step.id) ?? 0) + 1;
          visits.set(step.id, seen);
          const options = candidates(step, inInches);
          const choice = seen >= 3 ? options.reduce((a, b) => (dist.get(b.next)! < dist.get(a.next)! ? b : a)) : options[stream.next().value % options.length]!;
          expect(snapshot.can(choice.event)).toBe(true);
          actor.send(choice.event);
          events.push(choice.event);
          expect(currentStepId(actor.getSnapshot().context)).toBe(choice.next);
        }
        const end = actor.getSnapshot();
        expect(end.status).toBe("active");
        expect(end.hasTag("finding")).toBe(true);
        expect(replay(compiled, seaLevel, events)).toMatchObject({ ok: true, status: "finding", findingStepId: currentStepId(end.context) });
      }),
      { numRuns: 200 },
    );
    // 200 random flows, each run to a finding: seconds of work, more when the machine is busy.
  }, 30_000);
});
