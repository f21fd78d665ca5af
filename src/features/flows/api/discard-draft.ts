import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "../../../lib/api-client.ts";
import { forgetWorkingCopy } from "../lib/working-copy.ts";
import { flowApiPath, flowKeys } from "./keys.ts";

// DELETE /api/flows/:id/draft answers 204 without a body, so shared/schemas/flows.ts names no schema for it.
export function discardDraft(flowId: string) {
  return apiFetch(flowApiPath(flowId, "/draft"), { method: "DELETE" });
}

export function useDiscardDraft(flowId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => discardDraft(flowId),
    onSuccess: () => {
      forgetWorkingCopy(flowId);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: flowKeys.detail(flowId) }),
        queryClient.invalidateQueries({ queryKey: flowKeys.list() }),
      ]);
    },
  });
}
