import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { problemSchema, publishResponseSchema } from "../../../../shared/schemas/flows.ts";
import { apiFetch, isApiRequestError } from "../../../lib/api-client.ts";
import { forgetWorkingCopy } from "../lib/working-copy.ts";
import { flowApiPath, flowKeys } from "./keys.ts";

export function publishFlow({ flowId, revision, note }: { flowId: string; revision: number; note: string }) {
  return apiFetch(flowApiPath(flowId, "/publish"), { method: "POST", body: { revision, note }, schema: publishResponseSchema });
}

const refusedSchema = z.object({ problems: z.array(problemSchema) });

/** The problems the server named when it refused to publish (422), if it named any. */
export function publishProblemsOf(error: unknown) {
  if (!isApiRequestError(error) || error.status !== 422) return null;
  const parsed = refusedSchema.safeParse(error.details);
  return parsed.success ? parsed.data.problems : null;
}

export function usePublishFlow(flowId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { revision: number; note: string }) => publishFlow({ flowId, ...input }),
    onSuccess: () => {
      // The draft became a version: no working copy of it is left to restore.
      forgetWorkingCopy(flowId);
      return queryClient.invalidateQueries({ queryKey: flowKeys.all });
    },
  });
}
