import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { simpleParser } from "mailparser";
import { closedPort } from "../helpers/closed-port.ts";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { seedDemo } from "../../../server/db/seed/demo.ts";
import { auditLog, estimateLinks, estimates, outgoingMail, workOrders } from "../../../server/db/schema.ts";
import { hashToken } from "../../../server/auth/tokens.ts";
import { createMailer } from "../../../server/mail/mailer.ts";
import { loadEnv } from "../../../server/env.ts";
import { createLogger } from "../../../server/lib/logger.ts";
import { installBuiltInFlows } from "../../../server/services/flows.ts";
import { lastMailTo, linkToken, pricedCarbOptions, workOrderWithFinding } from "./helpers.ts";
import { readPdf } from "../report/pdf-text.ts";
import { formatDay } from "../../../shared/report/dates.ts";
import type { EstimateView, SendEstimateResponse } from "../../../shared/schemas/estimates.ts";

async function readyApp(env: Record<string, string> = {}) {
  const app = await createTestApp(env);
  await seedDemo(app.ctx.db);
  await installBuiltInFlows(app.ctx.db);
  return { app, tech: await signedInAs(app, "senior_tech") };
}

async function pricedDraft(app: TestApp, agent: Awaited<ReturnType<typeof signedInAs>>["agent"], email: string): Promise<{ estimate: EstimateView; workOrderId: string }> {
  const { wo } = await workOrderWithFinding(app.ctx.db, undefined, email);
  const draft = (await agent.post("/api/estimates").send({ workOrderId: wo.id }).expect(201)).body as EstimateView;
  const saved = await agent.put(`/api/estimates/${draft.id}`).send({ options: pricedCarbOptions(draft.options.map((o) => o.id)) }).expect(200);
  return { estimate: saved.body as EstimateView, workOrderId: wo.id };
}

describe("sending through the built-in sink", () => {
  let t: TestApp;
  let tech: Awaited<ReturnType<typeof signedInAs>>;
  beforeAll(async () => {
    ({ app: t, tech } = await readyApp());
  });
  afterAll(() => t.close());

  it("mails the customer the options, totals and a link, keeps only the link's hash, and marks the estimate sent", async () => {
    const to = "ada.fenwick@example.com";
    const { estimate, workOrderId } = await pricedDraft(t, tech.agent, to);
    await t.ctx.db.update(workOrders).set({ state: "diagnosing" }).where(eq(workOrders.id, workOrderId));
    const res = await tech.agent.post(`/api/estimates/${estimate.id}/send`).send({ to: "  Ada.Fenwick@Example.com " });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const body = res.body as SendEstimateResponse;
    expect(body.mail).toEqual({ status: "sent", to, error: null });
    expect(body.estimate).toMatchObject({ status: "sent", sentByName: tech.user.name, lastSend: { to, status: "sent", error: null } });
    // Source: shop_settings.estimate_valid_days, 30 days by default.
    const validFor = Date.parse(body.estimate.validUntil!) - Date.parse(body.estimate.sentAt!);
    expect(Math.round(validFor / 86_400_000)).toBe(30);

    const mail = await lastMailTo(t.ctx.db, to);
    expect(mail).toBeDefined();
    const [wo] = await t.ctx.db.select().from(workOrders).where(eq(workOrders.id, workOrderId));
    expect(mail!.subject).toBe(`Your estimate from Kettle Creek Mower & Saw for work order ${wo!.number}`);
    expect(mail!.textBody).toContain("Option 1: Clean and rebuild the carburettor — $168.20 including tax");
    expect(mail!.textBody).toContain("Option 2: Replace the carburettor — $120.53 including tax");
    expect(mail!.htmlBody).toContain("Kettle Creek Mower &amp; Saw");
    const token = linkToken(mail!.textBody);
    expect(mail!.textBody).toContain(`http://bench.test/estimate/${token}`);
    expect(mail!.htmlBody).toContain(`http://bench.test/estimate/${token}`);
    // The customer report rides along as a PDF: Letter for this imperial shop, the estimate shown as sent.
    const pdfName = `customer-report-wo-${wo!.number}-estimate-1.pdf`;
    expect(mail!.attachments).toEqual([{ filename: pdfName, contentType: "application/pdf", size: expect.any(Number) }]);
    const parsed = await simpleParser(Buffer.from(mail!.raw, "base64"));
    const pages = await readPdf(parsed.attachments[0]!.content);
    // Source: ANSI/ASME Y14.1 Letter is 8.5 x 11 in = 612 x 792 pt.
    expect(pages[0]!.size).toEqual([612, 792]);
    const text = pages.map((p) => p.text).join(" ");
    expect(text).toContain(`WO ${wo!.number}`);
    expect(text).toContain("Sent, waiting for your answer");
    expect(text).toContain(formatDay(body.estimate.validUntil!));
    expect(text).toContain("$168.20");
    expect(text).toContain("$120.53");
    expect(mail!.textBody).toContain("is attached as a PDF");

    // Only the hash is stored; the raw token is in no table of the shop's own (the sink's copy of the e-mail aside).
    const links = await t.ctx.db.select().from(estimateLinks).where(eq(estimateLinks.estimateId, estimate.id));
    expect(links).toHaveLength(1);
    expect(links[0]!.tokenHash).toBe(hashToken(token));
    const stored = JSON.stringify([links, await t.ctx.db.select().from(estimates), await t.ctx.db.select().from(auditLog), await t.ctx.db.select().from(outgoingMail)]);
    expect(stored).not.toContain(token);

    expect(wo!.state).toBe("waiting_for_approval");
    const audit = (await t.ctx.db.select().from(auditLog)).filter((a) => a.recordId === estimate.id && a.action === "estimate.sent");
    expect(audit).toHaveLength(1);
    expect(audit[0]!.details).toMatchObject({ to, resend: false, workOrderMovedFrom: "diagnosing" });

    const publicView = await t.agent().get(`/api/public/estimates/${token}`);
    expect(publicView.status).toBe(200);
  });

  it("revokes the earlier link when the estimate is sent again", async () => {
    const to = "lost.mail@example.com";
    const { estimate } = await pricedDraft(t, tech.agent, to);
    await tech.agent.post(`/api/estimates/${estimate.id}/send`).send({ to }).expect(200);
    const first = linkToken((await lastMailTo(t.ctx.db, to))!.textBody);
    const again = await tech.agent.post(`/api/estimates/${estimate.id}/send`).send({ to }).expect(200);
    expect(again.body.estimate.status).toBe("sent");
    const second = linkToken((await lastMailTo(t.ctx.db, to))!.textBody);
    expect(second).not.toBe(first);

    const old = await t.agent().get(`/api/public/estimates/${first}`);
    expect(old.status).toBe(410);
    expect(old.body.error.id).toBe("link_revoked");
    const refused = await t.agent().post(`/api/public/estimates/${first}/decision`).send({ decision: "decline" });
    expect(refused.status).toBe(410);
    expect((await t.ctx.db.select().from(estimates).where(eq(estimates.id, estimate.id)))[0]!.status).toBe("sent");
    expect((await t.agent().get(`/api/public/estimates/${second}`)).status).toBe(200);
    const audit = (await t.ctx.db.select().from(auditLog)).filter((a) => a.recordId === estimate.id && a.action === "estimate.sent");
    expect(audit.map((a) => (a.details as { resend: boolean }).resend)).toEqual([false, true]);
  });

  it("wants the customer's e-mail address", async () => {
    const { estimate } = await pricedDraft(t, tech.agent, "");
    const res = await tech.agent.post(`/api/estimates/${estimate.id}/send`).send({ to: "" });
    expect(res.status).toBe(400);
    expect(res.body.error.details.fieldErrors.to).toEqual(["Enter the customer's e-mail address."]);
    const typo = await tech.agent.post(`/api/estimates/${estimate.id}/send`).send({ to: "ada.fenwick@" });
    expect(typo.body.error.details.fieldErrors.to).toEqual(["Enter an e-mail address such as name@example.com."]);
    expect((await tech.agent.get(`/api/estimates/${estimate.id}`)).body).toMatchObject({ status: "draft", lastSend: null });
  });
});

describe("when the mail server cannot be reached", () => {
  let t: TestApp;
  let tech: Awaited<ReturnType<typeof signedInAs>>;
  let port: number;
  beforeAll(async () => {
    port = await closedPort();
    ({ app: t, tech } = await readyApp({ SMTP_URL: `smtp://127.0.0.1:${port}` }));
  });
  afterAll(() => t.close());

  it("marks nothing sent, revokes the new link, answers the reason, and lets the estimate be sent again", async () => {
    const to = "unreached@example.com";
    const { estimate, workOrderId } = await pricedDraft(t, tech.agent, to);
    await t.ctx.db.update(workOrders).set({ state: "diagnosing" }).where(eq(workOrders.id, workOrderId));
    const res = await tech.agent.post(`/api/estimates/${estimate.id}/send`).send({ to });
    expect(res.status).toBe(200);
    const reason = `Could not reach the mail server at smtp://127.0.0.1:${port}: it refused the connection.`;
    expect(res.body.mail).toEqual({ status: "failed", to, error: reason });
    expect(res.body.estimate).toMatchObject({ status: "draft", sentAt: null, sentByName: null, validUntil: null, lastSend: { to, status: "failed", error: reason } });
    const [row] = await t.ctx.db.select().from(estimates).where(eq(estimates.id, estimate.id));
    expect(row).toMatchObject({ status: "draft", sentAt: null, sentBy: null, validUntil: null });
    const links = await t.ctx.db.select().from(estimateLinks).where(eq(estimateLinks.estimateId, estimate.id));
    expect(links).toHaveLength(1);
    expect(links[0]!.revokedAt).toBeInstanceOf(Date);
    expect((await t.ctx.db.select().from(workOrders).where(eq(workOrders.id, workOrderId)))[0]!.state).toBe("diagnosing");
    const failed = (await t.ctx.db.select().from(auditLog)).filter((a) => a.recordId === estimate.id && a.action === "estimate.send_failed");
    expect(failed).toHaveLength(1);
    expect(failed[0]!.details).toMatchObject({ to, error: reason });
    // Still a draft: it can be changed before it is sent again.
    await tech.agent.put(`/api/estimates/${estimate.id}`).send({ options: pricedCarbOptions(estimate.options.map((o) => o.id)), note: "Checked again." }).expect(200);

    // The shop fixes its mail server: the same draft goes out.
    await t.ctx.mail.close();
    t.ctx.mail = createMailer({ env: loadEnv({ NODE_ENV: "test" }), db: t.ctx.db, logger: createLogger("silent") });
    const resent = await tech.agent.post(`/api/estimates/${estimate.id}/send`).send({ to });
    expect(resent.body.mail).toEqual({ status: "sent", to, error: null });
    expect(resent.body.estimate).toMatchObject({ status: "sent", lastSend: { status: "sent" } });
    const token = linkToken((await lastMailTo(t.ctx.db, to))!.textBody);
    expect((await t.agent().get(`/api/public/estimates/${token}`)).status).toBe(200);
    expect((await t.ctx.db.select().from(workOrders).where(eq(workOrders.id, workOrderId)))[0]!.state).toBe("waiting_for_approval");
  });
});
