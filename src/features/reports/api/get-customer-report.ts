import { queryOptions } from "@tanstack/react-query";
import { customerReportSchema } from "../../../../shared/schemas/report.ts";
import { apiFetch } from "../../../lib/api-client.ts";

export const reportKeys = {
  all: ["customer-report"] as const,
  detail: (workOrderId: string) => [...reportKeys.all, workOrderId] as const,
};

export function getCustomerReport(workOrderId: string, signal?: AbortSignal) {
  return apiFetch(`/api/work-orders/${encodeURIComponent(workOrderId)}/report`, { signal, schema: customerReportSchema });
}

export function customerReportQueryOptions(workOrderId: string) {
  return queryOptions({
    queryKey: reportKeys.detail(workOrderId),
    queryFn: ({ signal }) => getCustomerReport(workOrderId, signal),
  });
}
