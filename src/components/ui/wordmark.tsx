/** Benchpath's mark: a path that steps down a bench and ends at a found fault. */
export function BenchpathMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <rect width="32" height="32" rx="7" className="fill-accent" />
      <path
        d="M7 10h8v12h6"
        fill="none"
        strokeWidth="3.2"
        strokeLinecap="round"
        strokeLinejoin="round"
        className="stroke-accent-ink"
      />
      <circle cx="24.5" cy="22" r="3.2" className="fill-accent-ink" />
    </svg>
  );
}

export function Wordmark({ className }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 font-semibold tracking-tight text-ink ${className ?? ""}`}>
      <BenchpathMark className="size-[1.4em] shrink-0" />
      <span>Benchpath</span>
    </span>
  );
}
