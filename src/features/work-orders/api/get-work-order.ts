import { queryOptions } from "@tanstack/react-query";
import { workOrderDetailSchema } from "../../../../shared/schemas/work-orders.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { workOrderKeys } from "./keys.ts";

export function getWorkOrder(id: string, signal?: AbortSignal) {
  return apiFetch(`/api/work-orders/${encodeURIComponent(id)}`, { signal, schema: workOrderDetailSchema });
}

export function workOrderQueryOptions(id: string) {
  return queryOptions({
    queryKey: workOrderKeys.detail(id),
    queryFn: ({ signal }) => getWorkOrder(id, signal),
  });
}
