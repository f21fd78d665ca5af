import { execFileSync } from "node:child_process";
import { existsSync } from "node:fs";
import { chromium, type Browser } from "playwright-core";

export const viewports = {
  landscape: { width: 1024, height: 768 },
  portrait: { width: 820, height: 1180 },
} as const;

// Flags that keep Chromium quiet and self-contained on a closed network.
const args = ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];

function commandExists(name: string): boolean {
  try {
    execFileSync("sh", ["-c", `command -v ${name}`], { stdio: "ignore" });
    return true;
  } catch {
    return false;
  }
}

/** CHROME_PATH, else Debian's /usr/bin/chromium; installed with apt-get when we are root, else a clear failure. */
export function findChromium(): string {
  const path = process.env.CHROME_PATH || "/usr/bin/chromium";
  if (existsSync(path)) return path;
  if (process.getuid?.() === 0 && commandExists("apt-get")) {
    execFileSync("sh", ["-c", "apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium"], { stdio: "inherit" });
    if (existsSync("/usr/bin/chromium")) return "/usr/bin/chromium";
  }
  throw new Error(
    `The browser tests need Chromium and found none at ${path}. Install it (Debian/Ubuntu: sudo apt-get install -y chromium) or set CHROME_PATH to a Chromium or Chrome binary.`,
  );
}

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: findChromium(), args });
}
