// The work-order board: tickets by state with their last move, moves by hand, and test runs.
import { and, desc, eq, gte, inArray, ne, sql } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { z } from "zod";
import type { AppContext } from "../context.ts";
import { customers, units, users, workOrders, workOrderStateHistory, workOrderTestRuns } from "../db/schema.ts";
import { conflict, notFound } from "../lib/errors.ts";
import { recordAudit } from "./audit.ts";
import { moveWorkOrder, summaryColumns } from "./work-orders.ts";
import { allowedMoves, canMove, needsPassedTestRun, testRunPassed } from "../../shared/work-orders/moves.ts";
import { workOrderStateLabels, workOrderStates, type WorkOrderState } from "../../shared/schemas/work-orders.ts";
import type { BoardResponse, BoardTicket, MoveWorkOrderRequest, MoveWorkOrderResponse } from "../../shared/schemas/board.ts";
import type { recordTestRunRequestSchema, TestRun } from "../../shared/schemas/test-runs.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

/** Picked-up tickets are history: the board shows only the latest few. */
export const PICKED_UP_SHOWN = 10;

// The summary's columns but the complaint; updatedAt stands in for a ticket with no history row.
const { complaint: _complaint, createdAt: _createdAt, ...ticketColumns } = summaryColumns;

/** Each work order's latest history row: when it entered its state and who moved it there. */
async function lastMoves(ctx: Pick<AppContext, "db">, ids: string[]) {
  if (ids.length === 0) return new Map<string, { at: Date; userId: string | null; userName: string | null }>();
  const rows = await ctx.db
    .selectDistinctOn([workOrderStateHistory.workOrderId], { workOrderId: workOrderStateHistory.workOrderId, at: workOrderStateHistory.at, userId: workOrderStateHistory.userId, userName: users.name })
    .from(workOrderStateHistory)
    .leftJoin(users, eq(users.id, workOrderStateHistory.userId))
    .where(inArray(workOrderStateHistory.workOrderId, ids))
    .orderBy(workOrderStateHistory.workOrderId, desc(workOrderStateHistory.at), desc(workOrderStateHistory.id));
  return new Map(rows.map((r) => [r.workOrderId, r]));
}

export async function getBoard(ctx: Pick<AppContext, "db">, now = new Date()): Promise<BoardResponse> {
  const base = () => ctx.db.select(ticketColumns).from(workOrders).innerJoin(customers, eq(customers.id, workOrders.customerId)).innerJoin(units, eq(units.id, workOrders.unitId));
  const open = await base().where(ne(workOrders.state, "picked_up")).orderBy(workOrders.updatedAt, workOrders.number);
  const gone = await base().where(eq(workOrders.state, "picked_up")).orderBy(desc(workOrders.updatedAt), desc(workOrders.number)).limit(PICKED_UP_SHOWN);
  const [{ n: pickedUp } = { n: 0 }] = await ctx.db.select({ n: sql<number>`count(*)::int` }).from(workOrders).where(eq(workOrders.state, "picked_up"));
  const rows = [...open, ...gone];
  const moves = await lastMoves(ctx, rows.map((r) => r.id));
  const tickets: BoardTicket[] = rows.map(({ updatedAt, ...r }) => {
    const move = moves.get(r.id);
    const movedAt = move?.at ?? updatedAt;
    return {
      ...r,
      movedAt: movedAt.toISOString(),
      movedBy: move?.userId ? { id: move.userId, name: move.userName ?? "Unknown" } : null,
      secondsInState: Math.max(0, Math.floor((now.getTime() - movedAt.getTime()) / 1000)),
    };
  });
  // Longest in its state first, so what is stuck is at the top of its column.
  tickets.sort((a, b) => b.secondsInState - a.secondsInState);
  return {
    at: now.toISOString(),
    columns: workOrderStates.map((state) => {
      const inState = tickets.filter((t) => t.state === state);
      if (state === "picked_up") inState.reverse();
      return { state, total: state === "picked_up" ? pickedUp : inState.length, tickets: inState };
    }),
  };
}

const label = (s: WorkOrderState) => workOrderStateLabels[s].toLowerCase();
const list = (items: string[]) => (items.length <= 1 ? (items[0] ?? "") : `${items.slice(0, -1).join(", ")} or ${items.at(-1)}`);

/** A move by hand: refused when the ticket has moved since the mover looked, when the board does not allow it, or before a passed test run. */
export async function moveByHand(ctx: Pick<AppContext, "db">, user: PublicUser, id: string, request: MoveWorkOrderRequest): Promise<MoveWorkOrderResponse> {
  return ctx.db.transaction(async (tx) => {
    const [wo] = await tx.select({ state: workOrders.state, number: workOrders.number }).from(workOrders).where(eq(workOrders.id, id)).for("update");
    if (!wo) throw notFound("There is no such work order.");
    const { to, expectedFrom } = request;
    if (wo.state !== expectedFrom) {
      throw conflict("work_order_moved", `WO ${wo.number} is now ${label(wo.state)}, not ${label(expectedFrom)}: someone moved it meanwhile. Look at the board again before moving it.`, { state: wo.state });
    }
    if (!canMove(wo.state, to)) {
      const next = allowedMoves[wo.state].map(label);
      const hint = next.length === 0 ? "It has gone home; a comeback is checked in as a new work order." : `From here it can go to ${list(next)}.`;
      throw conflict("move_not_allowed", `A work order that is ${label(wo.state)} cannot go to ${label(to)}. ${hint}`, { state: wo.state, allowed: allowedMoves[wo.state] });
    }
    if (needsPassedTestRun(wo.state, to)) {
      // Compared in SQL, at the database's own precision; with no entry into test run, nothing qualifies.
      const enteredTestRun = sql`(select max(${workOrderStateHistory.at}) from ${workOrderStateHistory} where ${workOrderStateHistory.workOrderId} = ${id} and ${workOrderStateHistory.toState} = 'test_run')`;
      const passed = await tx
        .select({ id: workOrderTestRuns.id })
        .from(workOrderTestRuns)
        .where(and(eq(workOrderTestRuns.workOrderId, id), eq(workOrderTestRuns.passed, true), gte(workOrderTestRuns.at, enteredTestRun)))
        .limit(1);
      if (passed.length === 0) throw conflict("test_run_needed", `WO ${wo.number} needs a passed test run, recorded since it came into test run, before it is ready for pick-up. Record the test run on the work order.`);
    }
    await moveWorkOrder(tx, id, wo.state, to, user.id);
    await recordAudit(tx, { userId: user.id, action: "work_order.moved", recordType: "work_order", recordId: id, details: { number: wo.number, from: wo.state, to } });
    const [moved] = await tx.select({ at: workOrderStateHistory.at }).from(workOrderStateHistory).where(eq(workOrderStateHistory.workOrderId, id)).orderBy(desc(workOrderStateHistory.at), desc(workOrderStateHistory.id)).limit(1);
    return { id, number: wo.number, from: wo.state, state: to, movedAt: (moved?.at ?? new Date()).toISOString(), movedBy: { id: user.id, name: user.name } };
  });
}

type TestRunInput = z.output<typeof recordTestRunRequestSchema>;

/** Records a test run; only while the ticket is in test run, so each run belongs to one repair. */
export async function recordTestRun(ctx: Pick<AppContext, "db">, user: PublicUser, id: string, input: TestRunInput): Promise<TestRun> {
  return ctx.db.transaction(async (tx) => {
    const [wo] = await tx.select({ state: workOrders.state, number: workOrders.number }).from(workOrders).where(eq(workOrders.id, id)).for("update");
    if (!wo) throw notFound("There is no such work order.");
    if (wo.state !== "test_run") throw conflict("not_in_test_run", `WO ${wo.number} is ${label(wo.state)}: move it to test run before recording a test run.`, { state: wo.state });
    const passed = testRunPassed(input.checks);
    const [row] = await tx.insert(workOrderTestRuns).values({ id: uuidv7(), workOrderId: id, checks: input.checks, passed, note: input.note, userId: user.id }).returning();
    await recordAudit(tx, { userId: user.id, action: "work_order.test_run_recorded", recordType: "work_order", recordId: id, details: { number: wo.number, passed, testRunId: row!.id } });
    return { id: row!.id, checks: row!.checks, passed, note: row!.note, by: { id: user.id, name: user.name }, at: row!.at.toISOString() };
  });
}

export async function latestTestRun(ctx: Pick<AppContext, "db">, workOrderId: string): Promise<TestRun | null> {
  const [row] = await ctx.db
    .select({ run: workOrderTestRuns, userName: users.name })
    .from(workOrderTestRuns)
    .leftJoin(users, eq(users.id, workOrderTestRuns.userId))
    .where(eq(workOrderTestRuns.workOrderId, workOrderId))
    .orderBy(desc(workOrderTestRuns.at), desc(workOrderTestRuns.id))
    .limit(1);
  if (!row) return null;
  const { run } = row;
  return { id: run.id, checks: run.checks, passed: run.passed, note: run.note, by: run.userId ? { id: run.userId, name: row.userName ?? "Unknown" } : null, at: run.at.toISOString() };
}
