// The customer's side of an estimate: what their one-time link shows, and their one answer.
import { eq } from "drizzle-orm";
import type { z } from "zod";
import type { AppContext } from "../context.ts";
import type { Database } from "../db/client.ts";
import { estimateLinks, estimates, units, workOrders, type EstimateLinkRow, type EstimateRow } from "../db/schema.ts";
import { hashToken } from "../auth/tokens.ts";
import { HttpError, notFound, unprocessable } from "../lib/errors.ts";
import { recordAudit } from "./audit.ts";
import { getSettings } from "./settings.ts";
import { moveWorkOrder } from "./work-orders.ts";
import { estimateRow, optionsOf, pricedOption, ratesOf } from "./estimate-view.ts";
import { optionTotals } from "../../shared/calc/estimate.ts";
import { TOKEN_SHAPE, type EstimateDecisionResponse, type estimateDecisionRequestSchema, type PublicEstimate } from "../../shared/schemas/estimates.ts";

type Reader = Pick<Database, "select">;
const gone = (id: string, message: string) => new HttpError(410, id, message);
const day = (d: Date) => new Intl.DateTimeFormat("en-US", { year: "numeric", month: "long", day: "numeric", timeZone: "UTC" }).format(d);

/** The link and its estimate, if the link may still be answered; otherwise a plain reason (404 unknown, 410 used, replaced or expired). */
async function openLink(db: Reader, token: string, forUpdate = false): Promise<{ link: EstimateLinkRow; estimate: EstimateRow }> {
  const unknown = () => notFound("This estimate link is not one we know. Check that the whole address from the e-mail was opened, or call the shop.");
  if (!TOKEN_SHAPE.test(token)) throw unknown();
  const query = db.select().from(estimateLinks).where(eq(estimateLinks.tokenHash, hashToken(token)));
  const [link] = forUpdate ? await query.for("update") : await query;
  if (!link) throw unknown();
  if (link.usedAt) throw gone("link_used", "This estimate has already been answered through this link. To change the answer, call the shop.");
  if (link.revokedAt) throw gone("link_revoked", "The shop sent a newer e-mail for this estimate, and this link was replaced. Open the latest e-mail from the shop.");
  if (link.expiresAt.getTime() <= Date.now()) throw gone("link_expired", `This estimate could be answered until ${day(link.expiresAt)}, and that has passed. Ask the shop for a new one.`);
  const estimate = await estimateRow(db, link.estimateId, forUpdate);
  if (estimate.status !== "sent") throw gone("link_closed", "This estimate is no longer open for an answer. Call the shop for the latest one.");
  return { link, estimate };
}

async function shopContact(db: Reader) {
  const settings = await getSettings({ db: db as Database });
  return { name: settings?.name ?? "The shop", phone: settings?.phone ?? "", email: settings?.email ?? "", address: settings?.address ?? "" };
}

export async function publicEstimate(ctx: Pick<AppContext, "db">, token: string): Promise<PublicEstimate> {
  const { link, estimate } = await openLink(ctx.db, token);
  const [wo] = await ctx.db
    .select({ number: workOrders.number, equipmentKind: units.equipmentKind, make: units.make, model: units.model })
    .from(workOrders)
    .innerJoin(units, eq(units.id, workOrders.unitId))
    .where(eq(workOrders.id, estimate.workOrderId));
  const options = await optionsOf(ctx.db, estimate.id);
  return {
    shop: await shopContact(ctx.db),
    workOrderNumber: wo!.number,
    unit: { equipmentKind: wo!.equipmentKind, make: wo!.make, model: wo!.model },
    findingTitle: estimate.findingTitle,
    note: estimate.note,
    currency: estimate.currency,
    revision: estimate.revision,
    validUntil: link.expiresAt.toISOString(),
    options: options.map((option) => {
      const priced = pricedOption(estimate, option);
      const lines = optionTotals(ratesOf(estimate), option).lines.map(({ kind, description, quantity, unitPriceCents, amountCents }) => ({ kind, description, quantity, unitPriceCents, amountCents }));
      return { id: option.id, title: option.title, lines, totals: priced.totals, repairOrReplace: priced.repairOrReplace };
    }),
  };
}

type Decision = z.output<typeof estimateDecisionRequestSchema>;

/** The customer's answer, in one transaction: the estimate decided, the link used, the work order moved, all audited. */
export async function decideEstimate(ctx: Pick<AppContext, "db">, token: string, decision: Decision): Promise<EstimateDecisionResponse> {
  return ctx.db.transaction(async (tx) => {
    const { link, estimate } = await openLink(tx, token, true);
    const options = await optionsOf(tx, estimate.id);
    const chosen = decision.decision === "approve" ? options.find((o) => o.id === decision.optionId) : undefined;
    if (decision.decision === "approve" && !chosen) throw unprocessable("unknown_option", "That option is not on this estimate. Reload the page and choose again.");
    const now = new Date();
    const status = decision.decision === "approve" ? "approved" : "declined";
    await tx
      .update(estimates)
      .set({ status, decidedAt: now, approvedOptionId: chosen?.id ?? null, customerComment: decision.comment, updatedAt: now })
      .where(eq(estimates.id, estimate.id));
    await tx.update(estimateLinks).set({ usedAt: now }).where(eq(estimateLinks.id, link.id));
    const [wo] = await tx.select({ state: workOrders.state }).from(workOrders).where(eq(workOrders.id, estimate.workOrderId)).for("update");
    // The customer has no account: the move is recorded under the person who sent the estimate.
    const actor = (estimate.sentBy ?? estimate.createdBy) as string;
    if (wo && wo.state !== status) await moveWorkOrder(tx, estimate.workOrderId, wo.state, status, actor);
    await recordAudit(tx, {
      userId: actor,
      action: `estimate.${status}`,
      recordType: "estimate",
      recordId: estimate.id,
      details: { decidedBy: "customer_link", linkId: link.id, optionId: chosen?.id ?? null, optionTitle: chosen?.title ?? null, comment: decision.comment, workOrderFrom: wo?.state ?? null, workOrderTo: status },
    });
    const shop = await shopContact(tx);
    return { decision: status, optionTitle: chosen?.title ?? null, shopName: shop.name, shopPhone: shop.phone };
  });
}
