import { queryOptions } from "@tanstack/react-query";
import { flowListResponseSchema } from "../../../../shared/schemas/flows.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { flowKeys } from "./keys.ts";

export async function listFlows(signal?: AbortSignal) {
  const { flows } = await apiFetch("/api/flows", { signal, schema: flowListResponseSchema });
  return flows;
}

export function flowListQueryOptions() {
  return queryOptions({ queryKey: flowKeys.list(), queryFn: ({ signal }) => listFlows(signal) });
}
