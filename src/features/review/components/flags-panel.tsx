import type { SessionFlagsResponse } from "../../../../shared/schemas/review.ts";
import { Button } from "../../../components/ui/button.tsx";
import { flagWords } from "../lib/review-words.ts";
import { FlagGlyph } from "./flag-mark.tsx";

interface FlagsPanelProps {
  flags: SessionFlagsResponse["flags"] | undefined;
  failed: string | null;
  /** The step's entry in the timeline, or null when the step is not in it. */
  anchorOf: (stepId: string) => string | null;
}

/** What the log itself says to look at twice, before the step-by-step account. */
export function FlagsPanel({ flags, failed, anchorOf }: FlagsPanelProps) {
  const show = (anchor: string) => document.getElementById(anchor)?.focus();
  return (
    <section aria-labelledby="flags-title" className="flex flex-col gap-3">
      <h2 id="flags-title" className="flex items-center gap-2 text-2xl font-semibold">
        <FlagGlyph raised={(flags?.length ?? 0) > 0} className="size-8" />
        {flags ? `Flags (${flags.length})` : "Flags"}
      </h2>
      {failed !== null ? (
        <p>The flags did not load: {failed}</p>
      ) : !flags ? (
        <p className="text-ink-muted">Loading the flags…</p>
      ) : flags.length === 0 ? (
        <p>No flags: nothing in this log asks for a second look.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {flags.map((flag) => {
            const anchor = flag.stepId === null ? null : anchorOf(flag.stepId);
            return (
              <li key={`${flag.code}-${flag.stepId ?? ""}`} className="flex flex-col gap-2 rounded-xl border-2 border-ink bg-raised px-5 py-4 landscape:flex-row landscape:items-center landscape:justify-between">
                <div className="flex flex-col gap-1">
                  <p className="text-lg font-semibold">{flagWords[flag.code]}</p>
                  <p className="max-w-[70ch]">{flag.reason}</p>
                </div>
                {anchor && (
                  <Button onClick={() => show(anchor)} className="shrink-0">
                    Show the step
                  </Button>
                )}
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
