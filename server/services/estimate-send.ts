// Sending an estimate: a fresh one-time link (only its hash kept), the e-mail, and only once the mail server has it, the estimate marked sent.
import { and, eq, inArray, isNull, ne } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { AppContext } from "../context.ts";
import type { Database } from "../db/client.ts";
import { customers, estimateLinks, estimates, units, workOrders } from "../db/schema.ts";
import { hashToken, newLinkToken } from "../auth/tokens.ts";
import { conflict } from "../lib/errors.ts";
import { recordAudit } from "./audit.ts";
import { getSettings } from "./settings.ts";
import { moveWorkOrder } from "./work-orders.ts";
import { estimateRow, toEstimateView } from "./estimate-view.ts";
import { estimateMailAttachments } from "./estimate-mail.ts";
import { estimateMessage } from "./estimate-message.ts";
import type { SendEstimateResponse } from "../../shared/schemas/estimates.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

const DAY_MS = 24 * 60 * 60 * 1000;
type Tx = Pick<Database, "select" | "insert" | "update">;

async function mayBeSent(db: Pick<Database, "select">, id: string) {
  const row = await estimateRow(db, id);
  if (row.status !== "draft" && row.status !== "sent") {
    throw conflict("estimate_not_sendable", `This estimate is ${row.status}, so it cannot be sent. Revise it to send a new version.`, { status: row.status });
  }
  if (row.revisesId) {
    const old = await estimateRow(db, row.revisesId);
    if (old.status === "approved") throw conflict("estimate_already_approved", `The customer approved revision ${old.revision} while this one was being written, so this one cannot be sent.`);
  }
  return row;
}

/** Revokes the estimate's links nobody has used, but for the one to keep. */
async function revokeOpenLinks(tx: Tx, estimateIds: string[], keep: string, now: Date) {
  await tx
    .update(estimateLinks)
    .set({ revokedAt: now })
    .where(and(inArray(estimateLinks.estimateId, estimateIds), isNull(estimateLinks.usedAt), isNull(estimateLinks.revokedAt), ne(estimateLinks.id, keep)));
}

/**
 * Mails the estimate to `to` with a new link to `${baseUrl}/estimate/<token>`. A draft becomes sent, and
 * its work order waits for approval, only when the mail server accepted the message; when it did not,
 * the new link is revoked, nothing else changes, and the reason is answered so the shop can send again.
 * A sent estimate can be sent again (a lost e-mail): the new link replaces the old ones.
 */
export async function sendEstimate(ctx: AppContext, user: PublicUser, id: string, to: string, baseUrl: string): Promise<SendEstimateResponse> {
  const row = await mayBeSent(ctx.db, id);
  const settings = await getSettings(ctx);
  if (!settings) throw conflict("shop_settings_missing", "The shop's details are not set up yet. Ask the shop lead to fill in the shop settings.");
  const [wo] = await ctx.db
    .select({ number: workOrders.number, state: workOrders.state, customerName: customers.name, equipmentKind: units.equipmentKind, make: units.make, model: units.model })
    .from(workOrders)
    .innerJoin(customers, eq(customers.id, workOrders.customerId))
    .innerJoin(units, eq(units.id, workOrders.unitId))
    .where(eq(workOrders.id, row.workOrderId));

  const token = newLinkToken();
  const linkId = uuidv7();
  const expiresAt = new Date(Date.now() + settings.estimateValidDays * DAY_MS);
  await ctx.db.insert(estimateLinks).values({ id: linkId, estimateId: id, tokenHash: hashToken(token), expiresAt });

  const view = await toEstimateView(ctx.db, row);
  const message = estimateMessage(view, {
    shop: { name: settings.name, phone: settings.phone, email: settings.email },
    workOrderNumber: wo!.number,
    unit: { equipmentKind: wo!.equipmentKind, make: wo!.make, model: wo!.model },
    customerName: wo!.customerName,
    link: `${baseUrl}/estimate/${token}`,
    validUntil: expiresAt,
  });
  const outcome = await ctx.mail.send({
    kind: "estimate",
    to,
    ...message,
    fromName: settings.name,
    replyTo: settings.email || undefined,
    attachments: await estimateMailAttachments(ctx, view, expiresAt),
    recordType: "estimate",
    recordId: id,
    createdBy: user.id,
  });

  await ctx.db.transaction(async (tx) => {
    const now = new Date();
    if (outcome.status === "failed") {
      await tx.update(estimateLinks).set({ revokedAt: now }).where(eq(estimateLinks.id, linkId));
      // Earlier links of a sent estimate stay usable: the customer may still have the last good e-mail.
      await recordAudit(tx, { userId: user.id, action: "estimate.send_failed", recordType: "estimate", recordId: id, details: { to, mailId: outcome.id, error: outcome.error } });
      return;
    }
    const current = await estimateRow(tx, id, true);
    const replaces = current.revisesId ? [current.revisesId] : [];
    await revokeOpenLinks(tx, [id, ...replaces], linkId, now);
    await tx.update(estimates).set({ status: "sent", sentAt: now, sentBy: user.id, validUntil: expiresAt, updatedAt: now }).where(eq(estimates.id, id));
    if (current.revisesId) {
      await tx.update(estimates).set({ status: "superseded", updatedAt: now }).where(and(eq(estimates.id, current.revisesId), inArray(estimates.status, ["sent", "declined"])));
    }
    const [order] = await tx.select({ state: workOrders.state }).from(workOrders).where(eq(workOrders.id, current.workOrderId)).for("update");
    const moved = order && order.state !== "waiting_for_approval";
    if (moved) await moveWorkOrder(tx, current.workOrderId, order.state, "waiting_for_approval", user.id);
    await recordAudit(tx, {
      userId: user.id,
      action: "estimate.sent",
      recordType: "estimate",
      recordId: id,
      details: { to, mailId: outcome.id, linkId, expiresAt: expiresAt.toISOString(), resend: current.status === "sent", supersedes: current.revisesId, workOrderMovedFrom: moved ? order.state : null },
    });
  });
  return { estimate: await toEstimateView(ctx.db, await estimateRow(ctx.db, id)), mail: { status: outcome.status, to, error: outcome.error } };
}
