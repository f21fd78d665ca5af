import { workOrderStateLabels, type WorkOrderState } from "../../../shared/schemas/work-orders.ts";
import { StatePill, type StateShape } from "./state-pill.tsx";

const shapes: Record<WorkOrderState, StateShape> = {
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
export function WorkOrderStateLabel({ state }: { state: WorkOrderState }) {
  return (
    <StatePill shape={shapes[state]} className="whitespace-nowrap">
      {workOrderStateLabels[state]}
    </StatePill>
  );
}
