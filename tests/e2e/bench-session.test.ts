import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { launchBrowser, viewports } from "./helpers/browser.ts";
import { startBuiltServer, type RunningServer } from "./helpers/server.ts";
import { snap } from "./helpers/screenshots.ts";
import { BenchScreen, builtInFlow, seen } from "./helpers/bench-screen.ts";
import { choose, done, expectCleanLog, fullCheck, reloadAndResume } from "./helpers/check-plans.ts";
import { createWorkOrderByApi, getSession, makeJpeg, sessionIdOf, settled, signInByApi, signInOnScreen, trimmerIntake, waitingInStorage, watchPageErrors } from "./helpers/bench-app.ts";
import { checkInButton, expectNeededAnswers, fillIntake } from "./helpers/intake-screen.ts";

let server: RunningServer;
let browser: Browser;
let photo: Buffer;
const flow = builtInFlow("handheld-2-stroke-no-start");

beforeAll(async () => {
  [server, browser, photo] = await Promise.all([startBuiltServer(), launchBrowser(), makeJpeg()]);
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

for (const [orientation, viewport] of Object.entries(viewports)) {
  describe(`the bench at ${viewport.width}x${viewport.height}`, () => {
    it("checks a unit in, runs the 2-stroke check through a reload to a finding, and completes it", async () => {
      const context = await browser.newContext({ viewport });
      const errors = watchPageErrors(context);
      const page = await context.newPage();
      page.setDefaultTimeout(10_000);
      const shot = async (name: string) => {
        await settled(page);
        await snap(page, `bench-${name}-${orientation}`);
      };
      try {
        await signInOnScreen(page, server.url, () => shot("sign-in"));
        await seen(page.getByRole("heading", { level: 2, name: /^Waiting for diagnosis \(\d+\)$/ }), "the loaded queue of waiting units");
        await shot("home");

        await page.getByRole("link", { name: "Check in a unit" }).click();
        await seen(page.getByRole("heading", { level: 1, name: "Check in a unit" }), "the check-in form");
        await shot("intake");
        await expectNeededAnswers(page);
        await shot("intake-errors");
        await fillIntake(page, trimmerIntake);
        await shot("intake-filled");
        await checkInButton(page).click();

        const { make, model } = trimmerIntake.unit;
        await seen(page.getByRole("heading", { level: 1, name: `${make} ${model} string trimmer` }), "the new work order");
        await seen(page.getByText(`for ${trimmerIntake.customer.name}`), "the customer's name on the work order");
        const start = page.getByRole("button", { name: flow.title, exact: true });
        await seen(start, `the start button of "${flow.title}"`);
        await shot("work-order");
        await start.click();
        await page.waitForURL(/\/bench\/sessions\/[^/]+$/);
        const sessionId = sessionIdOf(page);

        const screen = new BenchScreen(page, flow, photo);
        await screen.playAll(fullCheck(sessionId, { shot, reload: reloadAndResume }));

        await screen.expectAt("spark/air-gap-out");
        expect(await page.getByText("Finding · Confirmed by the checks").count()).toBe(1);
        expect(await page.getByRole("region", { name: "Readings" }).innerText()).toContain("0.5 mm");
        await screen.expectSaved();
        await shot("finding");
        await page.getByRole("button", { name: "Complete the check" }).click();
        await seen(page.getByText("Completed: the check now waits for the shop lead's review."), "the closed check");
        await shot("closed");

        const detail = await getSession(page, server.url, sessionId);
        expect(detail.status).toBe("completed");
        expect(detail.reviewState).toBe("waiting");
        expect(detail.findingStepId).toBe("spark/air-gap-out");
        expect(detail.completedAt).not.toBeNull();
        expect(detail.events.map((e) => e.event)).toEqual(screen.entered);
        expectCleanLog(detail);
        const attached = detail.events.map((e) => e.event).find((e) => e.type === "photo.attach");
        const image = await page.request.get(`${server.url}/api/attachments/${attached?.type === "photo.attach" ? attached.attachmentId : "none"}`);
        expect(image.status()).toBe(200);
        expect(image.headers()["content-type"]).toMatch(/^image\//);
        expect(errors).toEqual([]);
      } finally {
        await context.close();
      }
    });

    it("keeps answers given offline and saves each exactly once, in order, when the connection is back", async () => {
      const context = await browser.newContext({ viewport });
      const errors = watchPageErrors(context);
      await signInByApi(context, server.url);
      let page: Page = await context.newPage();
      page.setDefaultTimeout(10_000);
      const intake = { ...trimmerIntake, customer: { name: "Odile Brackwater", phone: "555-0163", email: "" }, unit: { ...trimmerIntake.unit, model: "FT-300" } };
      const workOrderId = await createWorkOrderByApi(page, server.url, intake);
      try {
        await page.goto(`${server.url}/work-orders/${workOrderId}`);
        await page.getByRole("button", { name: flow.title, exact: true }).click();
        await page.waitForURL(/\/bench\/sessions\/[^/]+$/);
        const sessionId = sessionIdOf(page);
        const sessionUrl = page.url();
        const screen = new BenchScreen(page, flow, photo);
        await screen.playAll([
          { step: "prepare/protect", answer: done },
          { step: "prepare/as-received", answer: done },
          { step: "prepare/secure", answer: done },
        ]);
        await screen.expectAt("prepare/controls");
        await screen.expectSaved();
        const online = screen.entered.length;
        expect((await getSession(page, server.url, sessionId)).events).toHaveLength(online);

        // The app keeps its own files once its service worker is running; only then can it open offline.
        await page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
        await context.setOffline(true);
        const offlineAnswers = [
          ["prepare/controls", "yes", "prepare/fuel-valve"],
          ["prepare/fuel-valve", "none", "prepare/fuel-tank"],
          ["prepare/fuel-tank", "fresh", "prepare/oil-level"],
        ] as const;
        for (const [step, value, next] of offlineAnswers) {
          await screen.play({ step, answer: choose(value) });
          // The screen goes on at once; it does not wait for the server.
          await screen.expectAt(next, 2_000);
        }
        await expect.poll(() => screen.saveStatus().innerText(), { timeout: 5_000 }).toBe("Waiting for the connection (3 answers kept on this tablet)");
        await settled(page);
        await snap(page, `bench-offline-waiting-${orientation}`);
        await expect.poll(() => waitingInStorage(page, sessionId).then((kept) => kept.length), { timeout: 5_000, message: "the three answers in IndexedDB" }).toBe(3);
        const kept = await waitingInStorage(page, sessionId);
        expect(kept.map((r) => r.event)).toEqual(screen.entered.slice(online));
        expect(kept.map((r) => r.seq)).toEqual([online + 1, online + 2, online + 3]);
        expect((await getSession(page, server.url, sessionId)).events, "the server has none of the offline answers yet").toHaveLength(online);

        // Opening the check again while offline: the kept app and the kept cache show it at the same step, still waiting.
        const probe = await context.newPage();
        await probe.goto(sessionUrl);
        await new BenchScreen(probe, flow, photo).expectAt("prepare/oil-level");
        await seen(probe.getByText("Waiting for the connection (3 answers kept on this tablet)"), "the waiting answers after an offline reload");
        await probe.close();

        await context.setOffline(false);
        await screen.expectSaved();
        let detail = await getSession(page, server.url, sessionId);
        expect(detail.events.slice(online).map((e) => e.id)).toEqual(kept.map((r) => r.id));
        expect(detail.events.slice(online).map((e) => e.event)).toEqual(kept.map((r) => r.event));
        expectCleanLog(detail);

        // An answer given offline survives the tab being closed, and is saved once when the check is opened again.
        await context.setOffline(true);
        await screen.play({ step: "prepare/oil-level", answer: choose("none") });
        await screen.expectAt("prepare/reproduce", 2_000);
        await expect.poll(() => waitingInStorage(page, sessionId).then((k) => k.length), { timeout: 5_000, message: "the answer in IndexedDB" }).toBe(1);
        const [last] = await waitingInStorage(page, sessionId);
        await page.close();
        await context.setOffline(false);
        page = screen.page = await context.newPage();
        page.setDefaultTimeout(10_000);
        await page.goto(sessionUrl);
        await screen.expectAt("prepare/reproduce");
        await screen.expectSaved();
        detail = await getSession(page, server.url, sessionId);
        expect(detail.events.map((e) => e.event)).toEqual(screen.entered);
        expect(detail.events.at(-1)?.id).toBe(last?.id);
        expectCleanLog(detail);
        expect(errors).toEqual([]);
      } finally {
        await context.close();
      }
    });
  });
}
