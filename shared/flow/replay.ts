// replay: runs stored events through the flow's machine and names the first one it refuses.
import { createActor, type Snapshot } from "xstate";
import type { z } from "zod";
import type { CompiledFlow } from "./compile.ts";
import { currentStepId, type FlowContext } from "./context.ts";
import { createFlowMachine, type FlowMachine } from "./machine.ts";
import { DONE, flowEventSchema, type FlowEvent } from "./schema.ts";
import { answerTarget, evaluateReading, flowInputSchema, type FlowInput, type RefusalCode } from "./step-rules.ts";

export type ReplayResult =
  | {
      ok: true;
      stepId: string;
      status: "in_progress" | "finding";
      findingStepId: string | null;
      context: FlowContext;
      /** actor.getPersistedSnapshot(): plain JSON, restores with createActor(machine, { snapshot }). */
      snapshot: Snapshot<unknown>;
    }
  | {
      ok: false;
      /** The refused event's position, or -1 when the input itself is refused. */
      index: number;
      event: unknown;
      code: RefusalCode;
      reason: string;
      /** Where the session stood when the event came. */
      stepId: string | null;
    };

// A pinned flow version compiles once; its machine serves every save of every session on it.
const machines = new WeakMap<CompiledFlow, FlowMachine>();

export function machineFor(compiled: CompiledFlow): FlowMachine {
  let machine = machines.get(compiled);
  if (!machine) machines.set(compiled, (machine = createFlowMachine(compiled)));
  return machine;
}

function describeIssues(issues: readonly z.core.$ZodIssue[]): string {
  return issues.map((i) => (i.path.length ? `${i.path.map(String).join(".")}: ${i.message}` : i.message)).join("; ");
}

/** Why the machine refused an event, in words a person can act on. */
export function explainRefusal(compiled: CompiledFlow, context: FlowContext, event: FlowEvent): { code: RefusalCode; reason: string } {
  const current = currentStepId(context);
  if (event.type === "step.back") {
    return { code: "nothing_to_go_back_to", reason: `the session is at its first step ("${current}"); there is nothing to go back to` };
  }
  if (event.type === "session.restart") return { code: "wrong_event_for_step", reason: "the session cannot restart here" };
  if (event.stepId !== current) {
    const known = event.stepId in compiled.steps ? "" : ", which is not a step of this flow";
    return { code: "wrong_step", reason: `the event answers step "${event.stepId}"${known}, but the session stands at "${current}"` };
  }
  const step = compiled.steps[current]!;
  if (event.type === "step.answer") {
    if (step.kind === "reading") return { code: "wrong_event_for_step", reason: `step "${current}" takes a reading (step.record), not an answer` };
    if (answerTarget(step, event.value) === null && step.kind === "instruction") {
      return { code: "unknown_option", reason: `step "${current}" is confirmed with "${DONE}", not "${event.value}"` };
    }
    const options = step.kind === "choice" ? step.options.map((o) => `"${o.value}"`).join(", ") : "none";
    return { code: "unknown_option", reason: `"${event.value}" is not an option of step "${current}"; its options are ${options}` };
  }
  if (step.kind !== "reading") return { code: "wrong_event_for_step", reason: `step "${current}" takes an answer (step.answer), not a reading` };
  const result = evaluateReading(step, event.value, event.unit, context);
  return result.ok ? { code: "wrong_event_for_step", reason: `the reading at "${current}" was not accepted` } : { code: result.code, reason: result.reason };
}

function refusal(index: number, event: unknown, code: RefusalCode, reason: string, context: FlowContext): ReplayResult {
  return { ok: false, index, event, code, reason, stepId: currentStepId(context) };
}

export function replay(compiled: CompiledFlow, input: FlowInput, events: unknown[]): ReplayResult {
  const checked = flowInputSchema.safeParse(input);
  if (!checked.success) return { ok: false, index: -1, event: null, code: "invalid_input", reason: `the session's engine facts are not usable: ${describeIssues(checked.error.issues)}`, stepId: null };
  if (!Array.isArray(events)) return { ok: false, index: -1, event: events, code: "invalid_event", reason: "the events are not a list", stepId: null };
  const actor = createActor(machineFor(compiled), { input }).start();
  try {
    let snapshot = actor.getSnapshot();
    for (let index = 0; index < events.length; index++) {
      const raw: unknown = events[index];
      const parsed = flowEventSchema.safeParse(raw);
      if (!parsed.success) return refusal(index, raw, "invalid_event", `the event is not a flow event: ${describeIssues(parsed.error.issues)}`, snapshot.context);
      if (snapshot.hasTag("finding") && parsed.data.type !== "step.back") {
        return refusal(index, raw, "session_finished", `the session already reached the finding "${currentStepId(snapshot.context)}"; only going back can follow it`, snapshot.context);
      }
      actor.send(parsed.data);
      const next = actor.getSnapshot();
      // A refused event leaves the very same snapshot: every accepted one assigns to context.
      if (next === snapshot) {
        const why = explainRefusal(compiled, snapshot.context, parsed.data);
        return refusal(index, raw, why.code, why.reason, snapshot.context);
      }
      snapshot = next;
    }
    const stepId = currentStepId(snapshot.context);
    const finished = snapshot.hasTag("finding");
    return {
      ok: true,
      stepId,
      status: finished ? "finding" : "in_progress",
      findingStepId: finished ? stepId : null,
      context: snapshot.context,
      snapshot: actor.getPersistedSnapshot(),
    };
  } finally {
    actor.stop();
  }
}
