import { useMutation, useQueryClient } from "@tanstack/react-query";
import { sessionDetailSchema } from "../../../../shared/schemas/sessions.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { sessionKeys } from "./get-session.ts";

export function useCompleteSession(sessionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch(`/api/sessions/${encodeURIComponent(sessionId)}/complete`, { method: "POST", schema: sessionDetailSchema }),
    onSuccess: (detail) => queryClient.setQueryData(sessionKeys.detail(sessionId), detail),
  });
}

export function useAbandonSession(sessionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (reason: string) => apiFetch(`/api/sessions/${encodeURIComponent(sessionId)}/abandon`, { method: "POST", body: { reason }, schema: sessionDetailSchema }),
    onSuccess: (detail) => queryClient.setQueryData(sessionKeys.detail(sessionId), detail),
  });
}

/** Opens a session the shop lead returned, so the tech can go back and redo what the comment asks. */
export function useReopenSession(sessionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch(`/api/sessions/${encodeURIComponent(sessionId)}/reopen`, { method: "POST", schema: sessionDetailSchema }),
    // The bench home asks again on every visit, so it shows the check as open once the tech goes back.
    onSuccess: (detail) => queryClient.setQueryData(sessionKeys.detail(sessionId), detail),
  });
}
