import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { z } from "zod";
import { workOrderDetailSchema, type createWorkOrderRequestSchema } from "../../../../shared/schemas/work-orders.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { workOrderKeys } from "./keys.ts";

export type CreateWorkOrderInput = z.output<typeof createWorkOrderRequestSchema>;

export function createWorkOrder(input: CreateWorkOrderInput) {
  return apiFetch("/api/work-orders", { method: "POST", body: input, schema: workOrderDetailSchema });
}

export function useCreateWorkOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createWorkOrder,
    onSuccess: async (detail) => {
      queryClient.setQueryData(workOrderKeys.detail(detail.id), detail);
      await queryClient.invalidateQueries({ queryKey: workOrderKeys.lists() });
    },
  });
}
