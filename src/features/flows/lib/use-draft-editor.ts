// The working copy of one draft: undo history, the copy in localStorage, saving and stale saves.
import { useEffect, useEffectEvent, useMemo, useReducer, useRef, useState } from "react";
import { sameValue } from "../../../../shared/flow/diff.ts";
import { validateFlow, type SectionLibrary } from "../../../../shared/flow/validate.ts";
import type { FlowDetail } from "../../../../shared/schemas/flows.ts";
import { clientErrorIds, isApiRequestError } from "../../../lib/api-client.ts";
import { staleDraftOf, useSaveDraft, type DraftDefinition } from "../api/save-draft.ts";
import { historyReducer, startHistory, type Update } from "./draft-history.ts";
import { forgetWorkingCopy, readWorkingCopy, writeWorkingCopy } from "./working-copy.ts";

/** Saved this long after the last edit. */
export const AUTOSAVE_MS = 3000;
/** After a failed save, the next try waits longer. */
const RETRY_MS = 15_000;

export type ServerDraft = NonNullable<FlowDetail["draft"]>;
export type SaveStatus = "saved" | "unsaved" | "saving" | "failed" | "conflict";

/** The draft as another save left it on the server. */
export interface Conflict {
  revision: number;
  definition: DraftDefinition;
  updatedBy: { id: string; name: string } | null;
  updatedAt: string;
}

/** What the server holds, as far as this editor knows, and the revision the edits are based on. */
interface Base {
  revision: number;
  definition: DraftDefinition;
}

interface Opening {
  definition: DraftDefinition;
  base: Base;
  restored: boolean;
  conflict: Conflict | null;
}

/** A local copy that differs from the server's draft wins: it holds edits that never reached the server. */
function openDraft(flowId: string, draft: ServerDraft): Opening {
  const server = { revision: draft.revision, definition: draft.definition };
  const local = readWorkingCopy(flowId);
  if (!local || sameValue(local.definition, draft.definition)) return { definition: draft.definition, base: server, restored: false, conflict: null };
  // Edits made on an older revision: someone saved since, so this is a stale save waiting to happen.
  const conflict = local.baseRevision === draft.revision ? null : { revision: draft.revision, definition: draft.definition, updatedBy: draft.updatedBy, updatedAt: draft.updatedAt };
  return { definition: local.definition, base: { revision: local.baseRevision, definition: draft.definition }, restored: true, conflict };
}

function failureWords(error: unknown): string {
  if (isApiRequestError(error, clientErrorIds.offline) || isApiRequestError(error, clientErrorIds.unreachable)) {
    return "Benchpath cannot reach the shop's server.";
  }
  return isApiRequestError(error) ? error.message : "Something went wrong while saving.";
}

export function useDraftEditor(flowId: string, draft: ServerDraft) {
  const [opening] = useState(() => openDraft(flowId, draft));
  const [history, dispatch] = useReducer(historyReducer, opening.definition, startHistory);
  const [base, setBase] = useState<Base>(opening.base);
  const [conflict, setConflict] = useState<Conflict | null>(opening.conflict);
  const [failure, setFailure] = useState<string | null>(null);
  const save = useSaveDraft(flowId);
  const inFlight = useRef<{ definition: DraftDefinition; done: Promise<number | null> } | null>(null);

  const present = history.present;
  const unsaved = !sameValue(present, base.definition);
  const validation = useMemo(() => validateFlow(present, (present.sections ?? {}) as SectionLibrary), [present]);

  // The copy in localStorage follows every edit until the server has it.
  useEffect(() => {
    if (unsaved || conflict) writeWorkingCopy(flowId, { baseRevision: base.revision, definition: present });
    else forgetWorkingCopy(flowId);
  }, [flowId, present, base.revision, unsaved, conflict]);

  function saveNow(definition: DraftDefinition, revision: number): Promise<number | null> {
    if (inFlight.current) return inFlight.current.done;
    setFailure(null);
    const attempt = save.mutateAsync({ revision, definition }).then(
      (saved) => {
        setBase({ revision: saved.revision, definition });
        return saved.revision;
      },
      (error: unknown) => {
        const theirs = staleDraftOf(error);
        if (theirs) setConflict(theirs);
        else setFailure(failureWords(error));
        return null;
      },
    );
    const done = attempt.finally(() => {
      inFlight.current = null;
    });
    inFlight.current = { definition, done };
    return done;
  }

  /** Saves what is unsaved, waiting for a save already on its way; the revision the server then holds. */
  async function flush(): Promise<number | null> {
    if (conflict) return null;
    const pending = inFlight.current;
    if (pending) {
      const revision = await pending.done;
      if (revision === null || sameValue(pending.definition, present)) return revision;
      return saveNow(present, revision);
    }
    return unsaved ? saveNow(present, base.revision) : base.revision;
  }

  const autoSave = useEffectEvent(() => void saveNow(present, base.revision));
  useEffect(() => {
    if (!unsaved || conflict || save.isPending) return;
    const timer = setTimeout(autoSave, failure ? RETRY_MS : AUTOSAVE_MS);
    return () => clearTimeout(timer);
  }, [present, unsaved, conflict, save.isPending, failure]);

  const status: SaveStatus = conflict ? "conflict" : save.isPending ? "saving" : failure ? "failed" : unsaved ? "unsaved" : "saved";

  return {
    definition: present,
    generation: history.generation,
    validation,
    status,
    failure,
    conflict,
    restored: opening.restored,
    revision: base.revision,
    canUndo: history.past.length > 0,
    canRedo: history.future.length > 0,
    /** An edit from the open form; `key` names the field so keystrokes merge into one undo. */
    type: (update: Update, key: string) => dispatch({ type: "type", update, key, at: Date.now() }),
    /** Any other edit: the open form reloads from the draft. */
    replace: (update: Update) => dispatch({ type: "replace", update }),
    undo: () => dispatch({ type: "undo" }),
    redo: () => dispatch({ type: "redo" }),
    save: () => (conflict ? Promise.resolve(null) : saveNow(present, base.revision)),
    flush,
    /** Discard mine: their draft becomes the working copy (undo can still bring mine back). */
    loadTheirs: () => {
      if (!conflict) return;
      const theirs = conflict.definition;
      dispatch({ type: "replace", update: () => theirs });
      setBase({ revision: conflict.revision, definition: conflict.definition });
      setConflict(null);
      setFailure(null);
    },
    /** Keep mine: save it on top of their revision. */
    keepMine: () => {
      if (!conflict) return;
      setBase({ revision: conflict.revision, definition: conflict.definition });
      setConflict(null);
      void saveNow(present, conflict.revision);
    },
  };
}

export type DraftEditor = ReturnType<typeof useDraftEditor>;
