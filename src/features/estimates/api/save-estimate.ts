import { useMutation, useQueryClient } from "@tanstack/react-query";
import { estimateSchema, type UpdateEstimateRequest } from "../../../../shared/schemas/estimates.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { estimatesQueryOptions } from "./list-estimates.ts";

export function saveEstimate(id: string, body: UpdateEstimateRequest) {
  return apiFetch(`/api/estimates/${encodeURIComponent(id)}`, { method: "PUT", body, schema: estimateSchema });
}

export function useSaveEstimate(workOrderId: string, id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateEstimateRequest) => saveEstimate(id, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: estimatesQueryOptions(workOrderId).queryKey }),
  });
}
