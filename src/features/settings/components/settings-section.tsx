import type { ReactNode } from "react";

export function SettingsSection({ id, title, summary, children }: { id: string; title: string; summary?: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-5 rounded-xl border-2 border-line bg-raised px-5 py-5">
      <div className="flex flex-col gap-1">
        <h2 id={id} className="text-2xl font-semibold">
          {title}
        </h2>
        {summary && <p className="max-w-[65ch] text-ink-muted">{summary}</p>}
      </div>
      {children}
    </section>
  );
}
