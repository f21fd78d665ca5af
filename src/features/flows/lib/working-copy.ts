// The editor's working copy in localStorage, so a reload or a closed tab never loses an edit.
import { z } from "zod";
import { draftDefinitionSchema } from "../../../../shared/schemas/flows.ts";
import type { DraftDefinition } from "../api/save-draft.ts";

const workingCopySchema = z.object({
  /** The server revision the edits were made on. */
  baseRevision: z.number().int(),
  definition: draftDefinitionSchema,
});
export type WorkingCopy = z.infer<typeof workingCopySchema>;

export const workingCopyKey = (flowId: string) => `benchpath.flow-draft.${flowId}`;

export function readWorkingCopy(flowId: string): WorkingCopy | null {
  try {
    const text = window.localStorage.getItem(workingCopyKey(flowId));
    if (text === null) return null;
    const parsed = workingCopySchema.safeParse(JSON.parse(text));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/** False when the browser refused (storage full or switched off); the editor then says so. */
export function writeWorkingCopy(flowId: string, copy: { baseRevision: number; definition: DraftDefinition }): boolean {
  try {
    window.localStorage.setItem(workingCopyKey(flowId), JSON.stringify(copy));
    return true;
  } catch {
    return false;
  }
}

export function forgetWorkingCopy(flowId: string): void {
  try {
    window.localStorage.removeItem(workingCopyKey(flowId));
  } catch {
    // Nothing to forget when storage is switched off.
  }
}
