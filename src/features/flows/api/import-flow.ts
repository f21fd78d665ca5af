import { useMutation, useQueryClient } from "@tanstack/react-query";
import { importResponseSchema } from "../../../../shared/schemas/flows.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { flowKeys } from "./keys.ts";

/** Sends a file's parsed JSON as it is; the server validates it and keeps it as a draft. */
export function importFlow(document: unknown) {
  return apiFetch("/api/flows/import", { method: "POST", body: document, schema: importResponseSchema });
}

export function useImportFlow() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importFlow,
    onSuccess: (result) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: flowKeys.list() }),
        queryClient.invalidateQueries({ queryKey: flowKeys.detail(result.flowId) }),
      ]),
  });
}
