import { asc, eq } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import { customers, diagnosticSessions, flows, flowVersions, units, users, workOrders } from "../db/schema.ts";
import { notFound } from "../lib/errors.ts";
import { appliesToUnit, compiledVersion, publishedFlows } from "./flows.ts";
import { summaryColumns, toSummary } from "./work-orders.ts";
import { latestTestRun } from "./board.ts";
import type { WorkOrderDetail } from "../../shared/schemas/work-orders.ts";

export async function findWorkOrder(ctx: Pick<AppContext, "db">, id: string) {
  const [row] = await ctx.db
    .select({ summary: summaryColumns, customer: customers, unit: units, alreadyTried: workOrders.alreadyTried, tankContents: workOrders.tankContents, intakePhotoId: workOrders.intakePhotoId })
    .from(workOrders)
    .innerJoin(customers, eq(customers.id, workOrders.customerId))
    .innerJoin(units, eq(units.id, workOrders.unitId))
    .where(eq(workOrders.id, id));
  if (!row) throw notFound("There is no such work order.");
  return row;
}

/** The work order with its customer, unit, sessions, and the published flows that fit the unit. */
export async function getWorkOrderDetail(ctx: Pick<AppContext, "db">, id: string): Promise<WorkOrderDetail> {
  const row = await findWorkOrder(ctx, id);
  const sessions = await ctx.db
    .select({
      id: diagnosticSessions.id,
      flowVersionId: diagnosticSessions.flowVersionId,
      flowTitle: flows.title,
      flowVersion: flowVersions.number,
      techId: diagnosticSessions.techId,
      techName: users.name,
      status: diagnosticSessions.status,
      findingStepId: diagnosticSessions.findingStepId,
      startedAt: diagnosticSessions.startedAt,
    })
    .from(diagnosticSessions)
    .innerJoin(flowVersions, eq(flowVersions.id, diagnosticSessions.flowVersionId))
    .innerJoin(flows, eq(flows.id, flowVersions.flowId))
    .innerJoin(users, eq(users.id, diagnosticSessions.techId))
    .where(eq(diagnosticSessions.workOrderId, id))
    .orderBy(asc(diagnosticSessions.startedAt));
  const published = await publishedFlows(ctx.db);
  const { id: _unitId, customerId: _customerId, createdAt: _createdAt, ...unit } = row.unit;
  return {
    ...toSummary(row.summary),
    customer: { id: row.customer.id, name: row.customer.name, phone: row.customer.phone, email: row.customer.email },
    unit: { id: row.unit.id, ...unit, cycle: unit.cycle as 2 | 4 },
    alreadyTried: row.alreadyTried,
    tankContents: row.tankContents,
    intakePhotoId: row.intakePhotoId,
    sessions: await Promise.all(
      sessions.map(async ({ flowVersionId, findingStepId, startedAt, ...s }) => ({
        ...s,
        findingTitle: findingStepId ? ((await compiledVersion(ctx.db, flowVersionId)).steps[findingStepId]?.title ?? null) : null,
        startedAt: startedAt.toISOString(),
      })),
    ),
    applicableFlows: published
      .filter((f) => appliesToUnit(f.appliesTo, row.unit))
      .map((f) => ({ flowId: f.flowId, title: f.title, summary: f.summary, version: f.version })),
    latestTestRun: await latestTestRun(ctx, id),
  };
}
