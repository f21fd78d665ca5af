// Holds the attachments of the estimate e-mail.
import type { AppContext } from "../context.ts";
import type { OutgoingMessage } from "../mail/mailer.ts";
import { customerReportAttachment } from "../pdf/customer-report-pdf.tsx";
import { getSettings } from "./settings.ts";
import type { EstimateView } from "../../shared/schemas/estimates.ts";

export type EstimateMailAttachment = NonNullable<OutgoingMessage["attachments"]>[number];

/**
 * The files sent with an estimate's e-mail: the customer report with this estimate, as sent today
 * and valid until the link expires, on the paper of the shop's measurement system (Letter for
 * imperial shops, A4 for metric).
 */
export async function estimateMailAttachments(ctx: AppContext, estimate: EstimateView, validUntil: Date): Promise<EstimateMailAttachment[]> {
  const settings = await getSettings(ctx);
  const paper = settings?.defaultUnitSystem === "metric" ? "a4" : "letter";
  return [await customerReportAttachment(ctx, estimate, paper, { sentAt: new Date(), validUntil })];
}
