import { queryOptions } from "@tanstack/react-query";
import { sessionFlagsResponseSchema } from "../../../../shared/schemas/review.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { reviewKeys } from "./keys.ts";

export function getSessionFlags(id: string, signal?: AbortSignal) {
  return apiFetch(`/api/review/sessions/${encodeURIComponent(id)}/flags`, { signal, schema: sessionFlagsResponseSchema });
}

export function sessionFlagsQueryOptions(id: string) {
  return queryOptions({
    queryKey: reviewKeys.flags(id),
    queryFn: ({ signal }) => getSessionFlags(id, signal),
  });
}
