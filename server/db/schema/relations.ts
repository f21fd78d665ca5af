// The relations between the tables, for drizzle's relational queries.
import { relations } from "drizzle-orm";
import { flowDrafts, flows, flowVersions } from "./flows.ts";
import { auditLog, authSessions, users } from "./people.ts";
import { diagnosticSessions, sessionEvents } from "./sessions.ts";
import { customers, units, workOrders, workOrderStateHistory } from "./work-orders.ts";

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
