import { useState } from "react";
import { buttonClasses, Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { useDiscardDraft } from "../api/discard-draft.ts";
import { exportFileName, exportHref } from "../api/export-flow.ts";
import { countInWords } from "../lib/flow-words.ts";
import type { DraftEditor } from "../lib/use-draft-editor.ts";
import { PublishDialog } from "./publish-dialog.tsx";
import { SaveStatusLine } from "./save-status.tsx";

interface DraftToolbarProps {
  flowId: string;
  /** The number publishing would give the draft. */
  nextVersion: number;
  editor: DraftEditor;
  errorCount: number;
  onUndo: () => void;
  onRedo: () => void;
  onPublished: (version: number) => void;
}

/** Saving, undo and redo, publishing, export and discarding: what acts on the whole draft. */
export function DraftToolbar({ flowId, nextVersion, editor, errorCount, onUndo, onRedo, onPublished }: DraftToolbarProps) {
  const [publishing, setPublishing] = useState(false);
  const [discarding, setDiscarding] = useState(false);
  const discard = useDiscardDraft(flowId);
  const { status } = editor;
  const publishBlocked =
    errorCount > 0 ? `Publishing needs a draft without errors: ${countInWords(errorCount, "error")} to fix.` : status === "conflict" ? "Choose whose draft to keep before publishing." : null;

  return (
    <div className="flex flex-col gap-3 rounded-xl border-2 border-line bg-raised px-4 py-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <SaveStatusLine status={status} failure={editor.failure} />
        <div className="flex flex-wrap gap-2">
          <Button onClick={() => void editor.save()} disabled={status === "saved" || status === "saving" || status === "conflict"}>
            Save
          </Button>
          <Button onClick={onUndo} disabled={!editor.canUndo} aria-keyshortcuts="Control+Z Meta+Z">
            Undo
          </Button>
          <Button onClick={onRedo} disabled={!editor.canRedo} aria-keyshortcuts="Control+Shift+Z Meta+Shift+Z Control+Y">
            Redo
          </Button>
        </div>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Button variant="primary" disabled={publishBlocked !== null} aria-describedby={publishBlocked ? "publish-blocked" : undefined} onClick={() => setPublishing(true)}>
          Publish…
        </Button>
        {publishBlocked && (
          <p id="publish-blocked" className="text-base font-semibold text-problem">
            {publishBlocked}
          </p>
        )}
        <a className={buttonClasses({ variant: "quiet" })} href={exportHref(flowId, "draft")} download={exportFileName(flowId, "draft")}>
          Export the saved draft
        </a>
        <Button variant="quiet" onClick={() => setDiscarding(true)}>
          Discard the draft…
        </Button>
      </div>
      {discarding && (
        <div role="alert" className="flex flex-col gap-3 rounded-lg border-2 border-problem bg-problem-soft px-4 py-3">
          <p className="font-semibold">Discard this draft?</p>
          <p>Every change in it is lost, for everyone, and cannot be undone. Published versions stay as they are.</p>
          {discard.error && <FormProblem title="The draft was not discarded.">{discard.error.message}</FormProblem>}
          <div className="flex flex-wrap gap-3">
            <Button
              variant="primary"
              disabled={discard.isPending}
              onClick={() => discard.mutate()}
            >
              {discard.isPending ? "Discarding…" : "Discard the draft"}
            </Button>
            <Button onClick={() => setDiscarding(false)}>Keep it</Button>
          </div>
        </div>
      )}
      {publishing && (
        <PublishDialog
          flowId={flowId}
          nextVersion={nextVersion}
          flush={editor.flush}
          onClose={() => setPublishing(false)}
          onPublished={(version) => {
            setPublishing(false);
            onPublished(version);
          }}
        />
      )}
    </div>
  );
}
