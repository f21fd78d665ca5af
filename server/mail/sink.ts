// The built-in mail sink: a real SMTP server on loopback that keeps what it receives in the database,
// so development and the demo send mail through the same protocol a shop's mail server speaks.
import type { AddressInfo } from "node:net";
import { SMTPServer, type SMTPServerAddress } from "smtp-server";
import { simpleParser } from "mailparser";
import { v7 as uuidv7 } from "uuid";
import type { Database } from "../db/client.ts";
import { capturedMail } from "../db/schema.ts";
import type { Logger } from "../lib/logger.ts";

/** Messages over this size are refused by the sink, as a real server would. */
export const SINK_MAX_BYTES = 15 * 1024 * 1024;

export interface MailSink {
  /** smtp://127.0.0.1:<port>, for nodemailer. */
  url: string;
  close(): Promise<void>;
}

const address = (a: SMTPServerAddress | false | undefined) => (a ? a.address : "");

/** Parses one received message into a captured_mail row. */
export async function storeCaptured(db: Database, raw: Buffer, envelope: { mailFrom: string; rcptTo: string[] }): Promise<string> {
  const parsed = await simpleParser(raw);
  const id = uuidv7();
  await db.insert(capturedMail).values({
    id,
    mailFrom: envelope.mailFrom,
    rcptTo: envelope.rcptTo,
    subject: parsed.subject ?? "",
    messageId: parsed.messageId ?? null,
    textBody: parsed.text ?? "",
    htmlBody: typeof parsed.html === "string" ? parsed.html : "",
    attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? "attachment", contentType: a.contentType, size: a.size })),
    raw: raw.toString("base64"),
  });
  return id;
}

export async function startMailSink(db: Database, logger: Logger, options: { host?: string; port?: number } = {}): Promise<MailSink> {
  const host = options.host ?? "127.0.0.1";
  const server = new SMTPServer({
    name: "benchpath-mail-sink",
    banner: "Benchpath mail sink: messages stay in this shop's database",
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    size: SINK_MAX_BYTES,
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("error", (error) => callback(error));
      stream.on("end", () => {
        if (stream.sizeExceeded) {
          callback(Object.assign(new Error("The message is larger than the mail sink accepts."), { responseCode: 552 }));
          return;
        }
        const envelope = { mailFrom: address(session.envelope.mailFrom), rcptTo: session.envelope.rcptTo.map((r) => r.address) };
        storeCaptured(db, Buffer.concat(chunks), envelope).then(
          () => callback(null),
          (error: unknown) => {
            logger.error({ err: error }, "the mail sink could not keep a message");
            callback(Object.assign(new Error("The mail sink could not keep the message."), { responseCode: 451 }));
          },
        );
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port ?? 0, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  server.on("error", (error) => logger.warn({ err: error }, "mail sink error"));
  const { port } = server.server.address() as AddressInfo;
  return {
    url: `smtp://${host}:${port}`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
