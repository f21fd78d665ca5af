import { useState } from "react";
import { diffFlows } from "../../../../shared/flow/diff.ts";
import { Button } from "../../../components/ui/button.tsx";
import type { DraftDefinition } from "../api/save-draft.ts";
import { personName, timeInWords } from "../lib/flow-words.ts";
import type { Conflict } from "../lib/use-draft-editor.ts";
import { FlowComparison } from "./flow-comparison.tsx";

interface ConflictPanelProps {
  conflict: Conflict;
  mine: DraftDefinition;
  onLoadTheirs: () => void;
  onKeepMine: () => void;
}

/** Another save reached the server first: mine is kept here until the author chooses. */
export function ConflictPanel({ conflict, mine, onLoadTheirs, onKeepMine }: ConflictPanelProps) {
  const [comparing, setComparing] = useState(false);
  return (
    <section aria-labelledby="conflict-title" className="flex flex-col gap-3 rounded-xl border-2 border-problem bg-problem-soft px-5 py-4">
      <h2 id="conflict-title" className="text-xl font-semibold">
        {personName(conflict.updatedBy)} saved this draft while you were editing
      </h2>
      <p>
        Their save ({timeInWords(conflict.updatedAt)}) reached the server first, so yours was not saved. Your changes are still here and on this computer. Choose whose
        draft to keep.
      </p>
      <div className="flex flex-wrap gap-3">
        <Button onClick={onLoadTheirs}>Load theirs (discard mine)</Button>
        <Button aria-expanded={comparing} onClick={() => setComparing(!comparing)}>
          {comparing ? "Hide the comparison" : "Compare"}
        </Button>
        <Button variant="primary" onClick={onKeepMine}>
          Keep mine (save over theirs)
        </Button>
      </div>
      {comparing && (
        <div className="rounded-lg border-2 border-line bg-raised px-4 py-3">
          <p className="mb-3 text-base text-ink-muted">What mine changes, compared with theirs:</p>
          <FlowComparison diff={diffFlows(conflict.definition, mine)} />
        </div>
      )}
    </section>
  );
}
