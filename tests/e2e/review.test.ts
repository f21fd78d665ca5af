// The shop lead's review against the demo's invented history: find a flagged check of the
// apprentice's, read why it was flagged, send it back with a comment; the apprentice then sees it.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, viewports } from "./helpers/browser.ts";
import { startBuiltServer, type RunningServer } from "./helpers/server.ts";
import { snap } from "./helpers/screenshots.ts";
import { seen } from "./helpers/bench-screen.ts";
import { settled, watchPageErrors } from "./helpers/bench-app.ts";
import { demoUser, signInAs } from "./helpers/flow-editor.ts";
import type { SessionFlagsResponse } from "../../shared/schemas/review.ts";

let server: RunningServer;
let browser: Browser;

beforeAll(async () => {
  [server, browser] = await Promise.all([startBuiltServer(), launchBrowser()]);
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const comment = "The plug gap reading looks wrong for this engine. Measure it again with a wire gauge and photograph the gauge.";

describe("reviewing the apprentice's work", () => {
  it("lets the lead filter to flagged checks, read a flag's reason and send one back; the apprentice sees it with the comment", async () => {
    const apprentice = demoUser("apprentice");
    const lead = await browser.newContext({ viewport: viewports.landscape });
    const leadErrors = watchPageErrors(lead);
    await signInAs(lead, server.url, "shop_lead");
    const page = await lead.newPage();
    await page.goto(`${server.url}/review`);
    await page.waitForURL(/\/review\?reviewState=waiting/);
    await seen(page.getByRole("heading", { level: 1, name: "Review" }), "the review queue");

    await page.getByRole("button", { name: /^Filters/ }).click();
    await page.getByRole("combobox", { name: "Tech" }).selectOption({ label: apprentice.name });
    await page.getByRole("combobox", { name: "Flags" }).selectOption({ label: "Flagged only" });
    await page.waitForURL(/flagged=true/);
    expect(new URL(page.url()).searchParams.get("techId")).not.toBeNull();
    const rows = page.getByRole("table", { name: "Sessions" }).getByRole("row").filter({ has: page.getByRole("link", { name: /^WO \d+/ }) });
    await seen(rows.first(), "a flagged session of the apprentice's");
    // The rows of the unfiltered queue stay up until the filtered page arrives.
    const table = page.getByRole("table", { name: "Sessions" });
    await expect.poll(() => table.getAttribute("aria-busy")).toBeNull();
    const texts = await rows.allInnerTexts();
    expect(texts.length).toBeGreaterThan(0);
    for (const text of texts) {
      expect(text).toContain(apprentice.name);
      expect(text).toMatch(/\d+ flags?/);
    }

    // The filtered view is in the address: a reload keeps it.
    const filtered = page.url();
    await page.reload();
    await seen(rows.first(), "the same filtered queue after a reload");
    expect(page.url()).toBe(filtered);
    expect(await page.getByRole("combobox", { name: "Flags" }).inputValue()).toBe("true");
    await settled(page);
    await snap(page, "review-queue-flagged-landscape");

    await rows.first().getByRole("link", { name: /^WO \d+/ }).click();
    await page.waitForURL(/\/review\/sessions\//);
    const sessionId = decodeURIComponent(new URL(page.url()).pathname.split("/").at(-1)!);
    const flagsSection = page.getByRole("region", { name: /^Flags/ });
    await seen(flagsSection, "the flags of the session");
    // The server's own flags for the session: each reason is on the screen as written.
    const flags = (await (await lead.request.get(`${server.url}/api/review/sessions/${sessionId}/flags`)).json()) as SessionFlagsResponse;
    expect(flags.flags.length).toBeGreaterThan(0);
    for (const flag of flags.flags) await seen(flagsSection.getByText(flag.reason, { exact: true }), `the reason "${flag.reason}"`);
    await seen(page.getByRole("heading", { level: 2, name: "Step by step" }), "the timeline");
    await snap(page, "review-session-landscape");

    await page.getByRole("textbox", { name: /Comment for the tech/ }).fill(comment);
    await page.getByRole("button", { name: "Return to the tech" }).click();
    await seen(page.getByText(`Sent back to ${apprentice.name}. Your comment shows on their bench.`), "the sign-off's confirmation");
    const detail = (await (await lead.request.get(`${server.url}/api/sessions/${sessionId}`)).json()) as { reviewState: string; reviewComment: string; events: unknown[] };
    expect(detail).toMatchObject({ reviewState: "returned", reviewComment: comment });
    expect(detail.events.length).toBeGreaterThan(0);
    expect(leadErrors).toEqual([]);
    await lead.close();

    const bench = await browser.newContext({ viewport: viewports.portrait });
    const benchErrors = watchPageErrors(bench);
    await signInAs(bench, server.url, "apprentice");
    const tablet = await bench.newPage();
    await tablet.goto(`${server.url}/bench`);
    const returned = tablet.getByRole("region", { name: "Sent back by the shop lead" });
    await seen(returned.getByText(comment), "the lead's comment on the bench home");
    await settled(tablet);
    await snap(tablet, "review-returned-bench-portrait");
    await tablet.goto(`${server.url}/bench/sessions/${sessionId}`);
    await seen(tablet.getByRole("region", { name: "The shop lead says" }).getByText(comment), "the lead's comment on the session");
    await tablet.getByRole("button", { name: "Open the check again to revise it" }).click();
    // Open again at its finding: one step back, and the session's log grows by that step.
    await tablet.getByRole("button", { name: /Back one step/ }).click();
    type Revised = { status: string; findingStepId: string | null; events: { event: { type: string } }[] };
    const revisedNow = async () => (await (await bench.request.get(`${server.url}/api/sessions/${sessionId}`)).json()) as Revised;
    await expect.poll(async () => (await revisedNow()).events.length, { timeout: 15_000 }).toBe(detail.events.length + 1);
    const revised = await revisedNow();
    expect(revised.status).toBe("open");
    expect(revised.findingStepId).toBeNull();
    expect(revised.events.at(-1)?.event.type).toBe("step.back");
    await snap(tablet, "review-revising-portrait");
    expect(benchErrors).toEqual([]);
    await bench.close();
  }, 120_000);
});
