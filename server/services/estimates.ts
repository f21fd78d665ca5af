// Writing estimates: a draft from the work order's finding, edits while it is a draft, and revisions of a sent one.
import { and, desc, eq, isNotNull, max } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { z } from "zod";
import type { AppContext } from "../context.ts";
import type { Database } from "../db/client.ts";
import { diagnosticSessions, estimateOptions, estimates, workOrders, type EstimateRow } from "../db/schema.ts";
import { conflict, notFound, unprocessable } from "../lib/errors.ts";
import { recordAudit } from "./audit.ts";
import { compiledVersion } from "./flows.ts";
import { getSettings } from "./settings.ts";
import { estimateRow, optionsOf } from "./estimate-view.ts";
import type { EstimatePartLine } from "../../shared/schemas/estimate-records.ts";
import type { createEstimateRequestSchema, updateEstimateRequestSchema } from "../../shared/schemas/estimates.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

type Tx = Pick<Database, "select" | "insert" | "update" | "delete">;
type UpdateInput = z.output<typeof updateEstimateRequestSchema>;

/** The shop's rates, copied onto the estimate so later changes to the settings leave it as written. */
async function currentRates(tx: Tx) {
  const settings = await getSettings({ db: tx as Database });
  if (!settings) throw conflict("shop_settings_missing", "The shop's rates are not set up yet, so no estimate can be priced. Ask the shop lead to fill in the shop settings.");
  return {
    currency: settings.currency,
    labourRateCents: settings.labourRateCents,
    diagnosticFeeCents: settings.diagnosticFeeCents,
    creditDiagnosticFee: settings.creditDiagnosticFee,
    taxRateBasisPoints: settings.taxRateBasisPoints,
    taxLabour: settings.taxLabour,
    replaceThresholdPercent: settings.replaceThresholdPercent,
  };
}

/** The finished session the estimate starts from: the one asked for, or the work order's latest with a finding. */
async function findingSession(tx: Tx, workOrderId: string, sessionId: string | undefined) {
  const where = [eq(diagnosticSessions.workOrderId, workOrderId), eq(diagnosticSessions.status, "completed"), isNotNull(diagnosticSessions.findingStepId)];
  if (sessionId) where.push(eq(diagnosticSessions.id, sessionId));
  const [session] = await tx
    .select({ id: diagnosticSessions.id, flowVersionId: diagnosticSessions.flowVersionId, findingStepId: diagnosticSessions.findingStepId })
    .from(diagnosticSessions)
    .where(and(...where))
    .orderBy(desc(diagnosticSessions.completedAt))
    .limit(1);
  if (!session) {
    throw unprocessable(
      "no_finding",
      sessionId ? "That session is not a finished check of this work order with a finding." : "This work order has no finished check with a finding yet. Finish a check on the bench first.",
    );
  }
  const step = (await compiledVersion(tx, session.flowVersionId)).steps[session.findingStepId!];
  if (step?.kind !== "finding") throw unprocessable("no_finding", "The session's finding is no longer in its flow, so no estimate can start from it.");
  return { session, step };
}

/** A new draft: one option per repair the finding recommends, its parts as lines for the tech to price. */
export async function createEstimate(ctx: Pick<AppContext, "db">, user: PublicUser, input: z.output<typeof createEstimateRequestSchema>): Promise<string> {
  return ctx.db.transaction(async (tx) => {
    const [wo] = await tx.select({ id: workOrders.id }).from(workOrders).where(eq(workOrders.id, input.workOrderId)).for("update");
    if (!wo) throw notFound("There is no such work order.");
    const [existing] = await tx.select({ id: estimates.id }).from(estimates).where(eq(estimates.workOrderId, wo.id)).orderBy(desc(estimates.revision)).limit(1);
    if (existing) throw conflict("estimate_exists", "This work order has an estimate already. Open it, or revise it once it has been sent.", { estimateId: existing.id });
    const { session, step } = await findingSession(tx, wo.id, input.sessionId);
    const id = uuidv7();
    await tx.insert(estimates).values({ id, workOrderId: wo.id, revision: 1, sessionId: session.id, findingStepId: session.findingStepId, findingTitle: step.title, ...(await currentRates(tx)), createdBy: user.id });
    const repairs = step.repairs.length > 0 ? step.repairs : [{ title: step.title, labourHours: 0, parts: [] }];
    await tx.insert(estimateOptions).values(
      repairs.map((repair, position) => ({
        id: uuidv7(),
        estimateId: id,
        position,
        title: repair.title,
        labourHours: repair.labourHours,
        parts: repair.parts.map((description): EstimatePartLine => ({ partNumber: "", description, quantity: 1, unitPriceCents: 0 })),
      })),
    );
    await recordAudit(tx, { userId: user.id, action: "estimate.created", recordType: "estimate", recordId: id, details: { workOrderId: wo.id, sessionId: session.id, findingStepId: session.findingStepId, options: repairs.length } });
    return id;
  });
}

export function frozen(row: EstimateRow) {
  const sent = row.sentAt ? `It was sent on ${row.sentAt.toISOString().slice(0, 10)}` : "It has left the draft stage";
  return conflict("estimate_frozen", `${sent} and can no longer be changed. Revise it to write a new version.`, { status: row.status });
}

/** Replaces the draft's options, note and new-unit price; options keep their ids when they carry them. */
export async function updateEstimate(ctx: Pick<AppContext, "db">, user: PublicUser, id: string, input: UpdateInput): Promise<void> {
  await ctx.db.transaction(async (tx) => {
    const row = await estimateRow(tx, id, true);
    if (row.status !== "draft") throw frozen(row);
    const known = new Set((await optionsOf(tx, id)).map((o) => o.id));
    const seen = new Set<string>();
    const options = input.options.map((option, position) => {
      const keep = option.id && known.has(option.id) && !seen.has(option.id) ? option.id : uuidv7();
      seen.add(keep);
      return { id: keep, estimateId: id, position, title: option.title, labourHours: option.labourHours, parts: option.parts };
    });
    await tx.delete(estimateOptions).where(eq(estimateOptions.estimateId, id));
    await tx.insert(estimateOptions).values(options);
    await tx.update(estimates).set({ note: input.note, replacementPriceCents: input.replacementPriceCents, updatedAt: new Date() }).where(eq(estimates.id, id));
    await recordAudit(tx, { userId: user.id, action: "estimate.updated", recordType: "estimate", recordId: id, details: { options: options.length } });
  });
}

/**
 * A new draft revision of a sent or declined estimate: its options, note and new-unit price copied,
 * the rates taken afresh from the shop's settings. The old one is superseded only when the new one is sent.
 */
export async function reviseEstimate(ctx: Pick<AppContext, "db">, user: PublicUser, id: string): Promise<string> {
  return ctx.db.transaction(async (tx) => {
    const old = await estimateRow(tx, id, true);
    if (old.status !== "sent" && old.status !== "declined") {
      throw conflict("estimate_not_revisable", old.status === "draft" ? "This estimate is still a draft: change it directly." : `This estimate was ${old.status}, so it cannot be revised.`, { status: old.status });
    }
    const [draft] = await tx.select({ id: estimates.id }).from(estimates).where(and(eq(estimates.workOrderId, old.workOrderId), eq(estimates.status, "draft"))).limit(1);
    if (draft) throw conflict("estimate_draft_exists", "A revision of this estimate is already being written. Open it instead.", { estimateId: draft.id });
    const [top] = await tx.select({ revision: max(estimates.revision) }).from(estimates).where(eq(estimates.workOrderId, old.workOrderId));
    const newId = uuidv7();
    await tx.insert(estimates).values({
      id: newId,
      workOrderId: old.workOrderId,
      revision: (top?.revision ?? old.revision) + 1,
      revisesId: old.id,
      sessionId: old.sessionId,
      findingStepId: old.findingStepId,
      findingTitle: old.findingTitle,
      ...(await currentRates(tx)),
      replacementPriceCents: old.replacementPriceCents,
      note: old.note,
      createdBy: user.id,
    });
    const options = await optionsOf(tx, old.id);
    await tx.insert(estimateOptions).values(options.map((o) => ({ id: uuidv7(), estimateId: newId, position: o.position, title: o.title, labourHours: o.labourHours, parts: o.parts })));
    await recordAudit(tx, { userId: user.id, action: "estimate.revised", recordType: "estimate", recordId: newId, details: { revisesId: old.id, revision: (top?.revision ?? old.revision) + 1 } });
    return newId;
  });
}
