// People and the shop: users, sign-in sessions, the one settings row and the audit log.
import { sql } from "drizzle-orm";
import { boolean, check, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { roles } from "../../../shared/schemas/users.ts";
import { unitSystems } from "../../../shared/equipment.ts";
import { createdAt, updatedAt } from "./columns.ts";

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
  /** Set when the shop lead invited this person by e-mail; joinedAt stays empty until they set a password. */
  invitedAt: timestamp("invited_at", { withTimezone: true, mode: "date" }),
  joinedAt: timestamp("joined_at", { withTimezone: true, mode: "date" }),
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
    /** A session open longer than this many hours is flagged for the shop lead. */
    reviewOpenHours: integer("review_open_hours").notNull().default(24),
    /** Whether labour and the diagnostic fee are taxed as well as parts. */
    taxLabour: boolean("tax_labour").notNull().default(false),
    /** A repair at or above this share of a new unit's price is worth a second thought. */
    replaceThresholdPercent: integer("replace_threshold_percent").notNull().default(50),
    /** How many days a sent estimate may be answered. */
    estimateValidDays: integer("estimate_valid_days").notNull().default(30),
    /** The shop's own warranty terms, printed on the customer report. */
    warrantyNote: text("warranty_note").notNull().default(""),
    updatedAt: updatedAt(),
  },
  (t) => [
    check("shop_settings_single_row", sql`${t.id} = 1`),
    check("shop_settings_money_non_negative", sql`${t.labourRateCents} >= 0 and ${t.diagnosticFeeCents} >= 0`),
    check("shop_settings_currency_code", sql`${t.currency} ~ '^[A-Z]{3}$'`),
    check("shop_settings_review_open_hours", sql`${t.reviewOpenHours} between 1 and 720`),
    check("shop_settings_tax_rate", sql`${t.taxRateBasisPoints} between 0 and 10000`),
    check("shop_settings_replace_threshold", sql`${t.replaceThresholdPercent} between 1 and 100`),
    check("shop_settings_estimate_valid_days", sql`${t.estimateValidDays} between 1 and 365`),
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

export type UserRow = typeof users.$inferSelect;
export type ShopSettingsRow = typeof shopSettings.$inferSelect;
