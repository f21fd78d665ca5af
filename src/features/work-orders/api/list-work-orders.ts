import { queryOptions } from "@tanstack/react-query";
import { workOrderListResponseSchema } from "../../../../shared/schemas/work-orders.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { workOrderKeys, type WorkOrderListFilters } from "./keys.ts";

export async function listWorkOrders({ search, state }: WorkOrderListFilters, signal?: AbortSignal) {
  const params = new URLSearchParams({ state });
  if (search.trim() !== "") params.set("search", search.trim());
  const { workOrders } = await apiFetch(`/api/work-orders?${params.toString()}`, { signal, schema: workOrderListResponseSchema });
  return workOrders;
}

export function workOrderListQueryOptions(filters: WorkOrderListFilters) {
  return queryOptions({
    queryKey: workOrderKeys.list(filters),
    queryFn: ({ signal }) => listWorkOrders(filters, signal),
  });
}
