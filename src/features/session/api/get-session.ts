import { queryOptions } from "@tanstack/react-query";
import { sessionDetailSchema } from "../../../../shared/schemas/sessions.ts";
import { apiFetch } from "../../../lib/api-client.ts";

export const sessionKeys = {
  all: ["sessions"] as const,
  detail: (id: string) => [...sessionKeys.all, "detail", id] as const,
};

export function getSession(id: string, signal?: AbortSignal) {
  return apiFetch(`/api/sessions/${encodeURIComponent(id)}`, { signal, schema: sessionDetailSchema });
}

export function sessionQueryOptions(id: string) {
  return queryOptions({
    queryKey: sessionKeys.detail(id),
    queryFn: ({ signal }) => getSession(id, signal),
    // The tablet drives the session; the server's copy only matters on opening and on a re-sync.
    staleTime: 60_000,
  });
}
