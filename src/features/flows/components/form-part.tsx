import { useId, type ReactNode } from "react";

/** A titled part of a step's form. */
export function FormPart({ title, intro, children }: { title: string; intro?: string; children: ReactNode }) {
  const id = useId();
  return (
    <section aria-labelledby={id} className="flex flex-col gap-4">
      <div className="flex flex-col gap-1">
        <h3 id={id} className="text-xl font-semibold">
          {title}
        </h3>
        {intro && <p className="max-w-[65ch] text-base text-ink-muted">{intro}</p>}
      </div>
      {children}
    </section>
  );
}
