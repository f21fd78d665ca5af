// Estimates: revisions per work order, their options with parts lines, and the customer's one-time links.
import { sql } from "drizzle-orm";
import { boolean, check, doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, unique, uuid } from "drizzle-orm/pg-core";
import { estimateStatuses, type EstimatePartLine } from "../../../shared/schemas/estimate-records.ts";
import { at, createdAt, updatedAt } from "./columns.ts";
import { users } from "./people.ts";
import { diagnosticSessions } from "./sessions.ts";
import { workOrders } from "./work-orders.ts";

export const estimateStatusEnum = pgEnum("estimate_status", estimateStatuses);

/**
 * One revision of a work order's estimate. The shop's rates are copied in when it is written, so a sent
 * estimate keeps its figures when the settings change; a sent estimate is never edited again.
 */
export const estimates = pgTable(
  "estimates",
  {
    id: uuid("id").primaryKey(),
    workOrderId: uuid("work_order_id")
      .notNull()
      .references(() => workOrders.id, { onDelete: "cascade" }),
    /** 1, 2, 3… per work order. */
    revision: integer("revision").notNull(),
    /** The revision this one replaces, if any. */
    revisesId: uuid("revises_id"),
    /** The session whose finding the estimate starts from, and that finding. */
    sessionId: uuid("session_id").references(() => diagnosticSessions.id, { onDelete: "set null" }),
    findingStepId: text("finding_step_id"),
    findingTitle: text("finding_title").notNull().default(""),
    status: estimateStatusEnum("status").notNull().default("draft"),
    currency: text("currency").notNull(),
    labourRateCents: integer("labour_rate_cents").notNull(),
    diagnosticFeeCents: integer("diagnostic_fee_cents").notNull(),
    creditDiagnosticFee: boolean("credit_diagnostic_fee").notNull(),
    taxRateBasisPoints: integer("tax_rate_basis_points").notNull(),
    taxLabour: boolean("tax_labour").notNull().default(false),
    /** The price of a new unit, entered by the tech, for the repair-or-replace sentence. */
    replacementPriceCents: integer("replacement_price_cents"),
    replaceThresholdPercent: integer("replace_threshold_percent").notNull(),
    /** A note for the customer, printed on the estimate. */
    note: text("note").notNull().default(""),
    createdBy: text("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
    sentAt: at("sent_at"),
    sentBy: text("sent_by").references(() => users.id, { onDelete: "set null" }),
    /** The customer may answer until then. */
    validUntil: at("valid_until"),
    decidedAt: at("decided_at"),
    /** The option the customer approved; null when declined or not answered. */
    approvedOptionId: uuid("approved_option_id"),
    /** What the customer wrote with their answer. */
    customerComment: text("customer_comment").notNull().default(""),
  },
  (t) => [
    unique("estimates_work_order_revision").on(t.workOrderId, t.revision),
    index("estimates_work_order_idx").on(t.workOrderId),
    check("estimates_money_non_negative", sql`${t.labourRateCents} >= 0 and ${t.diagnosticFeeCents} >= 0 and (${t.replacementPriceCents} is null or ${t.replacementPriceCents} > 0)`),
    check("estimates_currency_code", sql`${t.currency} ~ '^[A-Z]{3}$'`),
    check("estimates_tax_rate", sql`${t.taxRateBasisPoints} between 0 and 10000`),
    check("estimates_threshold", sql`${t.replaceThresholdPercent} between 1 and 100`),
  ],
);

/** A choice put to the customer, such as "rebuild the carburettor" against "replace it". */
export const estimateOptions = pgTable(
  "estimate_options",
  {
    id: uuid("id").primaryKey(),
    estimateId: uuid("estimate_id")
      .notNull()
      .references(() => estimates.id, { onDelete: "cascade" }),
    position: integer("position").notNull(),
    title: text("title").notNull(),
    labourHours: doublePrecision("labour_hours").notNull().default(0),
    parts: jsonb("parts").$type<EstimatePartLine[]>().notNull().default([]),
  },
  (t) => [unique("estimate_options_position").on(t.estimateId, t.position), check("estimate_options_labour", sql`${t.labourHours} >= 0`)],
);

/** The customer's link to a sent estimate: only the SHA-256 of its token is kept; one answer, then it is used. */
export const estimateLinks = pgTable(
  "estimate_links",
  {
    id: uuid("id").primaryKey(),
    estimateId: uuid("estimate_id")
      .notNull()
      .references(() => estimates.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull().unique(),
    expiresAt: at("expires_at").notNull(),
    usedAt: at("used_at"),
    /** Set when a newer e-mail's link replaces this one. */
    revokedAt: at("revoked_at"),
    createdAt: createdAt(),
  },
  (t) => [index("estimate_links_estimate_idx").on(t.estimateId)],
);

export type EstimateRow = typeof estimates.$inferSelect;
export type EstimateOptionRow = typeof estimateOptions.$inferSelect;
export type EstimateLinkRow = typeof estimateLinks.$inferSelect;
