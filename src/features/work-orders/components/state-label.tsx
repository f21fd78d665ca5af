import { workOrderStateLabels, type WorkOrderState } from "../../../../shared/schemas/work-orders.ts";

type Shape = "waiting" | "working" | "yes" | "no" | "ready" | "gone";

const shapes: Record<WorkOrderState, Shape> = {
  waiting_for_diagnosis: "waiting",
  diagnosing: "working",
  waiting_for_approval: "waiting",
  approved: "yes",
  declined: "no",
  waiting_for_parts: "waiting",
  in_repair: "working",
  test_run: "working",
  ready_for_pickup: "ready",
  picked_up: "gone",
};

/** A work order's state as a word with a shape beside it, so it never rests on colour. */
export function StateLabel({ state }: { state: WorkOrderState }) {
  return (
    <span className="inline-flex items-center gap-2 rounded-full border-2 border-line-strong bg-raised py-0.5 pr-3 pl-1.5 font-semibold whitespace-nowrap">
      <StateShape shape={shapes[state]} />
      {workOrderStateLabels[state]}
    </span>
  );
}

function StateShape({ shape }: { shape: Shape }) {
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
  }
}
