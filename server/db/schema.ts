import { relations, sql } from "drizzle-orm";
import { boolean, check, doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, timestamp, unique, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { roles } from "../../shared/schemas/users.ts";
import { compressionReleaseValues, equipmentKinds, unitSystems } from "../../shared/equipment.ts";
import { tankContents, workOrderStates } from "../../shared/schemas/work-orders.ts";
import { reviewStates, sessionStatuses } from "../../shared/schemas/sessions.ts";
import type { FlowDefinition } from "../../shared/flow/schema.ts";
import type { FlowInput } from "../../shared/flow/step-rules.ts";
import type { SessionEventBody } from "../../shared/schemas/sessions.ts";
import type { SessionFlag } from "../../shared/review/flags.ts";

const createdAt = () => timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow();
const updatedAt = () => timestamp("updated_at", { withTimezone: true, mode: "date" }).notNull().defaultNow();

export const roleEnum = pgEnum("role", roles);
export const unitSystemEnum = pgEnum("unit_system", unitSystems);

export const users = pgTable("users", {
  id: text("id").primaryKey(),
  email: text("email").notNull().unique(),
  name: text("name").notNull(),
  role: roleEnum("role").notNull(),
  active: boolean("active").notNull().default(true),
  unitSystem: unitSystemEnum("unit_system").notNull().default("imperial"),
  passwordHash: text("password_hash").notNull(),
  passwordChangedAt: timestamp("password_changed_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

/** Sign-in sessions; the id is the SHA-256 of the cookie's token, never the token itself. */
export const authSessions = pgTable(
  "auth_sessions",
  {
    id: text("id").primaryKey(),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: timestamp("expires_at", { withTimezone: true, mode: "date" }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("auth_sessions_user_idx").on(t.userId)],
);

/** The shop's one settings row. */
export const shopSettings = pgTable(
  "shop_settings",
  {
    id: integer("id").primaryKey().default(1),
    name: text("name").notNull(),
    phone: text("phone").notNull().default(""),
    email: text("email").notNull().default(""),
    address: text("address").notNull().default(""),
    labourRateCents: integer("labour_rate_cents").notNull(),
    diagnosticFeeCents: integer("diagnostic_fee_cents").notNull(),
    creditDiagnosticFee: boolean("credit_diagnostic_fee").notNull().default(true),
    taxRateBasisPoints: integer("tax_rate_basis_points").notNull().default(0),
    currency: text("currency").notNull().default("USD"),
    defaultUnitSystem: unitSystemEnum("default_unit_system").notNull().default("imperial"),
    altitudeM: integer("altitude_m").notNull().default(0),
    updatedAt: updatedAt(),
  },
  (t) => [
    check("shop_settings_single_row", sql`${t.id} = 1`),
    check("shop_settings_money_non_negative", sql`${t.labourRateCents} >= 0 and ${t.diagnosticFeeCents} >= 0`),
    check("shop_settings_currency_code", sql`${t.currency} ~ '^[A-Z]{3}$'`),
  ],
);

export const auditLog = pgTable(
  "audit_log",
  {
    id: uuid("id").primaryKey(),
    userId: text("user_id").references(() => users.id, { onDelete: "set null" }),
    action: text("action").notNull(),
    recordType: text("record_type").notNull(),
    recordId: text("record_id"),
    details: jsonb("details").$type<Record<string, unknown>>().notNull().default({}),
    at: timestamp("at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("audit_log_record_idx").on(t.recordType, t.recordId), index("audit_log_at_idx").on(t.at)],
);

const at = (name: string) => timestamp(name, { withTimezone: true, mode: "date" });

export const equipmentKindEnum = pgEnum("equipment_kind", equipmentKinds);
export const compressionReleaseEnum = pgEnum("compression_release", compressionReleaseValues);
export const workOrderStateEnum = pgEnum("work_order_state", workOrderStates);
export const tankContentsEnum = pgEnum("tank_contents", tankContents);
export const sessionStatusEnum = pgEnum("session_status", sessionStatuses);
export const reviewStateEnum = pgEnum("review_state", reviewStates);
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
  (t) => [index("customers_name_idx").on(t.name)],
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
  (t) => [index("units_customer_idx").on(t.customerId), check("units_cycle", sql`${t.cycle} in (2, 4)`)],
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

export const flows = pgTable("flows", {
  /** The flow's slug, as in its definition. */
  id: text("id").primaryKey(),
  title: text("title").notNull(),
  retired: boolean("retired").notNull().default(false),
  createdAt: createdAt(),
});

/** A published flow version: its definition has its sections inlined and never changes. */
export const flowVersions = pgTable(
  "flow_versions",
  {
    id: uuid("id").primaryKey(),
    flowId: text("flow_id")
      .notNull()
      .references(() => flows.id, { onDelete: "restrict" }),
    number: integer("number").notNull(),
    definition: jsonb("definition").$type<FlowDefinition>().notNull(),
    note: text("note").notNull().default(""),
    createdBy: text("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [unique("flow_versions_flow_number_unique").on(t.flowId, t.number), check("flow_versions_number_positive", sql`${t.number} >= 1`)],
);

/** A flow's one draft: any JSON object (it may be unfinished); saved with optimistic concurrency on `revision`. */
export const flowDrafts = pgTable(
  "flow_drafts",
  {
    flowId: text("flow_id")
      .primaryKey()
      .references(() => flows.id, { onDelete: "cascade" }),
    definition: jsonb("definition").$type<Record<string, unknown>>().notNull(),
    revision: integer("revision").notNull().default(1),
    /** The version the draft was started from; null for a new flow or an imported file. */
    basedOnVersion: integer("based_on_version"),
    updatedBy: text("updated_by").references(() => users.id, { onDelete: "set null" }),
    updatedAt: updatedAt(),
  },
  (t) => [check("flow_drafts_revision_positive", sql`${t.revision} >= 1`)],
);

export const diagnosticSessions = pgTable(
  "diagnostic_sessions",
  {
    id: uuid("id").primaryKey(),
    workOrderId: uuid("work_order_id")
      .notNull()
      .references(() => workOrders.id, { onDelete: "restrict" }),
    flowVersionId: uuid("flow_version_id")
      .notNull()
      .references(() => flowVersions.id, { onDelete: "restrict" }),
    techId: text("tech_id")
      .notNull()
      .references(() => users.id, { onDelete: "restrict" }),
    status: sessionStatusEnum("status").notNull().default("open"),
    abandonReason: text("abandon_reason"),
    /** A cache of the last replay; the events are the truth. */
    currentStepId: text("current_step_id").notNull(),
    findingStepId: text("finding_step_id"),
    reviewState: reviewStateEnum("review_state").notNull().default("not_submitted"),
    reviewerId: text("reviewer_id").references(() => users.id, { onDelete: "set null" }),
    reviewComment: text("review_comment"),
    reviewedAt: at("reviewed_at"),
    /** The automatic review flags, computed when the session is completed (null before). */
    flags: jsonb("flags").$type<SessionFlag[]>(),
    /** How many flags; 0 until the session is completed. Kept beside them so the queue can filter on it. */
    flagCount: integer("flag_count").notNull().default(0),
    /** The machine's input, fixed when the session began so a replay always gives the same answer. */
    input: jsonb("input").$type<FlowInput>().notNull(),
    startedAt: at("started_at").notNull().defaultNow(),
    completedAt: at("completed_at"),
  },
  (t) => [
    uniqueIndex("diagnostic_sessions_one_open_idx").on(t.workOrderId, t.techId).where(sql`${t.status} = 'open'`),
    index("diagnostic_sessions_work_order_idx").on(t.workOrderId),
    index("diagnostic_sessions_tech_idx").on(t.techId, t.status),
    index("diagnostic_sessions_flow_version_idx").on(t.flowVersionId, t.status),
    index("diagnostic_sessions_review_idx").on(t.reviewState, t.startedAt),
  ],
);

export const sessionEvents = pgTable(
  "session_events",
  {
    /** Made by the tablet, so a resent event is recognised. */
    id: uuid("id").primaryKey(),
    sessionId: uuid("session_id")
      .notNull()
      .references(() => diagnosticSessions.id, { onDelete: "cascade" }),
    seq: integer("seq").notNull(),
    type: text("type").notNull(),
    payload: jsonb("payload").$type<SessionEventBody>().notNull(),
    recordedAt: at("recorded_at").notNull(),
    receivedAt: at("received_at").notNull().defaultNow(),
  },
  (t) => [unique("session_events_session_seq_unique").on(t.sessionId, t.seq)],
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

export const usersRelations = relations(users, ({ many }) => ({ sessions: many(authSessions), audit: many(auditLog) }));
export const authSessionsRelations = relations(authSessions, ({ one }) => ({
  user: one(users, { fields: [authSessions.userId], references: [users.id] }),
}));
export const auditLogRelations = relations(auditLog, ({ one }) => ({
  user: one(users, { fields: [auditLog.userId], references: [users.id] }),
}));

export const customersRelations = relations(customers, ({ many }) => ({ units: many(units), workOrders: many(workOrders) }));
export const unitsRelations = relations(units, ({ one }) => ({ customer: one(customers, { fields: [units.customerId], references: [customers.id] }) }));
export const workOrdersRelations = relations(workOrders, ({ one, many }) => ({
  customer: one(customers, { fields: [workOrders.customerId], references: [customers.id] }),
  unit: one(units, { fields: [workOrders.unitId], references: [units.id] }),
  history: many(workOrderStateHistory),
  sessions: many(diagnosticSessions),
}));
export const workOrderStateHistoryRelations = relations(workOrderStateHistory, ({ one }) => ({
  workOrder: one(workOrders, { fields: [workOrderStateHistory.workOrderId], references: [workOrders.id] }),
}));
export const flowsRelations = relations(flows, ({ one, many }) => ({ versions: many(flowVersions), draft: one(flowDrafts) }));
export const flowDraftsRelations = relations(flowDrafts, ({ one }) => ({
  flow: one(flows, { fields: [flowDrafts.flowId], references: [flows.id] }),
  editor: one(users, { fields: [flowDrafts.updatedBy], references: [users.id] }),
}));
export const flowVersionsRelations = relations(flowVersions, ({ one }) => ({ flow: one(flows, { fields: [flowVersions.flowId], references: [flows.id] }) }));
export const diagnosticSessionsRelations = relations(diagnosticSessions, ({ one, many }) => ({
  workOrder: one(workOrders, { fields: [diagnosticSessions.workOrderId], references: [workOrders.id] }),
  flowVersion: one(flowVersions, { fields: [diagnosticSessions.flowVersionId], references: [flowVersions.id] }),
  tech: one(users, { fields: [diagnosticSessions.techId], references: [users.id] }),
  events: many(sessionEvents),
}));
export const sessionEventsRelations = relations(sessionEvents, ({ one }) => ({
  session: one(diagnosticSessions, { fields: [sessionEvents.sessionId], references: [diagnosticSessions.id] }),
}));

export type UserRow = typeof users.$inferSelect;
export type ShopSettingsRow = typeof shopSettings.$inferSelect;
export type CustomerRow = typeof customers.$inferSelect;
export type UnitRow = typeof units.$inferSelect;
export type WorkOrderRow = typeof workOrders.$inferSelect;
export type FlowRow = typeof flows.$inferSelect;
export type FlowVersionRow = typeof flowVersions.$inferSelect;
export type FlowDraftRow = typeof flowDrafts.$inferSelect;
export type DiagnosticSessionRow = typeof diagnosticSessions.$inferSelect;
export type SessionEventRow = typeof sessionEvents.$inferSelect;
export type AttachmentRow = typeof attachments.$inferSelect;
