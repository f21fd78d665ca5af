// The customer report of a work order: gathered from the records, then built by the shared model.
import { and, asc, desc, eq, isNotNull, ne } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import { diagnosticSessions, estimateOptions, estimates, flows, flowVersions, type EstimateRow } from "../db/schema.ts";
import { notFound } from "../lib/errors.ts";
import { compiledVersion } from "./flows.ts";
import { getSettings } from "./settings.ts";
import { sessionEventsOf } from "./sessions.ts";
import { findWorkOrder } from "./work-order-detail.ts";
import { buildCustomerReport, type ReportEstimateSource, type ReportSessionSource } from "../../shared/report/customer-report.ts";
import type { CustomerReport } from "../../shared/schemas/report.ts";

type Ctx = Pick<AppContext, "db">;

const iso = (d: Date | null) => (d ? d.toISOString() : null);

/** An estimate on its way to the customer: the report attached to its e-mail shows it as sent, with its link's expiry. */
export interface ReportSending {
  sentAt: Date;
  validUntil: Date;
}

/** The named estimate of the work order, or its latest revision that is not superseded; null when it has none. */
async function reportEstimate(ctx: Ctx, workOrderId: string, estimateId?: string, sending?: ReportSending): Promise<ReportEstimateSource | null> {
  let row: EstimateRow | undefined;
  if (estimateId) {
    [row] = await ctx.db.select().from(estimates).where(and(eq(estimates.id, estimateId), eq(estimates.workOrderId, workOrderId)));
    if (!row) throw notFound("This work order has no such estimate.");
  } else {
    [row] = await ctx.db
      .select()
      .from(estimates)
      .where(and(eq(estimates.workOrderId, workOrderId), ne(estimates.status, "superseded")))
      .orderBy(desc(estimates.revision))
      .limit(1);
    if (!row) return null;
  }
  const options = await ctx.db.select().from(estimateOptions).where(eq(estimateOptions.estimateId, row.id)).orderBy(asc(estimateOptions.position));
  const asSent = sending && (row.status === "draft" || row.status === "sent");
  return {
    id: row.id,
    revision: row.revision,
    status: asSent ? "sent" : row.status,
    currency: row.currency,
    labourRateCents: row.labourRateCents,
    diagnosticFeeCents: row.diagnosticFeeCents,
    creditDiagnosticFee: row.creditDiagnosticFee,
    taxRateBasisPoints: row.taxRateBasisPoints,
    taxLabour: row.taxLabour,
    findingTitle: row.findingTitle,
    note: row.note,
    sentAt: iso(asSent ? sending.sentAt : row.sentAt),
    validUntil: iso(asSent ? sending.validUntil : row.validUntil),
    decidedAt: iso(row.decidedAt),
    approvedOptionId: row.approvedOptionId,
    options: options.map((o) => ({ id: o.id, position: o.position, title: o.title, labourHours: o.labourHours, parts: o.parts })),
  };
}

/** The work order's completed sessions that reached a finding, with their logs, oldest first. */
async function finishedSessions(ctx: Ctx, workOrderId: string): Promise<ReportSessionSource[]> {
  const rows = await ctx.db
    .select({
      id: diagnosticSessions.id,
      flowVersionId: diagnosticSessions.flowVersionId,
      flowTitle: flows.title,
      input: diagnosticSessions.input,
      findingStepId: diagnosticSessions.findingStepId,
      completedAt: diagnosticSessions.completedAt,
    })
    .from(diagnosticSessions)
    .innerJoin(flowVersions, eq(flowVersions.id, diagnosticSessions.flowVersionId))
    .innerJoin(flows, eq(flows.id, flowVersions.flowId))
    .where(and(eq(diagnosticSessions.workOrderId, workOrderId), eq(diagnosticSessions.status, "completed"), isNotNull(diagnosticSessions.findingStepId)))
    .orderBy(asc(diagnosticSessions.completedAt), asc(diagnosticSessions.id));
  return Promise.all(
    rows.map(async (r) => ({
      id: r.id,
      flowTitle: r.flowTitle,
      flow: await compiledVersion(ctx.db, r.flowVersionId),
      input: r.input,
      events: (await sessionEventsOf(ctx.db, r.id)).map((e) => e.payload),
      findingStepId: r.findingStepId!,
      completedAt: iso(r.completedAt),
    })),
  );
}

/**
 * What the customer is told about their work order: the shop, the unit, the complaint, the findings
 * with their readings, the estimate (the one named, else the latest not superseded), and the safety
 * and warranty notes. Only the customer's name is included of their personal data. With `sending`,
 * the estimate is shown as the e-mail that is going out presents it.
 */
export async function customerReport(ctx: Ctx, workOrderId: string, estimateId?: string, now = new Date(), sending?: ReportSending): Promise<CustomerReport> {
  const order = await findWorkOrder(ctx, workOrderId);
  const settings = await getSettings(ctx);
  const [sessions, estimate] = await Promise.all([finishedSessions(ctx, workOrderId), reportEstimate(ctx, workOrderId, estimateId, sending)]);
  const { unit } = order;
  return buildCustomerReport({
    generatedAt: now.toISOString(),
    shop: {
      name: settings?.name ?? "Benchpath",
      phone: settings?.phone ?? "",
      email: settings?.email ?? "",
      address: settings?.address ?? "",
      warrantyNote: settings?.warrantyNote ?? "",
      unitSystem: settings?.defaultUnitSystem ?? "imperial",
    },
    workOrder: {
      id: order.summary.id,
      number: order.summary.number,
      state: order.summary.state,
      complaint: order.summary.complaint,
      createdAt: order.summary.createdAt.toISOString(),
      updatedAt: order.summary.updatedAt.toISOString(),
    },
    customerName: order.customer.name,
    unit: {
      equipmentKind: unit.equipmentKind,
      make: unit.make,
      model: unit.model,
      engineModel: unit.engineModel,
      engineType: unit.engineType,
      engineSerial: unit.engineSerial,
      cycle: unit.cycle as 2 | 4,
      displacementCc: unit.displacementCc,
      hours: unit.hours,
    },
    sessions,
    estimate,
  });
}
