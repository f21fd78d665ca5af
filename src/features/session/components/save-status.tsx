import type { SaveState } from "../lib/use-session-runner.ts";

const words = (state: SaveState) => {
  if (state.kind === "saved") return "Saved";
  if (state.kind === "saving") return "Saving…";
  const answerCount = state.count - state.photos;
  const parts = [];
  if (answerCount > 0) parts.push(answerCount === 1 ? "1 answer" : `${answerCount} answers`);
  if (state.photos > 0) parts.push(state.photos === 1 ? "1 photo" : `${state.photos} photos`);
  return `Waiting for the connection (${parts.join(" and ")} kept on this tablet)`;
};

/** Always there and quiet: a shape and a word for each state, never colour alone. */
export function SaveStatus({ state }: { state: SaveState }) {
  return (
    <p
      role="status"
      aria-live="polite"
      // Waiting is the one state the tech must notice: it stands out by a frame and weight, not colour alone.
      className={`flex min-h-12 shrink-0 items-center gap-2 text-base ${state.kind === "waiting" ? "rounded-lg border-2 border-ink bg-sunken px-3 font-semibold text-ink" : "text-ink-muted"}`}
      data-save-state={state.kind}
    >
      <svg viewBox="0 0 20 20" className="size-5 shrink-0" aria-hidden="true" focusable="false">
        {state.kind === "saved" && <path d="M4 10.5l4 4L16 6" fill="none" strokeWidth="2.6" strokeLinecap="round" className="stroke-accent" />}
        {state.kind === "saving" && <circle cx="10" cy="10" r="7" fill="none" strokeWidth="2.4" strokeDasharray="22 44" className="stroke-ink-muted" />}
        {state.kind === "waiting" && (
          <>
            <rect x="3" y="3" width="14" height="14" rx="2" fill="none" strokeWidth="2.2" className="stroke-ink-muted" />
            <path d="M7 7v6M13 7v6" strokeWidth="2.4" className="stroke-ink-muted" />
          </>
        )}
      </svg>
      <span>{words(state)}</span>
    </p>
  );
}
