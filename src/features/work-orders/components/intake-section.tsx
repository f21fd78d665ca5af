import type { ReactNode } from "react";

/** One part of the intake form, with a heading a reader can jump to. */
export function IntakeSection({ id, title, intro, children }: { id: string; title: string; intro?: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-5 rounded-xl border-2 border-line bg-raised/60 px-5 py-5">
      <div className="flex flex-col gap-1">
        <h2 id={id} className="text-2xl font-semibold">
          {title}
        </h2>
        {intro && <p className="max-w-[65ch] text-ink-muted">{intro}</p>}
      </div>
      {children}
    </section>
  );
}

/** Two answers side by side when the tablet is on its side, stacked when it stands up. */
export function FieldPair({ children }: { children: ReactNode }) {
  return <div className="grid gap-5 landscape:grid-cols-2">{children}</div>;
}
