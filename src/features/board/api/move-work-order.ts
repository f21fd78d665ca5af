import { useMutation, useQueryClient } from "@tanstack/react-query";
import { moveWorkOrderResponseSchema, type MoveWorkOrderRequest } from "../../../../shared/schemas/board.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { boardKeys } from "./keys.ts";

export interface MoveInput extends MoveWorkOrderRequest {
  workOrderId: string;
}

export function moveWorkOrder({ workOrderId, ...body }: MoveInput) {
  return apiFetch(`/api/work-orders/${encodeURIComponent(workOrderId)}/moves`, { method: "POST", body, schema: moveWorkOrderResponseSchema });
}

export function useMoveWorkOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: moveWorkOrder,
    // Refused or not, the board is read again: a refusal usually means someone else moved it.
    onSettled: () => queryClient.invalidateQueries({ queryKey: boardKeys.workOrders }),
  });
}
