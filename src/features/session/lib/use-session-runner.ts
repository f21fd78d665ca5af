// Runs a session on the tablet: the shared machine and replaySession decide, the log saves in order.
import { useEffect, useMemo, useState, useSyncExternalStore } from "react";
import { onlineManager, useMutation, useMutationState, useQueryClient } from "@tanstack/react-query";
import { v7 as uuidv7 } from "uuid";
import type { CompiledFlow, CompiledStep } from "../../../../shared/flow/compile.ts";
import { machineFor } from "../../../../shared/flow/replay.ts";
import { replaySession, unacknowledged } from "../../../../shared/flow/session-log.ts";
import type { FlowEvent } from "../../../../shared/flow/schema.ts";
import type { SessionDetail, SessionEventBody } from "../../../../shared/schemas/sessions.ts";
import { pendingRequests, sessionEventKey, sessionEventOptions, sessionScope } from "../api/append-event.ts";
import { mergeLog, type EventVariables } from "./event-log.ts";
import { registerLog, SessionLogStore } from "./session-log-store.ts";

export type SaveState = { kind: "saved" } | { kind: "saving"; count: number } | { kind: "waiting"; count: number };

function useSaveState(sessionId: string): SaveState {
  const online = useSyncExternalStore(onlineManager.subscribe.bind(onlineManager), () => onlineManager.isOnline(), () => true);
  const pending = useMutationState({
    filters: { mutationKey: sessionEventKey, status: "pending", predicate: (m) => (m.state.variables as EventVariables | undefined)?.sessionId === sessionId },
    select: (m) => m.state.failureCount,
  });
  if (pending.length === 0) return { kind: "saved" };
  const failing = !online || pending.some((failures) => failures > 0);
  return { kind: failing ? "waiting" : "saving", count: pending.length };
}

export function useSessionRunner(detail: SessionDetail, compiled: CompiledFlow) {
  const queryClient = useQueryClient();
  const [store] = useState(() => new SessionLogStore(detail.id, mergeLog(detail.events, pendingRequests(queryClient, detail.id))));
  useEffect(() => registerLog(store), [store]);
  const log = useSyncExternalStore(store.subscribe, store.getSnapshot, store.getSnapshot);
  const { mutate } = useMutation({ ...sessionEventOptions(queryClient), scope: sessionScope(detail.id) });
  const save = useSaveState(detail.id);

  const events = useMemo(() => log.requests.map((r) => r.event), [log.requests]);
  const replayed = useMemo(() => replaySession(compiled, detail.input, events), [compiled, detail.input, events]);
  if (!replayed.ok) throw new Error(`The saved session does not replay: ${replayed.reason}`);
  const step: CompiledStep = compiled.steps[replayed.stepId]!;
  const machine = machineFor(compiled);
  const snapshot = useMemo(() => machine.resolveState({ value: step.kind, context: replayed.context }), [machine, step.kind, replayed.context]);

  /** Whether the machine takes this flow event now; annotations are checked by replaySession on send. */
  const can = (event: FlowEvent) => snapshot.can(event);
  const missingAcks = unacknowledged(step, replayed.acknowledgements[step.id]);
  const photos = replayed.photos[step.id] ?? [];
  const photoMissing = step.photo?.requirement === "required" && photos.length === 0;

  /** Applies the event at once if the shared rules take it, then saves it; answers the refusal otherwise. */
  const send = (event: SessionEventBody): string | null => {
    const current = store.getSnapshot().requests;
    const check = replaySession(compiled, detail.input, [...current.map((r) => r.event), event]);
    if (!check.ok) return check.reason;
    const request = store.append(event, uuidv7(), new Date());
    mutate({ sessionId: detail.id, request });
    return null;
  };

  const lastRequest = log.requests.at(-1);
  return {
    step,
    replayed,
    snapshot,
    can,
    send,
    save,
    missingAcks,
    photos,
    photoMissing,
    lastRequest,
    generation: log.generation,
    problem: log.problem,
    dismissProblem: () => store.dismissProblem(),
  };
}

export type SessionRunner = ReturnType<typeof useSessionRunner>;
