import { eq } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { Database } from "../../server/db/client.ts";
import { customers, units, workOrders, workOrderStateHistory, type CustomerRow, type UnitRow, type WorkOrderRow } from "../../server/db/schema.ts";
import { buildUser } from "./users.ts";

let counter = 0;

export async function buildCustomer(db: Database, overrides: Partial<CustomerRow> = {}): Promise<CustomerRow> {
  counter += 1;
  const [row] = await db.insert(customers).values({ id: uuidv7(), name: `Test Customer ${counter}`, phone: "555-0100", email: "", ...overrides }).returning();
  return row!;
}

/** A 2-stroke string trimmer unless told otherwise; creates its customer when none is given. */
export async function buildUnit(db: Database, overrides: Partial<UnitRow> = {}): Promise<UnitRow> {
  const customerId = overrides.customerId ?? (await buildCustomer(db)).id;
  const [row] = await db
    .insert(units)
    .values({ id: uuidv7(), customerId, equipmentKind: "string_trimmer", make: "Fernhill", model: "FT-25", cycle: 2, displacementCc: 25, compressionRelease: "no", ...overrides })
    .returning();
  return row!;
}

export type BuildWorkOrderOverrides = Partial<Omit<WorkOrderRow, "number">> & { unit?: Partial<UnitRow> };

/** A work order waiting for diagnosis, with its customer, unit and author made when not given. */
export async function buildWorkOrder(db: Database, overrides: BuildWorkOrderOverrides = {}): Promise<WorkOrderRow & { unitRow: UnitRow }> {
  const { unit: unitOverrides, ...rest } = overrides;
  const customerId = rest.customerId ?? (await buildCustomer(db)).id;
  const unitRow = rest.unitId ? (await db.select().from(units).where(eq(units.id, rest.unitId)))[0]! : await buildUnit(db, { customerId, ...unitOverrides });
  const createdBy = rest.createdBy ?? (await buildUser(db)).id;
  const [row] = await db
    .insert(workOrders)
    .values({ id: uuidv7(), customerId, unitId: unitRow.id, complaint: "Pulls over but will not start", tankContents: "premix", state: "waiting_for_diagnosis", createdBy, ...rest })
    .returning();
  await db.insert(workOrderStateHistory).values({ id: uuidv7(), workOrderId: row!.id, fromState: null, toState: row!.state, userId: createdBy });
  return { ...row!, unitRow };
}
