import { desc, eq } from "drizzle-orm";
import { simpleParser } from "mailparser";
import type { AppContext } from "../context.ts";
import { capturedMail, outgoingMail, users, type CapturedMailRow } from "../db/schema.ts";
import { notFound } from "../lib/errors.ts";
import type { CapturedMail, CapturedMailSummary, InboxResponse, OutgoingMail } from "../../shared/schemas/mail.ts";

export async function listOutgoingMail(ctx: Pick<AppContext, "db">, limit: number): Promise<OutgoingMail[]> {
  const rows = await ctx.db
    .select({ mail: outgoingMail, createdByName: users.name })
    .from(outgoingMail)
    .leftJoin(users, eq(users.id, outgoingMail.createdBy))
    .orderBy(desc(outgoingMail.createdAt), desc(outgoingMail.id))
    .limit(limit);
  return rows.map(({ mail, createdByName }) => ({
    id: mail.id,
    kind: mail.kind,
    to: mail.toAddress,
    subject: mail.subject,
    status: mail.status,
    error: mail.error,
    recordType: mail.recordType,
    recordId: mail.recordId,
    createdByName,
    createdAt: mail.createdAt.toISOString(),
    sentAt: mail.sentAt?.toISOString() ?? null,
  }));
}

const summary = (row: Omit<CapturedMailRow, "raw" | "textBody" | "htmlBody">): CapturedMailSummary => ({
  id: row.id,
  receivedAt: row.receivedAt.toISOString(),
  from: row.mailFrom,
  to: row.rcptTo,
  subject: row.subject,
  attachments: row.attachments.map((a, index) => ({ index, ...a })),
});

export async function inbox(ctx: Pick<AppContext, "db" | "mail">, limit: number): Promise<InboxResponse> {
  const rows = await ctx.db
    .select({ id: capturedMail.id, receivedAt: capturedMail.receivedAt, mailFrom: capturedMail.mailFrom, rcptTo: capturedMail.rcptTo, subject: capturedMail.subject, messageId: capturedMail.messageId, attachments: capturedMail.attachments })
    .from(capturedMail)
    .orderBy(desc(capturedMail.receivedAt), desc(capturedMail.id))
    .limit(limit);
  return { mode: ctx.mail.mode, where: ctx.mail.mode === "sink" ? "the built-in mail sink" : await ctx.mail.describe(), messages: rows.map(summary) };
}

async function capturedRow(ctx: Pick<AppContext, "db">, id: string): Promise<CapturedMailRow> {
  const [row] = await ctx.db.select().from(capturedMail).where(eq(capturedMail.id, id)).limit(1);
  if (!row) throw notFound("No such message in the mail sink.");
  return row;
}

export async function capturedMessage(ctx: Pick<AppContext, "db">, id: string): Promise<CapturedMail> {
  const row = await capturedRow(ctx, id);
  return { ...summary(row), messageId: row.messageId, text: row.textBody, html: row.htmlBody };
}

export async function capturedAttachment(ctx: Pick<AppContext, "db">, id: string, index: number): Promise<{ filename: string; contentType: string; content: Buffer }> {
  const row = await capturedRow(ctx, id);
  const parsed = await simpleParser(Buffer.from(row.raw, "base64"));
  const attachment = parsed.attachments[index];
  if (!attachment) throw notFound("That message has no such attachment.");
  return { filename: attachment.filename ?? `attachment-${index + 1}`, contentType: attachment.contentType, content: attachment.content };
}
