import { queryOptions } from "@tanstack/react-query";
import { sessionDetailSchema } from "../../../../shared/schemas/sessions.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { reviewKeys } from "./keys.ts";

/** The whole session as the server holds it: the pinned flow, the log, the review state. */
export function getReviewSession(id: string, signal?: AbortSignal) {
  return apiFetch(`/api/sessions/${encodeURIComponent(id)}`, { signal, schema: sessionDetailSchema });
}

export function reviewSessionQueryOptions(id: string) {
  return queryOptions({
    queryKey: reviewKeys.session(id),
    queryFn: ({ signal }) => getReviewSession(id, signal),
  });
}
