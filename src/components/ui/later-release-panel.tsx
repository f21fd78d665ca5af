/** The honest stand-in for an area whose screens are not built yet. */
export function LaterReleasePanel({ title, summary }: { title: string; summary: string }) {
  return (
    <div className="flex max-w-[70ch] flex-col gap-5">
      <h1 className="text-step font-semibold">{title}</h1>
      <section
        aria-label="Coming in a later release"
        className="flex flex-col gap-3 rounded-xl border-2 border-dashed border-line-strong bg-raised px-6 py-5"
      >
        <p className="flex items-center gap-3 text-lg font-semibold">
          <svg viewBox="0 0 24 24" className="size-7 shrink-0" aria-hidden="true" focusable="false">
            <circle cx="12" cy="12" r="10" fill="none" strokeWidth="2.4" className="stroke-ink-muted" />
            <path d="M12 6.5V12l3.8 2.4" fill="none" strokeWidth="2.4" strokeLinecap="round" className="stroke-ink-muted" />
          </svg>
          Coming in a later release
        </p>
        <p>{summary}</p>
      </section>
    </div>
  );
}
