// An estimate as the builder shows it: its options priced with the shared arithmetic, the repair-or-replace sentence, the last send.
import { and, asc, desc, eq } from "drizzle-orm";
import type { Database } from "../db/client.ts";
import { estimateOptions, estimates, outgoingMail, users, type EstimateOptionRow, type EstimateRow } from "../db/schema.ts";
import { notFound } from "../lib/errors.ts";
import { optionTotals, repairOrReplace, type EstimateRates } from "../../shared/calc/estimate.ts";
import type { EstimateOption, EstimateView } from "../../shared/schemas/estimates.ts";

type Reader = Pick<Database, "select">;

export function ratesOf(row: EstimateRow): EstimateRates {
  return {
    labourRateCents: row.labourRateCents,
    diagnosticFeeCents: row.diagnosticFeeCents,
    creditDiagnosticFee: row.creditDiagnosticFee,
    taxRateBasisPoints: row.taxRateBasisPoints,
    taxLabour: row.taxLabour,
  };
}

/** One option's totals and, when a new unit's price is known, the plain sentence weighing repair against replacing. */
export function pricedOption(row: EstimateRow, option: Pick<EstimateOptionRow, "id" | "position" | "title" | "labourHours" | "parts">): EstimateOption {
  const estimate = optionTotals(ratesOf(row), option);
  const { lines: _lines, taxableCents: _taxable, ...totals } = estimate;
  const weighed =
    row.replacementPriceCents !== null && row.replacementPriceCents > 0
      ? repairOrReplace({ repairCents: estimate.totalCents, replacementCents: row.replacementPriceCents, thresholdPercent: row.replaceThresholdPercent, currency: row.currency })
      : null;
  return {
    id: option.id,
    position: option.position,
    title: option.title,
    labourHours: option.labourHours,
    parts: option.parts,
    totals,
    repairOrReplace: weighed && { recommendation: weighed.recommendation, sentence: weighed.sentence },
  };
}

export async function estimateRow(db: Reader, id: string, forUpdate = false): Promise<EstimateRow> {
  const query = db.select().from(estimates).where(eq(estimates.id, id));
  const [row] = forUpdate ? await query.for("update") : await query;
  if (!row) throw notFound("There is no such estimate.");
  return row;
}

export async function optionsOf(db: Reader, estimateId: string): Promise<EstimateOptionRow[]> {
  return db.select().from(estimateOptions).where(eq(estimateOptions.estimateId, estimateId)).orderBy(asc(estimateOptions.position));
}

export async function toEstimateView(db: Reader, row: EstimateRow): Promise<EstimateView> {
  const options = await optionsOf(db, row.id);
  const [sender] = row.sentBy ? await db.select({ name: users.name }).from(users).where(eq(users.id, row.sentBy)) : [];
  const [mail] = await db
    .select({ to: outgoingMail.toAddress, status: outgoingMail.status, error: outgoingMail.error, at: outgoingMail.createdAt })
    .from(outgoingMail)
    .where(and(eq(outgoingMail.recordType, "estimate"), eq(outgoingMail.recordId, row.id)))
    .orderBy(desc(outgoingMail.createdAt), desc(outgoingMail.id))
    .limit(1);
  return {
    id: row.id,
    workOrderId: row.workOrderId,
    revision: row.revision,
    revisesId: row.revisesId,
    status: row.status,
    findingTitle: row.findingTitle,
    currency: row.currency,
    rates: ratesOf(row),
    replaceThresholdPercent: row.replaceThresholdPercent,
    replacementPriceCents: row.replacementPriceCents,
    note: row.note,
    options: options.map((o) => pricedOption(row, o)),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    sentAt: row.sentAt?.toISOString() ?? null,
    sentByName: sender?.name ?? null,
    validUntil: row.validUntil?.toISOString() ?? null,
    decidedAt: row.decidedAt?.toISOString() ?? null,
    approvedOptionId: row.approvedOptionId,
    customerComment: row.customerComment,
    lastSend: mail ? { to: mail.to, status: mail.status, error: mail.error, at: mail.at.toISOString() } : null,
  };
}

export async function getEstimate(db: Reader, id: string): Promise<EstimateView> {
  return toEstimateView(db, await estimateRow(db, id));
}

/** Every revision of the work order's estimate, newest first. */
export async function listEstimates(db: Reader, workOrderId: string): Promise<EstimateView[]> {
  const rows = await db.select().from(estimates).where(eq(estimates.workOrderId, workOrderId)).orderBy(desc(estimates.revision));
  return Promise.all(rows.map((row) => toEstimateView(db, row)));
}
