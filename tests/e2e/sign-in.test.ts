import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, viewports } from "./helpers/browser.ts";
import { startBuiltServer, type RunningServer } from "./helpers/server.ts";
import { snap } from "./helpers/screenshots.ts";
import { demoUsers } from "../../server/db/seed/demo.ts";

let server: RunningServer;
let browser: Browser;

beforeAll(async () => {
  [server, browser] = await Promise.all([startBuiltServer(), launchBrowser()]);
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const homes = { apprentice: "/bench", senior_tech: "/flows", shop_lead: "/review" } as const;
const navigation = {
  apprentice: ["Bench", "Work orders"],
  senior_tech: ["Flows", "Bench", "Work orders"],
  shop_lead: ["Review", "Flows", "Shop insight", "Work orders", "Shop settings", "People"],
} as const;

for (const [orientation, viewport] of Object.entries(viewports)) {
  describe(`signing in at ${viewport.width}x${viewport.height}`, () => {
    for (const demo of demoUsers) {
      it(`takes the ${demo.role} to their home with only their navigation, and signs out`, async () => {
        const context = await browser.newContext({ viewport });
        const page = await context.newPage();
        const errors: string[] = [];
        page.on("pageerror", (e) => errors.push(e.message));
        await page.goto(`${server.url}/`);
        await page.waitForURL(/\/sign-in/);
        if (demo.role === "apprentice") await snap(page, `sign-in-${orientation}`);
        await page.getByLabel(/e-mail/i).fill(demo.email);
        await page.getByLabel(/^password$/i).fill(demo.password);
        await page.getByRole("button", { name: /^sign in$/i }).click();
        // The shop lead's home opens on its default view (/review?reviewState=waiting).
        await page.waitForURL(new RegExp(`${homes[demo.role]}(\\?[^#]*)?$`));
        // The home's lazy chunk may still be loading when the address changes: wait for the navigation.
        const links = page.getByRole("navigation", { name: /areas/i }).getByRole("link");
        await expect.poll(async () => (await links.allInnerTexts()).map((l) => l.trim()), { timeout: 15_000 }).toEqual(navigation[demo.role]);
        await snap(page, `home-${demo.role}-${orientation}`);
        await page.getByRole("button", { name: /sign out/i }).click();
        await page.waitForURL(/\/sign-in/);
        await page.goto(`${server.url}${homes[demo.role]}`);
        await page.waitForURL(/\/sign-in/);
        expect(errors).toEqual([]);
        await context.close();
      });
    }

    it("says clearly when the password is wrong, and keeps the e-mail", async () => {
      const context = await browser.newContext({ viewport });
      const page = await context.newPage();
      await page.goto(`${server.url}/sign-in`);
      await page.getByLabel(/e-mail/i).fill(demoUsers[0]!.email);
      await page.getByLabel(/^password$/i).fill("not-the-password");
      await page.getByRole("button", { name: /^sign in$/i }).click();
      await expect.poll(() => page.getByRole("alert").innerText()).toMatch(/do not match/i);
      expect(await page.getByLabel(/e-mail/i).inputValue()).toBe(demoUsers[0]!.email);
      expect(page.url()).toMatch(/\/sign-in/);
      await snap(page, `sign-in-wrong-password-${orientation}`);
      await context.close();
    });
  });
}
