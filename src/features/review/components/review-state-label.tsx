import { reviewStateWords, type ReviewState, type SessionStatus } from "../lib/review-words.ts";

type Shape = "waiting" | "signed" | "back" | "open" | "stopped";

function shapeOf(state: ReviewState, status: SessionStatus): Shape {
  if (state === "waiting") return "waiting";
  if (state === "approved") return "signed";
  if (state === "returned") return "back";
  return status === "abandoned" ? "stopped" : "open";
}

/** Where a session stands for review: a word with its own shape, never colour alone. */
export function ReviewStateLabel({ state, status }: { state: ReviewState; status: SessionStatus }) {
  return (
    <span className="inline-flex items-center gap-2 rounded-full border-2 border-line-strong bg-raised py-0.5 pr-3 pl-1.5 font-semibold">
      <StateShape shape={shapeOf(state, status)} />
      {reviewStateWords(state, status)}
    </span>
  );
}

function StateShape({ shape }: { shape: Shape }) {
  const common = { viewBox: "0 0 24 24", className: "size-6 shrink-0", "aria-hidden": true, focusable: false } as const;
  switch (shape) {
    case "waiting":
      // An hourglass: it sits until the shop lead picks it up.
      return (
        <svg {...common}>
          <path d="M7 4h10M7 20h10M8 4c0 5 8 5 8 8s-8 3-8 8M16 4c0 5-8 5-8 8s8 3 8 8" fill="none" strokeWidth="2.2" strokeLinecap="round" className="stroke-ink" />
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
