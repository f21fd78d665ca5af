// The paths the browser tests take through the handheld 2-stroke check, and what a reload must keep.
import { expect } from "vitest";
import type { SessionDetail } from "../../../shared/schemas/sessions.ts";
import { eventsInStoredSession } from "./bench-app.ts";
import { seen, type BenchScreen, type Move } from "./bench-screen.ts";

export const done = { done: true } as const;
export const choose = (value: string) => ({ choose: value });

export interface FullCheckHooks {
  shot: (name: string) => Promise<void>;
  /** Runs on the step the page is reloaded on, once its caution is acknowledged and saved. */
  reload: (screen: BenchScreen, step: string) => Promise<void>;
}

/** The whole no-start path to a wide ignition air gap: every kind of step, a required photo and a reading. */
export function fullCheck(sessionId: string, hooks: FullCheckHooks): Move[] {
  return [
    { step: "prepare/protect", answer: done, arrived: () => hooks.shot("step-cautions") },
    { step: "prepare/as-received", answer: done, arrived: () => hooks.shot("step-photo"), ready: () => hooks.shot("step-photo-taken") },
    { step: "prepare/secure", answer: done },
    { step: "prepare/controls", answer: choose("yes"), arrived: () => hooks.shot("step-choice") },
    { step: "prepare/fuel-valve", answer: choose("none") },
    { step: "prepare/fuel-tank", answer: choose("fresh") },
    { step: "prepare/oil-level", answer: choose("none") },
    { step: "prepare/reproduce", answer: done },
    { step: "prepare/reproduce-result", answer: choose("no") },
    { step: "spark/connect", answer: done },
    // Mid-check: the tablet has sat on the step until its stored copy holds every saved answer, then the caution is acknowledged.
    { step: "spark/pull", answer: done, arrived: (screen) => storedCopyCaughtUp(screen, sessionId), ready: (screen) => hooks.reload(screen, "spark/pull") },
    { step: "spark/flash", answer: choose("none") },
    { step: "spark/stop-lead", answer: done },
    { step: "spark/stop-lead-result", answer: choose("no") },
    { step: "spark/wiring", answer: done },
    { step: "spark/wiring-result", answer: choose("no") },
    { step: "spark/air-gap", answer: { read: { keys: "0.5", unit: "mm" } }, ready: () => hooks.shot("keypad"), verdict: () => hooks.shot("reading-verdict") },
    { step: "spark/gap-reset", answer: done },
    { step: "spark/gap-reset-result", answer: choose("yes") },
  ];
}

async function storedCopyCaughtUp(screen: BenchScreen, sessionId: string): Promise<void> {
  await screen.expectSaved();
  await expect.poll(() => eventsInStoredSession(screen.page, sessionId), { timeout: 5_000, message: "the stored copy of the session" }).toBe(screen.entered.length);
}

/** Right after the screen says Saved, a reload must open the same step with its acknowledgement kept. */
export async function reloadAndResume(screen: BenchScreen, step: string): Promise<void> {
  const { page } = screen;
  await screen.expectSaved();
  const count = await screen.stepCount();
  await page.reload();
  await screen.expectAt(step);
  const acknowledged = page.getByText("You have read this and will work with care.");
  const askedAgain = page.getByRole("button", { name: "Read and understood" });
  await acknowledged.first().waitFor({ timeout: 5_000 }).catch(() => undefined);
  // Soft, so one wrong resume still lets the rest of the check be tried and reported.
  expect.soft(await screen.stepCount(), "the step count after the reload").toBe(count);
  expect.soft(await acknowledged.count(), "the acknowledgement given before the reload, still shown after it").toBeGreaterThan(0);
  expect.soft(await askedAgain.count(), "acknowledgements asked for again after the reload").toBe(0);
  if ((await askedAgain.count()) > 0) {
    // The screen opened an older copy than the server holds: the server refuses the repeat, and the screen moves to its copy.
    await askedAgain.first().click();
    await seen(page.getByRole("alert").filter({ hasText: "This check changed on another screen" }), "the note that the screen was put back on the server's copy");
  }
  expect(await page.getByRole("button", { name: "I have done this" }).isEnabled()).toBe(true);
}

/** Stored once each, numbered 1, 2, 3, ... in the order they were given. */
export function expectCleanLog(detail: SessionDetail): void {
  expect(detail.events.map((e) => e.seq)).toEqual(detail.events.map((_, i) => i + 1));
  expect(new Set(detail.events.map((e) => e.id)).size, "client ids stored more than once").toBe(detail.events.length);
}
