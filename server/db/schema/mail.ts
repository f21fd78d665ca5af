// Mail: what the shop handed to the mail server, what the built-in sink received, and one-time links for users.
import { index, jsonb, pgEnum, pgTable, text, uuid } from "drizzle-orm/pg-core";
import { mailKinds, mailStatuses, userTokenPurposes, type CapturedAttachment } from "../../../shared/schemas/estimate-records.ts";
import { at, createdAt } from "./columns.ts";
import { users } from "./people.ts";

export const mailKindEnum = pgEnum("mail_kind", mailKinds);
export const mailStatusEnum = pgEnum("mail_status", mailStatuses);
export const userTokenPurposeEnum = pgEnum("user_token_purpose", userTokenPurposes);

/**
 * Every message the shop tried to send and how it went. The bodies are not kept: they carry one-time
 * links, which live only as hashes; a resend writes a fresh message with a fresh link.
 */
export const outgoingMail = pgTable(
  "outgoing_mail",
  {
    id: uuid("id").primaryKey(),
    kind: mailKindEnum("kind").notNull(),
    toAddress: text("to_address").notNull(),
    subject: text("subject").notNull(),
    status: mailStatusEnum("status").notNull().default("sending"),
    /** Why the mail server did not take it, in words a shop can act on. */
    error: text("error"),
    /** The Message-ID the message went out with. */
    messageId: text("message_id"),
    recordType: text("record_type").notNull(),
    recordId: text("record_id"),
    createdBy: text("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    sentAt: at("sent_at"),
  },
  (t) => [index("outgoing_mail_record_idx").on(t.recordType, t.recordId), index("outgoing_mail_created_idx").on(t.createdAt)],
);

/** A message the built-in SMTP sink received (development and the demo): the customer's inbox, for the shop lead to read. */
export const capturedMail = pgTable(
  "captured_mail",
  {
    id: uuid("id").primaryKey(),
    receivedAt: at("received_at").notNull().defaultNow(),
    mailFrom: text("mail_from").notNull(),
    rcptTo: jsonb("rcpt_to").$type<string[]>().notNull(),
    subject: text("subject").notNull().default(""),
    messageId: text("message_id"),
    textBody: text("text_body").notNull().default(""),
    htmlBody: text("html_body").notNull().default(""),
    attachments: jsonb("attachments").$type<CapturedAttachment[]>().notNull().default([]),
    /** The whole message as received, base64; attachments are read back from it. */
    raw: text("raw").notNull(),
  },
  (t) => [index("captured_mail_received_idx").on(t.receivedAt)],
);

/** One-time links to set a password: an invitation or a reset. Only the SHA-256 of the token is kept. */
export const userTokens = pgTable(
  "user_tokens",
  {
    id: uuid("id").primaryKey(),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    purpose: userTokenPurposeEnum("purpose").notNull(),
    tokenHash: text("token_hash").notNull().unique(),
    expiresAt: at("expires_at").notNull(),
    usedAt: at("used_at"),
    createdBy: text("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("user_tokens_user_idx").on(t.userId)],
);

export type OutgoingMailRow = typeof outgoingMail.$inferSelect;
export type CapturedMailRow = typeof capturedMail.$inferSelect;
export type UserTokenRow = typeof userTokens.$inferSelect;
