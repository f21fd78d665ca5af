import { queryOptions } from "@tanstack/react-query";
import { benchHomeResponseSchema } from "../../../../shared/schemas/sessions.ts";
import { apiFetch } from "../../../lib/api-client.ts";

export const benchKeys = {
  all: ["bench"] as const,
  home: () => [...benchKeys.all, "home"] as const,
};

/** The signed-in tech's own checks: open, waiting for the shop lead, and sent back. */
export function getBenchHome(signal?: AbortSignal) {
  return apiFetch("/api/bench/home", { signal, schema: benchHomeResponseSchema });
}

export function benchHomeQueryOptions() {
  return queryOptions({
    queryKey: benchKeys.home(),
    queryFn: ({ signal }) => getBenchHome(signal),
    // A check finished or sent back a minute ago must not still show as before: ask again on every visit,
    // showing the last answer meanwhile.
    staleTime: 0,
  });
}
