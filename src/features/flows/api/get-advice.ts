import { queryOptions } from "@tanstack/react-query";
import { adviceResponseSchema } from "../../../../shared/schemas/flows.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { flowApiPath, flowKeys } from "./keys.ts";

export function getAdvice(flowId: string, signal?: AbortSignal) {
  return apiFetch(flowApiPath(flowId, "/advice"), { signal, schema: adviceResponseSchema });
}

export function adviceQueryOptions(flowId: string) {
  return queryOptions({ queryKey: [...flowKeys.detail(flowId), "advice"] as const, queryFn: ({ signal }) => getAdvice(flowId, signal), staleTime: 5 * 60_000 });
}
