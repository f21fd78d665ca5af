import type { Verdict } from "../../../shared/flow/schema.ts";

export const verdictWords: Record<Verdict, string> = {
  good: "Good",
  marginal: "Marginal",
  low: "Low",
  high: "High",
  implausible: "Not believable",
};

// Each verdict has its own shape, so it reads in black and white and without colour.
const shapes: Record<Verdict, React.JSX.Element> = {
  good: <path d="M7 12.5l3.2 3.2L17 9" fill="none" strokeWidth="2.8" strokeLinecap="round" strokeLinejoin="round" className="stroke-accent-ink" />,
  marginal: <path d="M7 12h10" strokeWidth="3" strokeLinecap="round" className="stroke-accent-ink" />,
  low: <path d="M12 6.5v10M7.5 12.5l4.5 4.5 4.5-4.5" fill="none" strokeWidth="2.8" strokeLinecap="round" strokeLinejoin="round" className="stroke-accent-ink" />,
  high: <path d="M12 17.5v-10M7.5 11.5L12 7l4.5 4.5" fill="none" strokeWidth="2.8" strokeLinecap="round" strokeLinejoin="round" className="stroke-accent-ink" />,
  implausible: <path d="M9.3 9.2a2.8 2.8 0 115 1.7c-.9.8-2.3 1.3-2.3 2.8M12 16.8v.4" fill="none" strokeWidth="2.6" strokeLinecap="round" className="stroke-accent-ink" />,
};

/** The verdict as a word beside its glyph. */
export function VerdictMark({ verdict, size = "large" }: { verdict: Verdict; size?: "large" | "small" }) {
  const good = verdict === "good";
  return (
    <span className={`inline-flex items-center gap-2 font-semibold ${size === "large" ? "text-2xl" : "text-lg"}`}>
      <svg viewBox="0 0 24 24" className={size === "large" ? "size-9 shrink-0" : "size-7 shrink-0"} aria-hidden="true" focusable="false">
        {good ? <circle cx="12" cy="12" r="11" className="fill-accent" /> : <rect x="1" y="1" width="22" height="22" rx="4" className="fill-ink" />}
        {shapes[verdict]}
      </svg>
      {verdictWords[verdict]}
    </span>
  );
}
