import { queryOptions } from "@tanstack/react-query";
import { reviewOptionsResponseSchema } from "../../../../shared/schemas/review.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { reviewKeys } from "./keys.ts";

/** The techs and flows (with their findings) the queue's filters offer. */
export function getReviewOptions(signal?: AbortSignal) {
  return apiFetch("/api/review/options", { signal, schema: reviewOptionsResponseSchema });
}

export function reviewOptionsQueryOptions() {
  return queryOptions({
    queryKey: reviewKeys.options(),
    queryFn: ({ signal }) => getReviewOptions(signal),
    staleTime: 5 * 60_000,
  });
}
