export type WorkOrderListState = "open" | "all" | "waiting_for_diagnosis" | "diagnosing";

export interface WorkOrderListFilters {
  search: string;
  state: WorkOrderListState;
}

/** Query keys from general to specific, so a mutation can invalidate every list at once. */
export const workOrderKeys = {
  all: ["work-orders"] as const,
  lists: () => [...workOrderKeys.all, "list"] as const,
  list: (filters: WorkOrderListFilters) => [...workOrderKeys.lists(), filters] as const,
  detail: (id: string) => [...workOrderKeys.all, "detail", id] as const,
};
