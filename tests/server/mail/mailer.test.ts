import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { simpleParser } from "mailparser";
import { capturedMail, outgoingMail } from "../../../server/db/schema.ts";
import { createMailer } from "../../../server/mail/mailer.ts";
import { loadEnv } from "../../../server/env.ts";
import { createLogger } from "../../../server/lib/logger.ts";
import { closedPort } from "../helpers/closed-port.ts";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** A stand-in for the estimate PDF: only its first line matters to these tests. */
const standInPdf = Buffer.from("%PDF-1.4\n% a tiny stand-in body\n%%EOF\n");

describe("the mailer and the built-in sink", () => {
  it("hands a message to the sink over SMTP and keeps it, attachment and all", async () => {
    const pdf = standInPdf;
    const outcome = await t.ctx.mail.send({
      kind: "estimate",
      to: "customer@example.com",
      subject: "Your estimate",
      text: "Plain words",
      html: "<p>Plain <b>words</b></p>",
      fromName: "Kettle Creek Mower & Saw",
      attachments: [{ filename: "estimate.pdf", content: pdf, contentType: "application/pdf" }],
      recordType: "estimate",
      recordId: null,
      createdBy: null,
    });
    expect(outcome.status).toBe("sent");
    expect(t.ctx.mail.mode).toBe("sink");
    const [sent] = await t.ctx.db.select().from(outgoingMail).where(eq(outgoingMail.id, outcome.id));
    expect(sent).toMatchObject({ status: "sent", toAddress: "customer@example.com", error: null });
    expect(sent!.sentAt).toBeInstanceOf(Date);

    const [captured] = await t.ctx.db.select().from(capturedMail).where(eq(capturedMail.messageId, outcome.messageId!));
    expect(captured).toBeDefined();
    expect(captured!.rcptTo).toEqual(["customer@example.com"]);
    expect(captured!.mailFrom).toBe("workshop@benchpath.localhost");
    expect(captured!.subject).toBe("Your estimate");
    expect(captured!.textBody.trim()).toBe("Plain words");
    expect(captured!.htmlBody).toContain("<b>words</b>");
    expect(captured!.attachments).toEqual([{ filename: "estimate.pdf", contentType: "application/pdf", size: pdf.length }]);
    // The raw message parses back to the same attachment bytes.
    const reparsed = await simpleParser(Buffer.from(captured!.raw, "base64"));
    expect(reparsed.attachments[0]!.content.equals(pdf)).toBe(true);
    expect(reparsed.from?.text).toContain("Kettle Creek Mower & Saw");
  });

  it("marks a message failed, with the reason, when the mail server cannot be reached", async () => {
    const port = await closedPort();
    const env = loadEnv({ NODE_ENV: "test", SMTP_URL: `smtp://127.0.0.1:${port}` });
    const mailer = createMailer({ env, db: t.ctx.db, logger: createLogger("silent") });
    try {
      expect(mailer.mode).toBe("smtp");
      const outcome = await mailer.send({ kind: "invite", to: "new@example.com", subject: "Join", text: "t", html: "<p>t</p>", recordType: "user", recordId: null, createdBy: null });
      expect(outcome.status).toBe("failed");
      expect(outcome.error).toBe(`Could not reach the mail server at smtp://127.0.0.1:${port}: it refused the connection.`);
      const [row] = await t.ctx.db.select().from(outgoingMail).where(eq(outgoingMail.id, outcome.id));
      expect(row).toMatchObject({ status: "failed", sentAt: null, messageId: null });
    } finally {
      await mailer.close();
    }
  });
});

describe("the shop lead's mail pages", () => {
  it("lists what was sent and what the sink received, and gives back the attachment", async () => {
    const { agent: lead } = await signedInAs(t, "shop_lead");
    const outgoing = await lead.get("/api/mail/outgoing").expect(200);
    expect(outgoing.body.messages.map((m: { status: string }) => m.status).sort()).toEqual(["failed", "sent"]);
    const failed = outgoing.body.messages.find((m: { status: string }) => m.status === "failed");
    expect(failed.error).toMatch(/refused the connection/);

    const box = await lead.get("/api/mail/inbox").expect(200);
    expect(box.body.mode).toBe("sink");
    expect(box.body.messages).toHaveLength(1);
    const [message] = box.body.messages;
    expect(message.attachments).toEqual([{ index: 0, filename: "estimate.pdf", contentType: "application/pdf", size: standInPdf.length }]);
    const full = await lead.get(`/api/mail/inbox/${message.id}`).expect(200);
    expect(full.body.html).toContain("<b>words</b>");
    const file = await lead.get(`/api/mail/inbox/${message.id}/attachments/0`).buffer(true).expect(200);
    expect(file.headers["content-type"]).toBe("application/pdf");
    expect(file.headers["content-disposition"]).toBe('attachment; filename="estimate.pdf"');
    expect(Buffer.from(file.body).toString("latin1")).toMatch(/^%PDF-1\.4/);
  });
});
