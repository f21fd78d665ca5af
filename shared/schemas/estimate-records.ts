// The stored shapes of estimates, mail and one-time links that both the server and the browser name.

/** An estimate is written (draft), mailed (sent), answered (approved or declined), or replaced by a revision (superseded). */
export const estimateStatuses = ["draft", "sent", "approved", "declined", "superseded"] as const;
export type EstimateStatus = (typeof estimateStatuses)[number];

/** A parts line as the tech wrote it: the part number is free text (it may be the shop's own bin code). */
export interface EstimatePartLine {
  partNumber: string;
  description: string;
  quantity: number;
  unitPriceCents: number;
}

/** What the shop sends mail for. */
export const mailKinds = ["estimate", "invite", "password_reset"] as const;
export type MailKind = (typeof mailKinds)[number];

/** A message is being handed to the mail server (sending), was accepted by it (sent), or was not (failed). */
export const mailStatuses = ["sending", "sent", "failed"] as const;
export type MailStatus = (typeof mailStatuses)[number];

/** One-time links to a user's own password: an invitation to join, or a reset. */
export const userTokenPurposes = ["invite", "password_reset"] as const;
export type UserTokenPurpose = (typeof userTokenPurposes)[number];

/** A captured message's attachment, as the mail sink read it. */
export interface CapturedAttachment {
  filename: string;
  contentType: string;
  size: number;
}
