// Check flows: each flow, its published versions (never changed) and its one draft.
import { sql } from "drizzle-orm";
import { boolean, check, integer, jsonb, pgTable, text, unique, uuid } from "drizzle-orm/pg-core";
import type { FlowDefinition } from "../../../shared/flow/schema.ts";
import { createdAt, updatedAt } from "./columns.ts";
import { users } from "./people.ts";

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

export type FlowRow = typeof flows.$inferSelect;
export type FlowVersionRow = typeof flowVersions.$inferSelect;
export type FlowDraftRow = typeof flowDrafts.$inferSelect;
