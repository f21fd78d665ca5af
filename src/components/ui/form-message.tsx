import type { ReactNode } from "react";
import { ProblemGlyph } from "./problem-glyph.tsx";

/** A problem with the whole form (not one field), announced as soon as it appears. */
export function FormProblem({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div role="alert" className="flex gap-3 rounded-lg border-2 border-problem bg-problem-soft px-4 py-3 text-ink">
      <ProblemGlyph className="mt-0.5 size-7 shrink-0" />
      <div className="flex flex-col gap-1">
        <p className="font-semibold">{title}</p>
        {children && <div>{children}</div>}
      </div>
    </div>
  );
}
