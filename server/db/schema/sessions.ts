// Diagnostic sessions and their event logs.
import { sql } from "drizzle-orm";
import { index, integer, jsonb, pgEnum, pgTable, text, unique, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { reviewStates, sessionStatuses } from "../../../shared/schemas/sessions.ts";
import type { FlowInput } from "../../../shared/flow/step-rules.ts";
import type { SessionEventBody } from "../../../shared/schemas/sessions.ts";
import type { SessionFlag } from "../../../shared/review/flags.ts";
import { at } from "./columns.ts";
import { flowVersions } from "./flows.ts";
import { users } from "./people.ts";
import { workOrders } from "./work-orders.ts";

export const sessionStatusEnum = pgEnum("session_status", sessionStatuses);
export const reviewStateEnum = pgEnum("review_state", reviewStates);

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
    // The review queue's pages in its default orders: everything newest first (and shop insight's
    // shorter date ranges), by review state latest completed first, one tech's newest first.
    index("diagnostic_sessions_started_idx").on(t.startedAt.desc().nullsLast(), t.id),
    index("diagnostic_sessions_review_completed_idx").on(t.reviewState, t.completedAt.desc().nullsLast(), t.id),
    index("diagnostic_sessions_tech_started_idx").on(t.techId, t.startedAt.desc().nullsLast(), t.id),
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

export type DiagnosticSessionRow = typeof diagnosticSessions.$inferSelect;
export type SessionEventRow = typeof sessionEvents.$inferSelect;
