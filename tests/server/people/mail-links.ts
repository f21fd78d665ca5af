import { desc, eq, sql } from "drizzle-orm";
import { expect } from "vitest";
import { capturedMail, outgoingMail } from "../../../server/db/schema.ts";
import type { TestApp } from "../helpers/test-app.ts";

/** The messages the built-in sink received for an address, newest first. */
export async function mailTo(t: TestApp, address: string) {
  return t.ctx.db
    .select()
    .from(capturedMail)
    .where(sql`${capturedMail.rcptTo} @> ${JSON.stringify([address])}::jsonb`)
    .orderBy(desc(capturedMail.receivedAt), desc(capturedMail.id));
}

export async function outgoingTo(t: TestApp, address: string) {
  return t.ctx.db.select().from(outgoingMail).where(eq(outgoingMail.toAddress, address)).orderBy(desc(outgoingMail.createdAt));
}

/** The one-time link in the newest message to the address, and its token, read from both the text and the HTML part. */
export async function linkInMail(t: TestApp, address: string, page: "welcome" | "reset-password") {
  const [message] = await mailTo(t, address);
  expect(message, `a message to ${address}`).toBeDefined();
  const pattern = new RegExp(`http://bench\\.test/${page}/([A-Za-z0-9_-]{43})`);
  const inText = pattern.exec(message!.textBody);
  const inHtml = pattern.exec(message!.htmlBody);
  expect(inText?.[1], "the link in the text part").toBeDefined();
  expect(inHtml?.[1]).toBe(inText?.[1]);
  return { url: inText![0], token: inText![1]!, message: message! };
}

/** Waits for the sink to have received n messages for the address (a reset is sent after the answer). */
export async function waitForMail(t: TestApp, address: string, n = 1) {
  await expect.poll(async () => (await mailTo(t, address)).length, { timeout: 10_000, message: `mail to ${address}` }).toBe(n);
}
