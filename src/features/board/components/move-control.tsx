import { useId, useState } from "react";
import { allowedMoves } from "../../../../shared/work-orders/moves.ts";
import type { WorkOrderState } from "../../../../shared/schemas/work-orders.ts";
import { Button } from "../../../components/ui/button.tsx";
import { stateLabel } from "../lib/board-words.ts";

interface MoveControlProps {
  number: string;
  state: WorkOrderState;
  busy: boolean;
  onMove: (to: WorkOrderState) => void;
}

/** "Move to…" opens the next states this ticket may take, each a big button: one tap to choose, no dragging. */
export function MoveControl({ number, state, busy, onMove }: MoveControlProps) {
  const [open, setOpen] = useState(false);
  const groupId = useId();
  const next = allowedMoves[state];
  if (next.length === 0) return null;
  if (!open)
    return (
      <Button aria-expanded={false} aria-controls={groupId} onClick={() => setOpen(true)} disabled={busy} className="w-full">
        {busy ? "Moving…" : "Move to…"}
      </Button>
    );
  return (
    <div id={groupId} role="group" aria-label={`Move ${number} to`} className="flex flex-col gap-2 rounded-lg border-2 border-accent bg-accent-soft p-2">
      <p className="px-1 font-semibold">Move {number} to</p>
      {next.map((to) => (
        <button
          key={to}
          type="button"
          disabled={busy}
          onClick={() => {
            setOpen(false);
            onMove(to);
          }}
          className="flex min-h-12 items-center gap-2 rounded-lg border-2 border-line-strong bg-raised px-3 text-left font-semibold disabled:border-dashed disabled:text-ink-muted"
        >
          <ArrowGlyph />
          {stateLabel(to)}
        </button>
      ))}
      <Button variant="quiet" onClick={() => setOpen(false)}>
        Cancel
      </Button>
    </div>
  );
}

function ArrowGlyph() {
  return (
    <svg viewBox="0 0 24 24" className="size-6 shrink-0" aria-hidden="true" focusable="false">
      <path d="M4 12h14M13 6l6 6-6 6" fill="none" strokeWidth="2.6" strokeLinecap="round" strokeLinejoin="round" className="stroke-accent" />
    </svg>
  );
}
