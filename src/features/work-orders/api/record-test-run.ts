import { useMutation, useQueryClient } from "@tanstack/react-query";
import { testRunSchema, type RecordTestRunRequest } from "../../../../shared/schemas/test-runs.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { workOrderKeys } from "./keys.ts";

export function recordTestRun({ workOrderId, ...body }: RecordTestRunRequest & { workOrderId: string }) {
  return apiFetch(`/api/work-orders/${encodeURIComponent(workOrderId)}/test-runs`, { method: "POST", body, schema: testRunSchema });
}

export function useRecordTestRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: recordTestRun,
    // The detail shows the latest run; the board's gate reads it too.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workOrderKeys.all }),
  });
}
