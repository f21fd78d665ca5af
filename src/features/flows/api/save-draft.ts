import { useMutation, useQueryClient } from "@tanstack/react-query";
import { saveDraftResponseSchema, staleDraftDetailsSchema, type FlowDetail } from "../../../../shared/schemas/flows.ts";
import { apiFetch, isApiRequestError } from "../../../lib/api-client.ts";
import { flowApiPath, flowKeys } from "./keys.ts";

export type DraftDefinition = Record<string, unknown>;

export interface SaveDraftInput {
  flowId: string;
  /** The revision the edit was made on; the server refuses it with 409 once another save came first. */
  revision: number;
  definition: DraftDefinition;
}

export function saveDraft({ flowId, revision, definition }: SaveDraftInput) {
  return apiFetch(flowApiPath(flowId, "/draft"), { method: "PUT", body: { revision, definition }, schema: saveDraftResponseSchema });
}

/** The draft as it now stands on the server, when a save was refused as stale. */
export function staleDraftOf(error: unknown) {
  if (!isApiRequestError(error, "draft_stale")) return null;
  const parsed = staleDraftDetailsSchema.safeParse(error.details);
  return parsed.success ? parsed.data : null;
}

export function useSaveDraft(flowId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Omit<SaveDraftInput, "flowId">) => saveDraft({ flowId, ...input }),
    onSuccess: (saved, { definition }) => {
      // The cached flow follows the save, so reopening the editor starts from what the server holds.
      queryClient.setQueryData(flowKeys.detail(flowId), (old: FlowDetail | undefined) =>
        old?.draft ? { ...old, draft: { ...old.draft, revision: saved.revision, definition, problems: saved.problems, updatedAt: saved.updatedAt } } : old,
      );
      void queryClient.invalidateQueries({ queryKey: flowKeys.list() });
    },
  });
}
