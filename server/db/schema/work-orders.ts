// The counter's records: customers, their units, work orders with their state history, and photos.
import { sql } from "drizzle-orm";
import { boolean, check, doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, uuid } from "drizzle-orm/pg-core";
import { compressionReleaseValues, equipmentKinds } from "../../../shared/equipment.ts";
import { tankContents, workOrderStates } from "../../../shared/schemas/work-orders.ts";
import { at, createdAt, updatedAt } from "./columns.ts";
import { users } from "./people.ts";

export const equipmentKindEnum = pgEnum("equipment_kind", equipmentKinds);
export const compressionReleaseEnum = pgEnum("compression_release", compressionReleaseValues);
export const workOrderStateEnum = pgEnum("work_order_state", workOrderStates);
export const tankContentsEnum = pgEnum("tank_contents", tankContents);
export const attachmentOwnerEnum = pgEnum("attachment_owner", ["work_order", "session"]);

export const customers = pgTable(
  "customers",
  {
    id: uuid("id").primaryKey(),
    name: text("name").notNull(),
    phone: text("phone").notNull().default(""),
    email: text("email").notNull().default(""),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  // Trigram indexes (pg_trgm) serve the review queue's search, an ILIKE on any part of the name.
  (t) => [index("customers_name_idx").on(t.name), index("customers_name_trgm_idx").using("gin", t.name.op("gin_trgm_ops"))],
);

/** A piece of equipment as it came in: make and model as printed on it. */
export const units = pgTable(
  "units",
  {
    id: uuid("id").primaryKey(),
    customerId: uuid("customer_id")
      .notNull()
      .references(() => customers.id, { onDelete: "restrict" }),
    equipmentKind: equipmentKindEnum("equipment_kind").notNull(),
    make: text("make").notNull(),
    model: text("model").notNull(),
    engineModel: text("engine_model").notNull().default(""),
    engineType: text("engine_type").notNull().default(""),
    engineSerial: text("engine_serial").notNull().default(""),
    cycle: integer("cycle").notNull(),
    displacementCc: doublePrecision("displacement_cc"),
    compressionRelease: compressionReleaseEnum("compression_release").notNull().default("unknown"),
    hours: doublePrecision("hours"),
    createdAt: createdAt(),
  },
  (t) => [
    index("units_customer_idx").on(t.customerId),
    index("units_make_model_trgm_idx").using("gin", sql`(${t.make} || ' ' || ${t.model}) gin_trgm_ops`),
    check("units_cycle", sql`${t.cycle} in (2, 4)`),
  ],
);

export const workOrders = pgTable(
  "work_orders",
  {
    id: uuid("id").primaryKey(),
    /** The number the shop says out loud and writes on the tag. */
    number: integer("number").notNull().unique().generatedAlwaysAsIdentity({ startWith: 1001 }),
    customerId: uuid("customer_id")
      .notNull()
      .references(() => customers.id, { onDelete: "restrict" }),
    unitId: uuid("unit_id")
      .notNull()
      .references(() => units.id, { onDelete: "restrict" }),
    state: workOrderStateEnum("state").notNull().default("waiting_for_diagnosis"),
    complaint: text("complaint").notNull(),
    alreadyTried: text("already_tried").notNull().default(""),
    tankContents: tankContentsEnum("tank_contents").notNull(),
    intakePhotoId: uuid("intake_photo_id").references(() => attachments.id, { onDelete: "set null" }),
    createdBy: text("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("work_orders_state_idx").on(t.state), index("work_orders_customer_idx").on(t.customerId), index("work_orders_unit_idx").on(t.unitId)],
);

export const workOrderStateHistory = pgTable(
  "work_order_state_history",
  {
    id: uuid("id").primaryKey(),
    workOrderId: uuid("work_order_id")
      .notNull()
      .references(() => workOrders.id, { onDelete: "cascade" }),
    fromState: workOrderStateEnum("from_state"),
    toState: workOrderStateEnum("to_state").notNull(),
    userId: text("user_id").references(() => users.id, { onDelete: "set null" }),
    at: at("at").notNull().defaultNow(),
  },
  (t) => [index("work_order_state_history_order_idx").on(t.workOrderId, t.at)],
);

/** A test run after the repair: each check of the short list passed or not, by whom and when. */
export const workOrderTestRuns = pgTable(
  "work_order_test_runs",
  {
    id: uuid("id").primaryKey(),
    workOrderId: uuid("work_order_id")
      .notNull()
      .references(() => workOrders.id, { onDelete: "cascade" }),
    /** Check id → passed; the ids are the shared test-run list's. */
    checks: jsonb("checks").$type<Record<string, boolean>>().notNull(),
    passed: boolean("passed").notNull(),
    note: text("note").notNull().default(""),
    userId: text("user_id").references(() => users.id, { onDelete: "set null" }),
    at: at("at").notNull().defaultNow(),
  },
  (t) => [index("work_order_test_runs_order_idx").on(t.workOrderId, t.at)],
);

export const attachments = pgTable(
  "attachments",
  {
    id: uuid("id").primaryKey(),
    storageKey: text("storage_key").notNull().unique(),
    ownerType: attachmentOwnerEnum("owner_type").notNull(),
    ownerId: uuid("owner_id").notNull(),
    stepId: text("step_id"),
    mimeType: text("mime_type").notNull(),
    size: integer("size").notNull(),
    width: integer("width").notNull(),
    height: integer("height").notNull(),
    sha256: text("sha256").notNull(),
    thumbKey: text("thumb_key").notNull().unique(),
    createdBy: text("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("attachments_owner_idx").on(t.ownerType, t.ownerId)],
);

export type CustomerRow = typeof customers.$inferSelect;
export type UnitRow = typeof units.$inferSelect;
export type WorkOrderRow = typeof workOrders.$inferSelect;
export type WorkOrderTestRunRow = typeof workOrderTestRuns.$inferSelect;
export type AttachmentRow = typeof attachments.$inferSelect;
