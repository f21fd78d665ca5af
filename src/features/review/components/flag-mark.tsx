import { flagCountWords } from "../lib/review-words.ts";

/** A pennant on its pole, drawn filled when there is something to look at. */
export function FlagGlyph({ raised, className = "size-6" }: { raised: boolean; className?: string }) {
  return (
    <svg viewBox="0 0 24 24" className={`${className} shrink-0`} aria-hidden="true" focusable="false">
      <path d="M6 21V4" strokeWidth="2.4" strokeLinecap="round" className="stroke-ink" />
      <path d="M6 4.5h11l-3 4 3 4H6" strokeWidth="2" strokeLinejoin="round" className={raised ? "fill-ink stroke-ink" : "fill-none stroke-ink-muted"} />
    </svg>
  );
}

/** The flag count as a word beside the glyph; a flagged session gets a bold, boxed mark. */
export function FlagCount({ count }: { count: number }) {
  if (count === 0) {
    return (
      <span className="inline-flex items-center gap-2 text-ink-muted">
        <FlagGlyph raised={false} />
        {flagCountWords(0)}
      </span>
    );
  }
  return (
    <span className="inline-flex items-center gap-2 rounded-md border-2 border-ink px-2 font-semibold">
      <FlagGlyph raised />
      {flagCountWords(count)}
    </span>
  );
}
