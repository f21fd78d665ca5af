import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "../../../lib/api-client.ts";
import { flowApiPath, flowKeys } from "./keys.ts";

export function startDraft({ flowId, fromVersion }: { flowId: string; fromVersion: number }) {
  return apiFetch(flowApiPath(flowId, "/draft"), { method: "POST", body: { fromVersion } });
}

export function useStartDraft(flowId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (fromVersion: number) => startDraft({ flowId, fromVersion }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: flowKeys.detail(flowId) }),
        queryClient.invalidateQueries({ queryKey: flowKeys.list() }),
      ]),
  });
}
