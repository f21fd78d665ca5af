/** A plus for actions that add something, e.g. checking in a new unit. */
export function PlusGlyph({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 24 24" className={className ?? "size-7 shrink-0"} aria-hidden="true" focusable="false">
      <path d="M12 5v14M5 12h14" fill="none" strokeWidth="3" strokeLinecap="round" className="stroke-current" />
    </svg>
  );
}
