// The shop lead at the board: move a seeded ticket one step and see who moved it; record a test run
// after a repair; and change the shop settings, with an unknown currency refused beside its field.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { launchBrowser, viewports } from "./helpers/browser.ts";
import { startBuiltServer, type RunningServer } from "./helpers/server.ts";
import { snap } from "./helpers/screenshots.ts";
import { seen } from "./helpers/bench-screen.ts";
import { createWorkOrderByApi, settled, trimmerIntake, watchPageErrors } from "./helpers/bench-app.ts";
import { demoUser, signInAs } from "./helpers/flow-editor.ts";
import type { BoardResponse } from "../../shared/schemas/board.ts";
import type { SettingsResponse } from "../../shared/schemas/settings.ts";
import type { WorkOrderState } from "../../shared/schemas/work-orders.ts";

let server: RunningServer;
let browser: Browser;

beforeAll(async () => {
  [server, browser] = await Promise.all([startBuiltServer(), launchBrowser()]);
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const lead = demoUser("shop_lead");
const column = (page: Page, label: string) => page.getByRole("region", { name: new RegExp(`^${label}`) });

async function board(page: Page): Promise<BoardResponse> {
  return (await (await page.request.get(`${server.url}/api/work-orders/board`)).json()) as BoardResponse;
}

async function moveByApi(page: Page, id: string, road: WorkOrderState[]) {
  for (let i = 1; i < road.length; i += 1) {
    const res = await page.request.post(`${server.url}/api/work-orders/${id}/moves`, { headers: { origin: server.url }, data: { expectedFrom: road[i - 1], to: road[i] } });
    expect(res.status(), await res.text()).toBe(200);
  }
}

describe("the work-order board", () => {
  it("lets the shop lead move a seeded ticket one step and shows who moved it", async () => {
    const context = await browser.newContext({ viewport: viewports.landscape });
    const errors = watchPageErrors(context);
    await signInAs(context, server.url, "shop_lead");
    const page = await context.newPage();
    await page.goto(`${server.url}/work-orders`);
    await page.getByRole("link", { name: "Board view" }).click();
    await page.waitForURL(/\/work-orders\/board$/);
    await seen(page.getByRole("heading", { level: 1, name: "Work-order board" }), "the board");

    const before = await board(page);
    const waiting = before.columns.find((c) => c.state === "waiting_for_approval")!;
    expect(waiting.tickets.length, "the demo history has tickets waiting for approval").toBeGreaterThan(0);
    const ticket = waiting.tickets[0]!;
    const card = column(page, "Waiting for approval").getByRole("article", { name: `WO ${ticket.number}` });
    await seen(card, `WO ${ticket.number} in its column`);
    await settled(page);
    await snap(page, "board-landscape");

    await card.getByRole("button", { name: "Move to…" }).click();
    const choices = card.getByRole("group", { name: `Move WO ${ticket.number} to` });
    // Only the moves the shop allows from waiting for approval are offered.
    expect(await choices.getByRole("button").allInnerTexts()).toEqual(["Approved", "Declined", "Ready for pick-up", "Cancel"]);
    await snap(page, "board-move-open-landscape");
    await choices.getByRole("button", { name: "Approved" }).click();

    await seen(page.getByRole("status").getByText(`WO ${ticket.number} moved to Approved.`), "the move's confirmation");
    const moved = column(page, "Approved").getByRole("article", { name: `WO ${ticket.number}` });
    await seen(moved.getByText(new RegExp(`^Moved by ${lead.name}, `)), "who moved it, on the card in its new column");
    await expect.poll(async () => (await column(page, "Waiting for approval").getByRole("article", { name: `WO ${ticket.number}` }).count())).toBe(0);

    const after = await board(page);
    const there = after.columns.find((c) => c.state === "approved")!.tickets.find((x) => x.id === ticket.id);
    expect(there?.movedBy?.name).toBe(lead.name);
    expect(Date.parse(there!.movedAt)).toBeGreaterThan(Date.parse(before.at) - 5_000);

    const tall = await context.newPage();
    await tall.setViewportSize(viewports.portrait);
    await tall.goto(`${server.url}/work-orders/board`);
    await seen(tall.getByRole("heading", { level: 1, name: "Work-order board" }), "the board upright");
    await settled(tall);
    await snap(tall, "board-portrait");
    expect(errors).toEqual([]);
    await context.close();
  });

  it("records a test run with a failed check shown plainly, and lets a passed one send the unit out", async () => {
    const context = await browser.newContext({ viewport: viewports.landscape });
    const errors = watchPageErrors(context);
    await signInAs(context, server.url, "shop_lead");
    const page = await context.newPage();
    const id = await createWorkOrderByApi(page, server.url, trimmerIntake);
    await moveByApi(page, id, ["waiting_for_diagnosis", "diagnosing", "waiting_for_approval", "approved", "in_repair", "test_run"]);

    await page.goto(`${server.url}/work-orders/${id}`);
    const section = page.getByRole("region", { name: "Test run" });
    await seen(section, "the test-run checklist");
    await seen(section.getByText("WARNING"), "the warning before the test run");
    await section.getByRole("button", { name: "Read and understood" }).click();
    for (const question of ["Does the throttle return to idle freely when let go?", "Does the stop switch stop the engine?", "Does the engine idle steadily without stalling?", "Does it run under load without bogging or dying?"])
      await section.getByRole("radiogroup", { name: question }).getByText("Yes", { exact: true }).click();
    // Left unanswered, the fifth check is named beside itself.
    await section.getByRole("button", { name: "Save the test run" }).click();
    const attachment = section.getByRole("radiogroup", { name: "Does the cutting attachment stay still at idle?" });
    await seen(attachment.getByText("Answer yes or no."), "the unanswered check's message");
    await attachment.getByText("No", { exact: true }).click();
    await section.getByRole("textbox", { name: /Note/ }).fill("Line head creeps at idle: clutch spring.");
    await settled(page);
    await snap(page, "test-run-checklist-landscape");
    await section.getByRole("button", { name: "Save the test run" }).click();
    const latest = section.getByLabel("Latest test run");
    await seen(latest.getByText("Failed: 1 of 5 checks"), "the failed run");
    await seen(latest.getByText(/Does the cutting attachment stay still at idle\? No — failed\./), "the failed check, in words");

    // The gate: a failed run does not let it go out.
    const refused = await page.request.post(`${server.url}/api/work-orders/${id}/moves`, { headers: { origin: server.url }, data: { expectedFrom: "test_run", to: "ready_for_pickup" } });
    expect(refused.status()).toBe(409);

    await section.getByRole("button", { name: "Read and understood" }).click();
    for (const group of await section.getByRole("radiogroup").all()) await group.getByText("Yes", { exact: true }).click();
    await section.getByRole("button", { name: "Save the test run" }).click();
    await seen(latest.getByText("Passed"), "the passed run");
    await seen(section.getByRole("link", { name: "Move it to ready for pick-up on the board" }), "the way on after a pass");
    expect(await section.getByRole("button", { name: "Save the test run" }).count()).toBe(0);
    const tall = await context.newPage();
    await tall.setViewportSize(viewports.portrait);
    await tall.goto(`${server.url}/work-orders/${id}`);
    await seen(tall.getByRole("region", { name: "Test run" }), "the checklist upright");
    await settled(tall);
    await snap(tall, "test-run-checklist-portrait");

    await page.goto(`${server.url}/work-orders/board`);
    const card = column(page, "Test run").getByRole("article", { name: /^WO \d+$/ }).filter({ hasText: trimmerIntake.customer.name });
    await card.getByRole("button", { name: "Move to…" }).click();
    await card.getByRole("button", { name: "Ready for pick-up" }).click();
    await seen(column(page, "Ready for pick-up").getByRole("article").filter({ hasText: trimmerIntake.customer.name }), "the unit ready for pick-up");
    expect(errors).toEqual([]);
    await context.close();
  });
});

describe("shop settings", () => {
  it("refuses an unknown currency beside the field and saves a valid change", async () => {
    const context = await browser.newContext({ viewport: viewports.landscape });
    const errors = watchPageErrors(context);
    await signInAs(context, server.url, "shop_lead");
    const page = await context.newPage();
    await page.goto(`${server.url}/settings`);
    await seen(page.getByRole("heading", { level: 1, name: "Shop settings" }), "the settings screen");
    const currency = page.getByRole("textbox", { name: "Currency" });
    expect(await currency.inputValue()).toBe("USD");
    await settled(page);
    await snap(page, "settings-landscape");

    await currency.fill("XYZ");
    await page.getByRole("button", { name: "Save settings" }).click();
    const message = "“XYZ” is not an ISO 4217 currency code. Use three letters such as USD, EUR or CAD.";
    await seen(page.locator("#settings-currency-error").getByText(message), "the currency's message beside it");
    expect(await currency.getAttribute("aria-invalid")).toBe("true");
    await page.evaluate(() => document.getElementById("settings-currency")?.scrollIntoView({ block: "center" }));
    await snap(page, "settings-currency-refused-landscape");
    let stored = (await (await page.request.get(`${server.url}/api/settings`)).json()) as SettingsResponse;
    expect(stored.currency).toBe("USD");

    await currency.fill("EUR");
    await page.getByRole("textbox", { name: /Tax rate/ }).fill("8.25");
    await page.getByRole("button", { name: "Save settings" }).click();
    await seen(page.getByRole("status").getByText("Settings saved."), "the saved confirmation");
    stored = (await (await page.request.get(`${server.url}/api/settings`)).json()) as SettingsResponse;
    // 8.25 % is 825 basis points.
    expect(stored).toMatchObject({ currency: "EUR", taxRateBasisPoints: 825 });
    expect(await currency.getAttribute("aria-invalid")).toBeNull();

    const tall = await context.newPage();
    await tall.setViewportSize(viewports.portrait);
    await tall.goto(`${server.url}/settings`);
    await seen(tall.getByRole("heading", { level: 1, name: "Shop settings" }), "the settings upright");
    await settled(tall);
    await snap(tall, "settings-portrait");
    expect(errors).toEqual([]);
    await context.close();
  });
});
