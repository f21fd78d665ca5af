import { describe, expect, it } from "vitest";
import { allowedMoves, canMove, failedChecks, needsPassedTestRun, testRunCheckIds, testRunPassed, type TestRunChecks } from "../../../shared/work-orders/moves.ts";
import { workOrderStates, type WorkOrderState } from "../../../shared/schemas/work-orders.ts";

const allPass: TestRunChecks = { throttleReturns: true, stopSwitchStops: true, steadyIdle: true, attachmentStillAtIdle: true, runsUnderLoad: true };

describe("board moves", () => {
  it("lets a ticket follow the shop's usual road from intake to pick-up", () => {
    // Common practice (no published source): diagnosis, estimate, approval, parts, repair, test run, pick-up.
    const road: WorkOrderState[] = ["waiting_for_diagnosis", "diagnosing", "waiting_for_approval", "approved", "waiting_for_parts", "in_repair", "test_run", "ready_for_pickup", "picked_up"];
    for (let i = 1; i < road.length; i += 1) expect(canMove(road[i - 1]!, road[i]!), `${road[i - 1]} → ${road[i]}`).toBe(true);
  });

  it("sends a declined unit back unrepaired, and a failed test run back to the bench", () => {
    expect(canMove("waiting_for_approval", "declined")).toBe(true);
    expect(canMove("declined", "ready_for_pickup")).toBe(true);
    expect(canMove("declined", "in_repair")).toBe(false);
    expect(canMove("test_run", "in_repair")).toBe(true);
  });

  it("refuses skipping the estimate, repairing before approval, and anything after pick-up", () => {
    expect(canMove("waiting_for_diagnosis", "in_repair")).toBe(false);
    expect(canMove("diagnosing", "approved")).toBe(false);
    expect(canMove("waiting_for_approval", "in_repair")).toBe(false);
    expect(canMove("in_repair", "ready_for_pickup")).toBe(false);
    for (const to of workOrderStates) expect(canMove("picked_up", to)).toBe(false);
  });

  it("never offers staying put, and names only real states", () => {
    for (const from of workOrderStates) {
      expect(allowedMoves[from]).not.toContain(from);
      for (const to of allowedMoves[from]) expect(workOrderStates).toContain(to);
    }
  });

  it("gates only test run → ready for pick-up on a passed test run", () => {
    expect(needsPassedTestRun("test_run", "ready_for_pickup")).toBe(true);
    expect(needsPassedTestRun("waiting_for_approval", "ready_for_pickup")).toBe(false);
    expect(needsPassedTestRun("declined", "ready_for_pickup")).toBe(false);
    expect(needsPassedTestRun("test_run", "in_repair")).toBe(false);
  });
});

describe("test run", () => {
  it("passes only when all five checks pass", () => {
    // Common practice (no published source): the test-run list after a repair — throttle, stop switch, idle, attachment still at idle, under load.
    expect(testRunCheckIds).toHaveLength(5);
    expect(testRunPassed(allPass)).toBe(true);
    for (const id of testRunCheckIds) {
      expect(testRunPassed({ ...allPass, [id]: false })).toBe(false);
      expect(failedChecks({ ...allPass, [id]: false })).toEqual([id]);
    }
    expect(failedChecks(allPass)).toEqual([]);
  });
});
