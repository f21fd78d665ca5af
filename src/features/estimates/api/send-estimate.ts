import { useMutation, useQueryClient, type QueryKey } from "@tanstack/react-query";
import { sendEstimateResponseSchema } from "../../../../shared/schemas/estimates.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { estimatesQueryOptions } from "./list-estimates.ts";

export function sendEstimate(id: string, to: string) {
  return apiFetch(`/api/estimates/${encodeURIComponent(id)}/send`, { method: "POST", body: { to }, schema: sendEstimateResponseSchema });
}

/** Sends, then asks again for the estimates and the work order, whose state a send moves. */
export function useSendEstimate(workOrderId: string, id: string, workOrderKey: QueryKey) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (to: string) => sendEstimate(id, to),
    onSettled: () =>
      Promise.all([queryClient.invalidateQueries({ queryKey: estimatesQueryOptions(workOrderId).queryKey }), queryClient.invalidateQueries({ queryKey: workOrderKey })]),
  });
}
