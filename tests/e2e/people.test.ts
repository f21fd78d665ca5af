import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, BrowserContext } from "playwright-core";
import { launchBrowser, viewports } from "./helpers/browser.ts";
import { startBuiltServer, type RunningServer } from "./helpers/server.ts";
import { snap } from "./helpers/screenshots.ts";
import { settled, watchPageErrors } from "./helpers/bench-app.ts";
import { seen } from "./helpers/bench-screen.ts";
import { demoUsers } from "../../server/db/seed/demo.ts";
import type { CapturedMail, InboxResponse } from "../../shared/schemas/mail.ts";

let server: RunningServer;
let browser: Browser;
beforeAll(async () => {
  [server, browser] = await Promise.all([startBuiltServer(), launchBrowser()]);
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const screenshots = path.resolve(import.meta.dirname, "..", "..", "artifacts", "screenshots");
const lead = demoUsers.find((u) => u.role === "shop_lead")!;

async function signInAsLead(context: BrowserContext) {
  const res = await context.request.post(`${server.url}/api/auth/sign-in`, { headers: { origin: server.url }, data: { email: lead.email, password: lead.password } });
  expect(res.status(), await res.text()).toBe(200);
}

/** The welcome link in the newest message the sink received for the address, read as the shop lead through the mail API. */
async function welcomeLinkFor(context: BrowserContext, address: string): Promise<{ id: string; link: string }> {
  let id: string | undefined;
  await expect
    .poll(async () => {
      const inbox = (await (await context.request.get(`${server.url}/api/mail/inbox`)).json()) as InboxResponse;
      id = inbox.messages.find((m) => m.to.includes(address))?.id;
      return id;
    }, { timeout: 10_000 })
    .toBeDefined();
  const message = (await (await context.request.get(`${server.url}/api/mail/inbox/${id!}`)).json()) as CapturedMail;
  const link = new RegExp(`${server.url.replace(/[.:/]/g, "\\$&")}/welcome/[A-Za-z0-9_-]{43}`).exec(message.text)?.[0];
  expect(link, message.text).toBeDefined();
  return { id: id!, link: link! };
}

for (const [orientation, viewport] of Object.entries(viewports)) {
  describe(`people at ${viewport.width}x${viewport.height}`, () => {
    it("the shop lead invites someone, who joins through the e-mailed link and signs in", async () => {
      const name = orientation === "landscape" ? "Ida Fenwick" : "Bram Solberg";
      const email = orientation === "landscape" ? "ida.fenwick@example.com" : "bram.solberg@example.com";
      const password = "new-recoil-rope-and-pulley";

      const leadContext = await browser.newContext({ viewport });
      const leadErrors = watchPageErrors(leadContext);
      await signInAsLead(leadContext);
      const page = await leadContext.newPage();
      await page.goto(`${server.url}/people`);
      await seen(page.getByRole("heading", { level: 1, name: "People" }), "the People screen");
      await seen(page.getByRole("listitem", { name: lead.name }), "the shop lead in the list");

      // Submitting empty shows each problem beside its field.
      await page.getByRole("button", { name: "Send the invitation" }).click();
      await expect.poll(() => page.getByLabel("Name").getAttribute("aria-invalid")).toBe("true");
      expect(await page.getByRole("textbox", { name: /^E-mail/ }).getAttribute("aria-invalid")).toBe("true");

      await page.getByLabel("Name").fill(name);
      await page.getByRole("textbox", { name: /^E-mail/ }).fill(email);
      await page.getByLabel("Role", { exact: false }).first().selectOption("apprentice");
      await page.getByRole("button", { name: "Send the invitation" }).click();
      await seen(page.getByText(`An invitation is on its way to ${name} at ${email}.`), "the note that the invitation went out");
      const row = page.getByRole("listitem", { name });
      await seen(row.getByText("Invited", { exact: true }), "the new person marked invited");
      await settled(page);
      await snap(page, `people-${orientation}`);

      const { id, link } = await welcomeLinkFor(leadContext, email);
      await page.getByRole("link", { name: "Sent mail" }).click();
      await seen(page.getByRole("heading", { level: 1, name: "Sent mail" }), "the Sent mail screen");
      await seen(page.getByRole("row", { name: new RegExp(email) }).getByText("Sent", { exact: true }), "the invitation listed as sent");
      await page.getByRole("list", { name: "Received messages" }).getByRole("button", { name: new RegExp(email) }).first().click();
      expect(page.url()).toContain(`message=${id}`);
      const frame = page.frameLocator("iframe[sandbox]");
      await seen(frame.getByRole("link", { name: "Choose your password" }), "the HTML part in its sandboxed frame");
      expect(await page.locator("iframe[sandbox]").getAttribute("sandbox")).toBe("");
      await seen(page.getByRole("region", { name: "Text part" }).getByText(link, { exact: false }), "the text part with the link");
      await settled(page);
      await snap(page, `sent-mail-${orientation}`);
      // A full-page capture leaves the sandboxed frame blank (it paints in its own process): capture the message too.
      await page.getByRole("article").scrollIntoViewIfNeeded();
      await page.getByRole("article").screenshot({ path: path.join(screenshots, `sent-mail-message-${orientation}.png`) });

      // The invitee opens the link on another device: no session, nothing shared with the lead.
      const fresh = await browser.newContext({ viewport });
      const freshErrors = watchPageErrors(fresh);
      const welcome = await fresh.newPage();
      await welcome.goto(link);
      await seen(welcome.getByRole("heading", { level: 1, name: `Welcome, ${name}` }), "the welcome page");
      await settled(welcome);
      await snap(welcome, `welcome-${orientation}`);
      await welcome.getByLabel("New password").fill(password);
      await welcome.getByLabel("The same password again").fill("not-the-same-password");
      await welcome.getByRole("button", { name: "Join the shop" }).click();
      await seen(welcome.getByText("The two passwords are not the same."), "the mismatch beside the second field");
      await welcome.getByLabel("The same password again").fill(password);
      await welcome.getByRole("button", { name: "Join the shop" }).click();
      await seen(welcome.getByRole("heading", { level: 1, name: "Your password is set" }), "the confirmation");
      await welcome.getByRole("link", { name: "Sign in" }).click();
      await welcome.waitForURL(/\/sign-in/);
      await welcome.getByLabel(/e-mail/i).fill(email);
      await welcome.getByLabel(/^password$/i).fill(password);
      await welcome.getByRole("button", { name: /^sign in$/i }).click();
      await welcome.waitForURL(/\/bench$/);
      await seen(welcome.getByText(name, { exact: true }), "the new person's name in the header");

      // Their own units: saved to their account.
      const metric = welcome.getByRole("group", { name: "Measurement system" }).getByRole("button", { name: /Metric/ });
      await metric.click();
      await expect.poll(() => metric.getAttribute("aria-pressed")).toBe("true");
      await expect.poll(async () => ((await (await welcome.request.get(`${server.url}/api/auth/me`)).json()) as { user: { unitSystem: string } }).user.unitSystem).toBe("metric");

      // The link works once.
      await welcome.goto(link);
      await seen(welcome.getByRole("heading", { level: 1, name: "This link has already been used" }), "the used-link page");
      await snap(welcome, `welcome-used-${orientation}`);

      await page.goto(`${server.url}/people`);
      await seen(page.getByRole("listitem", { name }).getByText("Active", { exact: true }), "the new person now active");
      expect(leadErrors).toEqual([]);
      expect(freshErrors).toEqual([]);
      await fresh.close();
      await leadContext.close();
    }, 90_000);
  });
}

it("asks for a reset link from the sign-in page and always answers the same way", async () => {
  const context = await browser.newContext({ viewport: viewports.landscape });
  const page = await context.newPage();
  await page.goto(`${server.url}/sign-in`);
  await page.getByRole("link", { name: "Forgot your password?" }).click();
  await page.waitForURL(/\/forgot-password$/);
  await page.getByRole("button", { name: "Send me a link" }).click();
  await seen(page.getByText("Enter an e-mail address, for example name@shop.example."), "the e-mail problem beside the field");
  await page.getByLabel("E-mail").fill("nobody.at.all@example.com");
  await page.getByRole("button", { name: "Send me a link" }).click();
  await seen(page.getByText(/If that address belongs to someone here, a link is on its way/), "the same answer for everyone");
  await snap(page, "forgot-password-landscape");
  await context.close();
}, 60_000);
