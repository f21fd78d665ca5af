import type { Mutation, MutationOptions, QueryClient } from "@tanstack/react-query";
import type { z } from "zod";
import { appendEventResponseSchema, type SessionDetail } from "../../../../shared/schemas/sessions.ts";
import { apiFetch, isApiRequestError } from "../../../lib/api-client.ts";
import type { EventVariables } from "../lib/event-log.ts";
import { sessionKeys, sessionQueryOptions } from "./get-session.ts";
import { logFor } from "../lib/session-log-store.ts";
import { isUnreachable, retryDelay } from "./save-rules.ts";
import { registerSessionPhotoDefaults } from "./upload-photo.ts";

export const sessionEventKey = ["session-event"] as const;
export const sessionScope = (sessionId: string) => ({ id: `session-${sessionId}` });

export function postSessionEvent({ sessionId, request }: EventVariables) {
  return apiFetch(`/api/sessions/${encodeURIComponent(sessionId)}/events`, { method: "POST", body: request, schema: appendEventResponseSchema });
}


/** The server's word on a refused save, in a sentence for the bench. */
function refusalWords(error: unknown): string {
  if (isApiRequestError(error, "seq_mismatch")) return "This check changed on another screen; it now shows where the saved session stands.";
  if (isApiRequestError(error, "session_closed")) return "This check is already closed; nothing more can be saved to it.";
  if (isApiRequestError(error, "unknown_attachment")) return "A photo did not reach the server (it may not be a picture the server can read), so the step needs it again.";
  if (isApiRequestError(error)) return `The server did not keep the last answer: ${error.message}`;
  return "The last answer could not be saved; the check now shows where the saved session stands.";
}

// Fetch the server's log again and put this tablet's view back on it.
async function resync(queryClient: QueryClient, sessionId: string, error: unknown) {
  const fresh = await queryClient.fetchQuery({ ...sessionQueryOptions(sessionId), staleTime: 0 }).catch(() => null);
  const log = logFor(sessionId);
  if (fresh && log) log.resync(fresh.events, pendingRequests(queryClient, sessionId), refusalWords(error));
}

/** Events of a session still on their way, oldest first. */
export function pendingRequests(queryClient: QueryClient, sessionId: string) {
  return queryClient
    .getMutationCache()
    .findAll({ mutationKey: sessionEventKey, status: "pending" })
    .map((m) => (m as Mutation<unknown, unknown, EventVariables>).state.variables)
    .filter((v): v is EventVariables => v?.sessionId === sessionId)
    .map((v) => v.request);
}

/** How a session's event is saved, for the live screen and for saves restored from storage alike. */
export function sessionEventOptions(queryClient: QueryClient) {
  return {
    mutationKey: sessionEventKey,
    mutationFn: (variables: EventVariables) => postSessionEvent(variables),
    networkMode: "online" as const,
    retry: (_count: number, error: unknown) => isUnreachable(error),
    retryDelay,
    gcTime: Infinity,
    onSuccess: (result: z.infer<typeof appendEventResponseSchema>, { sessionId }: EventVariables) => {
      // Keep the cached copy current, so a reload opens at the same step even before the network answers.
      queryClient.setQueryData<SessionDetail>(sessionKeys.detail(sessionId), (old) => {
        if (!old || old.events.some((e) => e.id === result.event.id)) return old;
        return { ...old, events: [...old.events, result.event], currentStepId: result.currentStepId, findingStepId: result.findingStepId };
      });
    },
    onError: (error: unknown, { sessionId }: EventVariables) => resync(queryClient, sessionId, error),
  } satisfies MutationOptions<z.infer<typeof appendEventResponseSchema>, unknown, EventVariables>;
}

/** Registered at start-up, so saves restored from the tablet's storage still know how to run. */
export function registerSessionSaveDefaults(queryClient: QueryClient) {
  queryClient.setMutationDefaults(sessionEventKey, sessionEventOptions(queryClient));
  registerSessionPhotoDefaults(queryClient);
}
