import { queryOptions } from "@tanstack/react-query";
import { flowDetailSchema } from "../../../../shared/schemas/flows.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { flowApiPath, flowKeys } from "./keys.ts";

export function getFlow(flowId: string, signal?: AbortSignal) {
  return apiFetch(flowApiPath(flowId), { signal, schema: flowDetailSchema });
}

export function flowQueryOptions(flowId: string) {
  return queryOptions({ queryKey: flowKeys.detail(flowId), queryFn: ({ signal }) => getFlow(flowId, signal) });
}
