// Which state a work order may be moved to from the board, and the test run that closes a repair.
import type { WorkOrderState } from "../schemas/work-orders.ts";

/**
 * The moves a person may make by hand. The bench also moves a ticket on its own (starting a check
 * makes it diagnosing, finishing one makes it waiting for approval); those go through the same
 * history but are not limited by this table.
 */
export const allowedMoves: Record<WorkOrderState, readonly WorkOrderState[]> = {
  waiting_for_diagnosis: ["diagnosing"],
  // Back to the queue when the tech is pulled off it before a finding.
  diagnosing: ["waiting_for_approval", "waiting_for_diagnosis"],
  // Nothing to repair (the fault was cleared during diagnosis): the unit can go straight back.
  waiting_for_approval: ["approved", "declined", "ready_for_pickup"],
  approved: ["waiting_for_parts", "in_repair"],
  // The customer may change their mind before collecting; otherwise the unit goes back unrepaired.
  declined: ["ready_for_pickup", "approved"],
  waiting_for_parts: ["in_repair"],
  // A part turns out to be missing mid-repair, or the job will go over the estimate and needs a new approval.
  in_repair: ["test_run", "waiting_for_parts", "waiting_for_approval"],
  // A failed test run sends it back to the bench; a passed one (see testRunGate) lets it go out.
  test_run: ["in_repair", "ready_for_pickup"],
  ready_for_pickup: ["picked_up"],
  // Gone home: a comeback is a new work order linked to this one, not a move back.
  picked_up: [],
};

export function canMove(from: WorkOrderState, to: WorkOrderState): boolean {
  return allowedMoves[from].includes(to);
}

/** The test run's five checks, in the order they are done after a repair. */
export const testRunCheckIds = ["throttleReturns", "stopSwitchStops", "steadyIdle", "attachmentStillAtIdle", "runsUnderLoad"] as const;
export type TestRunCheckId = (typeof testRunCheckIds)[number];

export const testRunCheckQuestions: Record<TestRunCheckId, string> = {
  throttleReturns: "Does the throttle return to idle freely when let go?",
  stopSwitchStops: "Does the stop switch stop the engine?",
  steadyIdle: "Does the engine idle steadily without stalling?",
  attachmentStillAtIdle: "Does the cutting attachment stay still at idle?",
  runsUnderLoad: "Does it run under load without bogging or dying?",
};

export type TestRunChecks = Record<TestRunCheckId, boolean>;

/** A test run passes only when every check does. */
export function testRunPassed(checks: TestRunChecks): boolean {
  return testRunCheckIds.every((id) => checks[id]);
}

export function failedChecks(checks: Partial<Record<string, boolean>>): TestRunCheckId[] {
  return testRunCheckIds.filter((id) => checks[id] !== true);
}

/**
 * Leaving test run for ready for pick-up needs a passed test run recorded since the ticket last
 * entered test run: an older pass belongs to a repair that was reopened since.
 */
export function needsPassedTestRun(from: WorkOrderState, to: WorkOrderState): boolean {
  return from === "test_run" && to === "ready_for_pickup";
}
