import { queryOptions } from "@tanstack/react-query";
import { reviewQueueResponseSchema } from "../../../../shared/schemas/review.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { reviewKeys } from "./keys.ts";

/** One page of the queue; `request` is the address's query string, sent as it stands so the server judges it. */
export function listReviewSessions(request: string, signal?: AbortSignal) {
  return apiFetch(`/api/review/sessions${request === "" ? "" : `?${request}`}`, { signal, schema: reviewQueueResponseSchema });
}

export function reviewQueueQueryOptions(request: string) {
  return queryOptions({
    queryKey: reviewKeys.queue(request),
    queryFn: ({ signal }) => listReviewSessions(request, signal),
  });
}
