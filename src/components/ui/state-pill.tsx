import type { ReactNode } from "react";

/** The shapes a state may wear; each state label picks one, so a state never rests on colour alone. */
export type StateShape = "waiting" | "working" | "yes" | "no" | "ready" | "gone" | "signed" | "back" | "open" | "stopped";

/** A state's words in a rounded pill with its shape in front. */
export function StatePill({ shape, className = "", children }: { shape: StateShape; className?: string; children: ReactNode }) {
  return (
    <span className={`inline-flex items-center gap-2 rounded-full border-2 border-line-strong bg-raised py-0.5 pr-3 pl-1.5 font-semibold ${className}`}>
      <StateGlyph shape={shape} />
      {children}
    </span>
  );
}

function StateGlyph({ shape }: { shape: StateShape }) {
  const common = { viewBox: "0 0 24 24", className: "size-6 shrink-0", "aria-hidden": true, focusable: false } as const;
  switch (shape) {
    case "waiting":
      // An hourglass: it sits until someone picks it up.
      return (
        <svg {...common}>
          <path d="M7 4h10M7 20h10M8 4c0 5 8 5 8 8s-8 3-8 8M16 4c0 5-8 5-8 8s8 3 8 8" fill="none" strokeWidth="2.2" strokeLinecap="round" className="stroke-ink" />
        </svg>
      );
    case "working":
      return (
        <svg {...common}>
          <circle cx="12" cy="12" r="8" className="fill-accent" />
          <circle cx="12" cy="12" r="3" className="fill-accent-ink" />
        </svg>
      );
    case "yes":
      return (
        <svg {...common}>
          <path d="M5 12.5l4.5 4.5L19 7.5" fill="none" strokeWidth="3" strokeLinecap="round" strokeLinejoin="round" className="stroke-accent" />
        </svg>
      );
    case "no":
      return (
        <svg {...common}>
          <path d="M6.5 6.5l11 11M17.5 6.5l-11 11" fill="none" strokeWidth="3" strokeLinecap="round" className="stroke-ink" />
        </svg>
      );
    case "ready":
      return (
        <svg {...common}>
          <rect x="4" y="4" width="16" height="16" rx="2" className="fill-accent" />
          <path d="M8 12.5l3 3 5-6" fill="none" strokeWidth="2.6" strokeLinecap="round" strokeLinejoin="round" className="stroke-accent-ink" />
        </svg>
      );
    case "gone":
      return (
        <svg {...common}>
          <rect x="4" y="4" width="16" height="16" rx="2" fill="none" strokeWidth="2.2" className="stroke-ink-muted" />
        </svg>
      );
    case "signed":
      return (
        <svg {...common}>
          <circle cx="12" cy="12" r="10" className="fill-accent" />
          <path d="M7 12.5l3.2 3.2L17 9" fill="none" strokeWidth="2.8" strokeLinecap="round" strokeLinejoin="round" className="stroke-accent-ink" />
        </svg>
      );
    case "back":
      // A hooked arrow pointing back to the bench.
      return (
        <svg {...common}>
          <path d="M9 7L4.5 11.5 9 16M5 11.5h9a5 5 0 010 10h-2" fill="none" strokeWidth="2.4" strokeLinecap="round" strokeLinejoin="round" className="stroke-ink" />
        </svg>
      );
    case "open":
      return (
        <svg {...common}>
          <circle cx="12" cy="12" r="8" fill="none" strokeWidth="2.4" className="stroke-ink" />
          <circle cx="12" cy="12" r="3" className="fill-ink" />
        </svg>
      );
    case "stopped":
      return (
        <svg {...common}>
          <path d="M6.5 6.5l11 11M17.5 6.5l-11 11" fill="none" strokeWidth="3" strokeLinecap="round" className="stroke-ink-muted" />
        </svg>
      );
  }
}
