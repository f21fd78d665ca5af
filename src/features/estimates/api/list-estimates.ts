import { queryOptions } from "@tanstack/react-query";
import { estimateListResponseSchema } from "../../../../shared/schemas/estimates.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { estimateKeys } from "./keys.ts";

export function listEstimates(workOrderId: string, signal?: AbortSignal) {
  return apiFetch(`/api/estimates?workOrderId=${encodeURIComponent(workOrderId)}`, { signal, schema: estimateListResponseSchema });
}

/** Every revision of the work order's estimate, newest first; asked afresh on opening, and every half minute while the customer has it. */
export function estimatesQueryOptions(workOrderId: string) {
  return queryOptions({
    queryKey: estimateKeys.list(workOrderId),
    queryFn: ({ signal }) => listEstimates(workOrderId, signal),
    staleTime: 0,
    refetchInterval: (query) => (query.state.data?.estimates[0]?.status === "sent" ? 30_000 : false),
  });
}
