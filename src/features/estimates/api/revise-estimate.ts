import { useMutation, useQueryClient } from "@tanstack/react-query";
import { estimateSchema } from "../../../../shared/schemas/estimates.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { estimatesQueryOptions } from "./list-estimates.ts";

export function reviseEstimate(id: string) {
  return apiFetch(`/api/estimates/${encodeURIComponent(id)}/revise`, { method: "POST", schema: estimateSchema });
}

export function useReviseEstimate(workOrderId: string, id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => reviseEstimate(id),
    onSettled: () => queryClient.invalidateQueries({ queryKey: estimatesQueryOptions(workOrderId).queryKey }),
  });
}
