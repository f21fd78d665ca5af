import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { z } from "zod";
import type { createFlowRequestSchema } from "../../../../shared/schemas/flows.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { flowKeys } from "./keys.ts";

export type CreateFlowInput = z.output<typeof createFlowRequestSchema>;

/** The new flow is opened by the id it was asked for; the answer's body is not needed. */
export async function createFlow(input: CreateFlowInput): Promise<string> {
  await apiFetch("/api/flows", { method: "POST", body: input });
  return input.id;
}

export function useCreateFlow() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createFlow,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: flowKeys.list() }),
  });
}
