// createFlowMachine: the flow's steps as data, run by one small machine with named pure guards.
//
// Why one state per step KIND (instruction, choice, reading, finding) and not one per step: XState
// formats every transition of every state when the machine is created, and a machine with one state
// per step took 40 ms or more to build for 1,000 steps here (over a second for 10,000), more than
// the whole 20 ms budget for validate + compile + replay. With one state per kind the machine has a fixed size, the
// step itself lives in context (path), guards read the compiled step map, and hasTag and can() work as before.
//
// A finding is not a final state: it is tagged "finding" and takes only "step.back", so a tech can
// go back from a conclusion (for example when the shop lead returns the session) and every earlier
// answer stays in the log. Nothing else follows a finding.
import { assign, setup } from "xstate";
import type { CompiledFlow, CompiledStep } from "./compile.ts";
import { currentStepId, initialContext, type FlowContext } from "./context.ts";
import type { FlowEvent, StepKind } from "./schema.ts";
import { answerTarget, evaluateReading, type FlowInput, type ReadingResult } from "./step-rules.ts";

export type { FlowInput } from "./step-rules.ts";

type RunKind = Exclude<StepKind, "section">;
const runKinds: readonly RunKind[] = ["instruction", "choice", "reading", "finding"];
const kindParams = (kind: RunKind) => ({ kind });

export function createFlowMachine(compiled: CompiledFlow) {
  const stepOf = (id: string | undefined): CompiledStep | undefined => (id === undefined ? undefined : compiled.steps[id]);
  const current = (context: FlowContext) => stepOf(currentStepId(context));

  // Every candidate's guard and then the action ask about the same event: remember the last answer.
  let memo: { event: FlowEvent; context: FlowContext; next: string | null; reading: ReadingResult | null } | null = null;
  const evaluate = (context: FlowContext, event: FlowEvent) => {
    if (memo?.event === event && memo.context === context) return memo;
    const step = current(context);
    let next: string | null = null;
    let reading: ReadingResult | null = null;
    if (step && "stepId" in event && event.stepId === step.id) {
      if (event.type === "step.answer") next = answerTarget(step, event.value);
      else {
        const result = evaluateReading(step, event.value, event.unit, context);
        if (result.ok) [next, reading] = [result.next, result];
      }
    }
    return (memo = { event, context, next, reading });
  };
  /** Where the event leads from the current step, or null when the step does not take it. */
  const nextOf = (context: FlowContext, event: FlowEvent) => evaluate(context, event).next;
  const readingOf = (context: FlowContext, event: FlowEvent) => evaluate(context, event).reading;

  const flowSetup = setup({
    types: {
      context: {} as FlowContext,
      events: {} as FlowEvent,
      input: {} as FlowInput,
      tags: {} as RunKind,
    },
    guards: {
      // One guard per candidate keeps replay cheap; it holds only for an event naming the current
      // step with an answer among its options or a reading checkReading and the bands accept.
      leadsToKind: ({ context, event }, params: { kind: RunKind }) => stepOf(nextOf(context, event) ?? undefined)?.kind === params.kind,
      cameFromKind: ({ context }, params: { kind: RunKind }) => stepOf(context.path[context.path.length - 2])?.kind === params.kind,
      // The root's restart would otherwise look possible to can() once the session has ended.
      isInProgress: ({ context }) => current(context)?.kind !== "finding",
    },
    actions: {
      recordAnswer: assign(({ context, event }) => {
        const next = nextOf(context, event);
        if (event.type !== "step.answer" || next === null) return {};
        return {
          answers: [...context.answers, { stepId: event.stepId, value: event.value, seq: context.seq }],
          path: [...context.path, next],
          seq: context.seq + 1,
        };
      }),
      recordReading: assign(({ context, event }) => {
        const result = readingOf(context, event);
        if (event.type !== "step.record" || !result) return {};
        const { ok: _ok, outcome: _outcome, next, ...reading } = result;
        // New keys first: on this V8 an object spread followed by new keys is slow.
        return {
          readings: [...context.readings, { stepId: event.stepId, seq: context.seq, ...reading }],
          path: [...context.path, next],
          seq: context.seq + 1,
        };
      }),
      goBack: assign(({ context }) => ({ path: context.path.slice(0, -1), seq: context.seq + 1 })),
      restartSession: assign(({ context }, params: { start: string }) => ({
        ...initialContext(context, params.start),
        seq: context.seq + 1,
        restarts: context.restarts + 1,
      })),
    },
  });

  // One candidate per kind of step the event can lead to; the guards pick the one that applies.
  const answer = runKinds.map((kind) => ({
    guard: { type: "leadsToKind" as const, params: kindParams(kind) },
    target: kind,
    actions: "recordAnswer" as const,
  }));
  const record = runKinds.map((kind) => ({
    guard: { type: "leadsToKind" as const, params: kindParams(kind) },
    target: kind,
    actions: "recordReading" as const,
  }));
  const back = runKinds
    .filter((kind) => kind !== "finding")
    .map((kind) => ({ guard: { type: "cameFromKind" as const, params: kindParams(kind) }, target: kind, actions: "goBack" as const }));
  const start = stepOf(compiled.start);
  if (!start) throw new Error(`the compiled flow's start "${compiled.start}" is not one of its steps`);

  return flowSetup.createMachine({
    id: compiled.id,
    initial: start.kind,
    context: ({ input }) => initialContext(input, compiled.start),
    on: { "session.restart": { guard: "isInProgress", target: `.${start.kind}`, actions: { type: "restartSession", params: { start: compiled.start } } } },
    states: {
      instruction: { tags: ["instruction"], on: { "step.answer": answer, "step.back": back } },
      choice: { tags: ["choice"], on: { "step.answer": answer, "step.back": back } },
      reading: { tags: ["reading"], on: { "step.record": record, "step.back": back } },
      finding: { tags: ["finding"], on: { "step.back": back } },
    },
  });
}

export type FlowMachine = ReturnType<typeof createFlowMachine>;
