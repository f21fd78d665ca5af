// What happens to a work order once its check has found something: the estimate, the customer's
// answer, parts, the repair and its test run, and the unit going home.
import type { WorkOrderState } from "../../../shared/schemas/work-orders.ts";
import type { FlowGuide } from "./history-guide.ts";
import { nothingToRepair } from "./history-findings.ts";
import type { Random } from "./random.ts";

export interface StateChange {
  to: WorkOrderState;
  at: number;
  by: string;
}

const HOUR = 3_600_000;

export function afterDiagnosis(target: string, guide: FlowGuide, completedAt: number, by: string, rng: Random): StateChange[] {
  const changes: StateChange[] = [];
  let at = completedAt;
  const next = (to: WorkOrderState, lo: number, hi: number) => changes.push({ to, at: (at += rng.between(lo, hi) * HOUR), by });
  if (nothingToRepair.has(guide.key(guide.flow.steps[target]!))) {
    next("ready_for_pickup", 0.5, 4);
    next("picked_up", 6, 96);
    return changes;
  }
  if (rng.chance(0.15)) {
    next("declined", 2, 72);
    next("ready_for_pickup", 0.5, 6);
    next("picked_up", 6, 120);
    return changes;
  }
  next("approved", 2, 96);
  if (rng.chance(0.35)) {
    next("waiting_for_parts", 0.2, 3);
    next("in_repair", 72, 240);
  } else next("in_repair", 4, 72);
  next("test_run", 0.5, 5);
  next("ready_for_pickup", 0.3, 2);
  next("picked_up", 12, 168);
  return changes;
}
