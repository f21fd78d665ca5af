import { useMutation, useQueryClient } from "@tanstack/react-query";
import { estimateSchema } from "../../../../shared/schemas/estimates.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { estimatesQueryOptions } from "./list-estimates.ts";

export function createEstimate(workOrderId: string) {
  return apiFetch("/api/estimates", { method: "POST", body: { workOrderId }, schema: estimateSchema });
}

/** Starts the draft from the work order's finding. */
export function useCreateEstimate(workOrderId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => createEstimate(workOrderId),
    onSettled: () => queryClient.invalidateQueries({ queryKey: estimatesQueryOptions(workOrderId).queryKey }),
  });
}
