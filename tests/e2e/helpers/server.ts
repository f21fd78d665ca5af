import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "..", "..", "..");

export interface RunningServer {
  url: string;
  dataDir: string;
  output(): string;
  stop(): Promise<void>;
}

/** Starts the production build on a fresh data folder and a free port, with the demo shop seeded. */
export async function startBuiltServer(): Promise<RunningServer> {
  const entry = path.join(root, "dist", "server", "index.js");
  if (!existsSync(entry) || !existsSync(path.join(root, "dist", "client", "index.html")))
    throw new Error("The browser tests run against the production build: run `npm run build` first (npm test does).");
  const dataDir = mkdtempSync(path.join(os.tmpdir(), "benchpath-e2e-"));
  const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: "production", DATA_DIR: dataDir, PORT: "0", HOST: "127.0.0.1", LOG_LEVEL: "warn", BACKUPS_KEPT: "0" };
  delete env.DATABASE_URL;
  const child: ChildProcess = spawn(process.execPath, [entry], { cwd: root, env, stdio: ["ignore", "pipe", "pipe"] });
  let text = "";
  child.stdout!.on("data", (d: Buffer) => (text += d.toString()));
  child.stderr!.on("data", (d: Buffer) => (text += d.toString()));
  const until = Date.now() + 90_000;
  let url: string | undefined;
  while (!url) {
    url = /open (http:\/\/127\.0\.0\.1:\d+)/.exec(text)?.[1];
    if (child.exitCode !== null) throw new Error(`the server exited:\n${text}`);
    if (Date.now() > until) throw new Error(`the server did not start:\n${text}`);
    if (!url) await new Promise((r) => setTimeout(r, 100));
  }
  return {
    url,
    dataDir,
    output: () => text,
    stop: async () => {
      if (child.exitCode === null) {
        const exited = new Promise((r) => child.once("exit", r));
        child.kill("SIGTERM");
        await exited;
      }
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
