import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { ReviewDecisionRequest } from "../../../../shared/schemas/review.ts";
import { sessionDetailSchema } from "../../../../shared/schemas/sessions.ts";
import { apiFetch, isApiRequestError } from "../../../lib/api-client.ts";
import { reviewKeys } from "./keys.ts";

export function signOffSession(sessionId: string, body: ReviewDecisionRequest) {
  return apiFetch(`/api/sessions/${encodeURIComponent(sessionId)}/review`, { method: "POST", body, schema: sessionDetailSchema });
}

/** Approve or return; the session shows the answer at once, then the queue and every review view are asked again. */
export function useSignOff(sessionId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ReviewDecisionRequest) => signOffSession(sessionId, body),
    onSuccess: async (detail) => {
      queryClient.setQueryData(reviewKeys.session(sessionId), detail);
      await queryClient.invalidateQueries({ queryKey: reviewKeys.all });
    },
    // Someone else signed it off first: show the session as it now stands.
    onError: async (error) => {
      if (isApiRequestError(error, "not_waiting_for_review")) await queryClient.invalidateQueries({ queryKey: reviewKeys.all });
    },
  });
}
