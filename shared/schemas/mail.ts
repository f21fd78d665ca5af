// GET /api/mail/…: the shop's record of mail it sent, and the built-in sink's inbox (development and the demo).
import { z } from "zod";
import { mailKinds, mailStatuses } from "./estimate-records.ts";

export const outgoingMailSchema = z.object({
  id: z.string(),
  kind: z.enum(mailKinds),
  to: z.string(),
  subject: z.string(),
  status: z.enum(mailStatuses),
  error: z.string().nullable(),
  recordType: z.string(),
  recordId: z.string().nullable(),
  createdByName: z.string().nullable(),
  createdAt: z.string(),
  sentAt: z.string().nullable(),
});
export type OutgoingMail = z.infer<typeof outgoingMailSchema>;

export const capturedAttachmentSchema = z.object({ index: z.number().int(), filename: z.string(), contentType: z.string(), size: z.number().int() });

export const capturedMailSummarySchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  attachments: z.array(capturedAttachmentSchema),
});
export type CapturedMailSummary = z.infer<typeof capturedMailSummarySchema>;

export const capturedMailSchema = capturedMailSummarySchema.extend({ messageId: z.string().nullable(), text: z.string(), html: z.string() });
export type CapturedMail = z.infer<typeof capturedMailSchema>;

export const mailListQuerySchema = z.object({
  limit: z.coerce.number({ error: "limit must be a number" }).int().min(1, { error: "limit is at least 1" }).max(200, { error: "limit is at most 200" }).default(50),
});

/** GET /api/mail/outgoing */
export const outgoingMailResponseSchema = z.object({ messages: z.array(outgoingMailSchema) });

/** GET /api/mail/inbox — where mail goes, and what the built-in sink has received, newest first. */
export const inboxResponseSchema = z.object({
  mode: z.enum(["sink", "smtp"]),
  where: z.string(),
  messages: z.array(capturedMailSummarySchema),
});
export type InboxResponse = z.infer<typeof inboxResponseSchema>;

export const mailIdParamsSchema = z.object({ id: z.uuid({ error: "Not a message id." }) });
export const attachmentParamsSchema = mailIdParamsSchema.extend({ index: z.coerce.number().int().min(0).max(100) });
