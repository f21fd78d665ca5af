import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "../../../lib/api-client.ts";
import { flowApiPath, flowKeys } from "./keys.ts";

/** Retires a flow (no new sessions start on it) or brings it back. */
export function setFlowRetired({ flowId, retired }: { flowId: string; retired: boolean }) {
  return apiFetch(flowApiPath(flowId), { method: "PATCH", body: { retired } });
}

export function useSetFlowRetired(flowId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (retired: boolean) => setFlowRetired({ flowId, retired }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: flowKeys.detail(flowId) }),
        queryClient.invalidateQueries({ queryKey: flowKeys.list() }),
      ]),
  });
}
