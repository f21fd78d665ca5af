// Measures how the embedded store starts and refuses: cold start on a new folder, the refusal of a
// second server on the same folder, and the restart after kill -9. Prints one JSON line at the end.
import { spawn } from "node:child_process";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "..", "..");
const entry = path.join(root, "dist", "server", "index.js");
if (!existsSync(entry)) {
  console.error("Build first: npm run build");
  process.exit(1);
}

function start(dataDir: string) {
  const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: "production", DATA_DIR: dataDir, PORT: "0", HOST: "127.0.0.1", LOG_LEVEL: "warn", BACKUPS_KEPT: "0" };
  delete env.DATABASE_URL;
  const began = performance.now();
  const child = spawn(process.execPath, [entry], { env, stdio: ["ignore", "pipe", "pipe"] });
  let text = "";
  child.stdout.on("data", (d: Buffer) => (text += d.toString()));
  child.stderr.on("data", (d: Buffer) => (text += d.toString()));
  const ready = new Promise<number>((resolve, reject) => {
    const timer = setInterval(() => {
      if (/open http/.test(text)) {
        clearInterval(timer);
        resolve(performance.now() - began);
      } else if (child.exitCode !== null) {
        clearInterval(timer);
        reject(new Error(text));
      }
    }, 10);
  });
  const exited = new Promise<{ code: number | null; ms: number }>((resolve) => child.on("exit", (code) => resolve({ code, ms: performance.now() - began })));
  return { child, ready, exited, output: () => text };
}

const dir = mkdtempSync(path.join(os.tmpdir(), "benchpath-bench-"));
try {
  const first = start(dir);
  const coldStartMs = await first.ready;
  const refusals: number[] = [];
  for (let i = 0; i < 3; i++) {
    const second = start(dir);
    second.ready.catch(() => {});
    const { code, ms } = await second.exited;
    if (code !== 1 || !second.output().includes(`process ${first.child.pid}`)) throw new Error(`expected a refusal, got ${code}: ${second.output()}`);
    refusals.push(ms);
  }
  first.child.kill("SIGKILL");
  await first.exited;
  const again = start(dir);
  const restartAfterKillMs = await again.ready;
  again.child.kill("SIGTERM");
  const stopped = await again.exited;
  const worstRefusalMs = Math.max(...refusals);
  const result = {
    benchmark: "startup",
    coldStartMs: Math.round(coldStartMs),
    secondServerRefusedMs: refusals.map(Math.round),
    restartAfterKillMs: Math.round(restartAfterKillMs),
    cleanStopExitCode: stopped.code,
    targets: { secondServerRefusedUnder2000ms: worstRefusalMs < 2000 },
    met: worstRefusalMs < 2000 && stopped.code === 0,
  };
  console.log(JSON.stringify(result));
} finally {
  rmSync(dir, { recursive: true, force: true });
}
