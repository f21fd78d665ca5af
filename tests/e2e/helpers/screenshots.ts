import { mkdirSync } from "node:fs";
import path from "node:path";
import type { Page } from "playwright-core";

const folder = path.resolve(import.meta.dirname, "..", "..", "..", "artifacts", "screenshots");

/** Saves a full-page screenshot into the gitignored artifacts folder, for people to look at. */
export async function snap(page: Page, name: string): Promise<void> {
  mkdirSync(folder, { recursive: true });
  await page.screenshot({ path: path.join(folder, `${name}.png`), fullPage: true });
}
