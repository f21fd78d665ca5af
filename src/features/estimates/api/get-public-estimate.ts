import { queryOptions } from "@tanstack/react-query";
import { publicEstimateSchema } from "../../../../shared/schemas/estimates.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { estimateKeys } from "./keys.ts";

export function getPublicEstimate(token: string, signal?: AbortSignal) {
  return apiFetch(`/api/public/estimates/${encodeURIComponent(token)}`, { signal, schema: publicEstimateSchema });
}

/**
 * The customer's estimate by its link; a used, replaced, expired or unknown link is an answer, not something to retry.
 * Always asked afresh: a copy kept on the phone must never stand in for the server's word.
 */
export function publicEstimateQueryOptions(token: string) {
  return queryOptions({ queryKey: estimateKeys.public(token), queryFn: ({ signal }) => getPublicEstimate(token, signal), retry: false, staleTime: 0, gcTime: 0, refetchOnWindowFocus: false });
}
