// Holds the attachments of the estimate e-mail.
import type { AppContext } from "../context.ts";
import type { OutgoingMessage } from "../mail/mailer.ts";
import type { EstimateView } from "../../shared/schemas/estimates.ts";

export type EstimateMailAttachment = NonNullable<OutgoingMessage["attachments"]>[number];

/** The files sent with an estimate's e-mail; none yet, the link carries the estimate. */
export async function estimateMailAttachments(_ctx: AppContext, _estimate: EstimateView): Promise<EstimateMailAttachment[]> {
  return [];
}
