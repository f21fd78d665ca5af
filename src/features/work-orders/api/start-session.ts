import { useMutation, useQueryClient } from "@tanstack/react-query";
import { sessionDetailSchema } from "../../../../shared/schemas/sessions.ts";
import { apiFetch, isApiRequestError } from "../../../lib/api-client.ts";
import { workOrderKeys } from "./keys.ts";

// The session screen reads the whole session itself; here only its id matters.
const startedSessionSchema = sessionDetailSchema.pick({ id: true });

/** Starts a check and answers the session to open: the new one, or the one already open on this unit. */
export async function startSession({ workOrderId, flowId }: { workOrderId: string; flowId: string }): Promise<string> {
  try {
    const started = await apiFetch(`/api/work-orders/${encodeURIComponent(workOrderId)}/sessions`, {
      method: "POST",
      body: { flowId },
      schema: startedSessionSchema,
    });
    return started.id;
  } catch (error) {
    const openId = isApiRequestError(error, "session_already_open") ? openSessionId(error.details) : null;
    if (openId) return openId;
    throw error;
  }
}

function openSessionId(details: unknown): string | null {
  const sessionId = (details as { sessionId?: unknown } | null | undefined)?.sessionId;
  return typeof sessionId === "string" && sessionId !== "" ? sessionId : null;
}

export function useStartSession(workOrderId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (flowId: string) => startSession({ workOrderId, flowId }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workOrderKeys.all }),
  });
}
