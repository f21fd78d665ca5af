import { queryOptions } from "@tanstack/react-query";
import { insightResponseSchema, type InsightQuery } from "../../../../shared/schemas/insight.ts";
import { apiFetch } from "../../../lib/api-client.ts";

export const insightKeys = {
  all: ["insight"] as const,
  range: (range: InsightQuery) => [...insightKeys.all, range] as const,
};

/** The shop's figures over whole days, both ends included. */
export function getInsight({ from, to }: InsightQuery, signal?: AbortSignal) {
  const params = new URLSearchParams({ from, to });
  return apiFetch(`/api/insight?${params.toString()}`, { signal, schema: insightResponseSchema });
}

export function insightQueryOptions(range: InsightQuery) {
  return queryOptions({
    queryKey: insightKeys.range(range),
    queryFn: ({ signal }) => getInsight(range, signal),
    // Sessions finish all day: a range that ends today is worth asking again after a minute.
    staleTime: 60_000,
  });
}
