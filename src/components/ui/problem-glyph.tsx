/** A diamond with an exclamation: marks a problem by shape as well as colour. */
export function ProblemGlyph({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 24 24" className={className ?? "size-6 shrink-0"} aria-hidden="true" focusable="false">
      <path d="M12 1.5L22.5 12 12 22.5 1.5 12z" className="fill-problem" />
      <rect x="10.7" y="6.5" width="2.6" height="7.5" rx="0.5" className="fill-problem-soft" />
      <circle cx="12" cy="17" r="1.5" className="fill-problem-soft" />
    </svg>
  );
}
