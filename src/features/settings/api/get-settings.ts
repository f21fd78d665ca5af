import { queryOptions } from "@tanstack/react-query";
import { settingsResponseSchema } from "../../../../shared/schemas/settings.ts";
import { apiFetch } from "../../../lib/api-client.ts";

export const settingsKeys = { all: ["settings"] as const };

export function getSettings(signal?: AbortSignal) {
  return apiFetch("/api/settings", { signal, schema: settingsResponseSchema });
}

export function settingsQueryOptions() {
  return queryOptions({ queryKey: settingsKeys.all, queryFn: ({ signal }) => getSettings(signal) });
}
