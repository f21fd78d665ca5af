import { queryOptions } from "@tanstack/react-query";
import { flowVersionSchema } from "../../../../shared/schemas/flows.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { flowApiPath, flowKeys } from "./keys.ts";

export function getFlowVersion(flowId: string, number: number, signal?: AbortSignal) {
  return apiFetch(flowApiPath(flowId, `/versions/${number}`), { signal, schema: flowVersionSchema });
}

export function flowVersionQueryOptions(flowId: string, number: number) {
  return queryOptions({
    queryKey: flowKeys.version(flowId, number),
    queryFn: ({ signal }) => getFlowVersion(flowId, number, signal),
    // A published version never changes.
    staleTime: Infinity,
  });
}
