import type { ReactNode } from "react";
import { Link } from "react-router";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { PlusGlyph } from "../../../components/ui/plus-glyph.tsx";
import { BenchSessions } from "./bench-sessions.tsx";

/** The apprentice's first screen: carry on with their own checks, check a unit in, or pick up one that is waiting. */
export function BenchHome({ waiting }: { waiting: ReactNode }) {
  return (
    <div className="flex max-w-5xl flex-col gap-8">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div className="flex flex-col gap-1">
          <h1 className="text-step font-semibold">Bench</h1>
          <p className="max-w-[60ch] text-ink-muted">Carry on with your checks, check in the unit in front of you, or open one that is waiting and start its check.</p>
        </div>
        <div className="flex flex-wrap gap-3">
          <Link to="/bench/calculators" className={buttonClasses({ size: "main" })}>
            Bench calculators
          </Link>
          <Link to="/work-orders/new" className={`${buttonClasses({ variant: "primary", size: "main" })} min-w-64`}>
            <PlusGlyph />
            Check in a unit
          </Link>
        </div>
      </div>
      <BenchSessions />
      {waiting}
    </div>
  );
}
