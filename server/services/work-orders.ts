import { and, desc, eq, ilike, ne, or, sql, type SQL } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { z } from "zod";
import type { AppContext } from "../context.ts";
import type { Database } from "../db/client.ts";
import { customers, units, workOrders, workOrderStateHistory } from "../db/schema.ts";
import { recordAudit } from "./audit.ts";
import type { createWorkOrderRequestSchema, listWorkOrdersQuerySchema, WorkOrderState, WorkOrderSummary } from "../../shared/schemas/work-orders.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

type Tx = Pick<Database, "insert" | "update" | "select">;

/** Moves a work order to a new state and writes the history row; the caller audits. */
export async function moveWorkOrder(tx: Tx, workOrderId: string, from: WorkOrderState | null, to: WorkOrderState, userId: string): Promise<void> {
  await tx.update(workOrders).set({ state: to, updatedAt: new Date() }).where(eq(workOrders.id, workOrderId));
  await tx.insert(workOrderStateHistory).values({ id: uuidv7(), workOrderId, fromState: from, toState: to, userId });
}

/** Intake: the customer, the unit and the work order, in one transaction. Returns the new work order's id. */
export async function createWorkOrder(ctx: Pick<AppContext, "db">, user: PublicUser, input: z.output<typeof createWorkOrderRequestSchema>): Promise<string> {
  return ctx.db.transaction(async (tx) => {
    const customerId = uuidv7();
    const unitId = uuidv7();
    const workOrderId = uuidv7();
    await tx.insert(customers).values({ id: customerId, ...input.customer });
    await tx.insert(units).values({ id: unitId, customerId, ...input.unit });
    const [row] = await tx
      .insert(workOrders)
      .values({ id: workOrderId, customerId, unitId, state: "waiting_for_diagnosis", complaint: input.complaint, alreadyTried: input.alreadyTried, tankContents: input.tankContents, createdBy: user.id })
      .returning({ number: workOrders.number });
    await tx.insert(workOrderStateHistory).values({ id: uuidv7(), workOrderId, fromState: null, toState: "waiting_for_diagnosis", userId: user.id });
    await recordAudit(tx, { userId: user.id, action: "work_order.created", recordType: "work_order", recordId: workOrderId, details: { number: row!.number } });
    return workOrderId;
  });
}

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

export const summaryColumns = {
  id: workOrders.id,
  number: workOrders.number,
  state: workOrders.state,
  customerName: customers.name,
  equipmentKind: units.equipmentKind,
  make: units.make,
  model: units.model,
  complaint: workOrders.complaint,
  createdAt: workOrders.createdAt,
  updatedAt: workOrders.updatedAt,
};

type SummaryRow = { [K in keyof typeof summaryColumns]: (typeof summaryColumns)[K]["_"]["data"] };

export function toSummary(row: SummaryRow): WorkOrderSummary {
  return { ...row, createdAt: row.createdAt.toISOString(), updatedAt: row.updatedAt.toISOString() };
}

/** Newest first; search looks at the customer's name, the make, the model and the number. */
export async function listWorkOrders(ctx: Pick<AppContext, "db">, query: z.output<typeof listWorkOrdersQuerySchema>): Promise<WorkOrderSummary[]> {
  const where: (SQL | undefined)[] = [];
  if (query.state === "open") where.push(ne(workOrders.state, "picked_up"));
  else if (query.state !== "all") where.push(eq(workOrders.state, query.state));
  if (query.search) {
    const like = `%${escapeLike(query.search)}%`;
    const number = /^#?\d{1,9}$/.test(query.search) ? Number(query.search.replace("#", "")) : null;
    where.push(or(ilike(customers.name, like), ilike(units.make, like), ilike(units.model, like), number === null ? undefined : eq(workOrders.number, number)));
  }
  const rows = await ctx.db
    .select(summaryColumns)
    .from(workOrders)
    .innerJoin(customers, eq(customers.id, workOrders.customerId))
    .innerJoin(units, eq(units.id, workOrders.unitId))
    .where(and(...where))
    .orderBy(desc(workOrders.number))
    .limit(query.limit);
  return rows.map(toSummary);
}

export async function setIntakePhoto(tx: Tx, user: PublicUser, workOrderId: string, attachmentId: string): Promise<void> {
  await tx.update(workOrders).set({ intakePhotoId: attachmentId, updatedAt: sql`now()` }).where(eq(workOrders.id, workOrderId));
  await recordAudit(tx, { userId: user.id, action: "work_order.intake_photo_set", recordType: "work_order", recordId: workOrderId, details: { attachmentId } });
}
