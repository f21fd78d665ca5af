import type { BenchHomeResponse, BenchSession } from "../../../shared/schemas/sessions.ts";
import { json, type FakeRoute } from "../render-app.tsx";
import { answers } from "../work-orders/fakes.ts";

/** Today (the tablet's own day) at the given hour and minute. */
export function todayAt(hours: number, minutes: number, daysBack = 0): string {
  const at = new Date();
  at.setDate(at.getDate() - daysBack);
  at.setHours(hours, minutes, 0, 0);
  return at.toISOString();
}

export function buildBenchSession(overrides: Partial<BenchSession> = {}): BenchSession {
  return {
    sessionId: "se-1",
    workOrderId: "wo-1",
    workOrderNumber: 1042,
    unit: { equipmentKind: "string_trimmer", make: "Hollis", model: "TR-22" },
    flowTitle: "Handheld 2-stroke no-start",
    currentStepId: "spark/flash",
    currentStepTitle: "Watch the spark tester while you pull",
    reviewComment: null,
    startedAt: todayAt(8, 5),
    ...overrides,
  };
}

export function benchHomeAnswers(home: Partial<BenchHomeResponse>): FakeRoute {
  return answers("GET", "/api/bench/home", () => json({ open: [], waitingForReview: [], returned: [], ...home }));
}

/** No unit is waiting on the shelf: the bench's queue answers empty lists. */
export const emptyQueue: FakeRoute = answers("GET", "/api/work-orders", () => json({ workOrders: [] }));
