import { existsSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import type { AddressInfo } from "node:net";
import type { RequestHandler } from "express";
import { createApp } from "./app.ts";
import { createContext } from "./context.ts";
import { EnvError, loadEnv, type Env } from "./env.ts";
import { createLogger } from "./lib/logger.ts";
import { DataFolderLockedError } from "./db/lock.ts";
import { healthProbe, openStore } from "./db/open.ts";
import { demoSignInLines, isEmpty, seedDemo, demoShop, demoUsers } from "./db/seed/demo.ts";
import { rollingBackup } from "./backup.ts";
import { eq } from "drizzle-orm";
import { users } from "./db/schema.ts";
import { BuiltInFlowError, loadBuiltInFlows } from "./flows/builtin.ts";
import { installBuiltInFlows } from "./services/flows.ts";
import { seedHistory } from "./db/seed/history.ts";
import { storageFor } from "./storage/storage.ts";

const here = path.dirname(fileURLToPath(import.meta.url));

function fail(message: string): never {
  process.stderr.write(`${message}\n`);
  process.exit(1);
}

async function devClient(env: Env): Promise<RequestHandler | null> {
  if (env.NODE_ENV !== "development") return null;
  const { createServer } = await import("vite");
  const vite = await createServer({ server: { middlewareMode: true }, appType: "spa" });
  return vite.middlewares as unknown as RequestHandler;
}

function urls(address: AddressInfo, host: string): string[] {
  if (host !== "0.0.0.0" && host !== "::") return [`http://${host}:${address.port}`];
  const lan = Object.values(os.networkInterfaces())
    .flat()
    .filter((i) => i && i.family === "IPv4" && !i.internal)
    .map((i) => `http://${i!.address}:${address.port}`);
  return [`http://localhost:${address.port}`, ...lan];
}

async function main() {
  let env: Env;
  try {
    env = loadEnv();
  } catch (error) {
    if (error instanceof EnvError) fail(error.message);
    throw error;
  }
  const logger = createLogger(env.LOG_LEVEL);
  let builtInFlows;
  try {
    builtInFlows = loadBuiltInFlows();
  } catch (error) {
    if (error instanceof BuiltInFlowError) fail(`Benchpath cannot start. ${error.message}`);
    throw error;
  }
  let store;
  try {
    store = await openStore(env);
  } catch (error) {
    if (error instanceof DataFolderLockedError) fail(`Benchpath cannot start. ${error.message}`);
    throw error;
  }
  const { handle } = store;
  const firstStart = env.SEED_DEMO && (await isEmpty(handle.db));
  if (firstStart) {
    await seedDemo(handle.db);
    logger.info("seeded the demo shop");
  }
  const installed = await installBuiltInFlows(handle.db, builtInFlows);
  if (installed.length > 0) logger.info({ flows: installed }, "installed built-in flows");
  // The history runs on the built-in flows, so it comes after them.
  if (firstStart) logger.info(await seedHistory(handle.db, storageFor(env)), "added the demo shop's history");
  const ctx = createContext({ db: handle.db, env, logger, health: healthProbe(handle) });
  const clientDir = [path.resolve(here, "..", "client"), path.resolve(here, "..", "dist", "client")].find((d) => existsSync(path.join(d, "index.html")));
  const app = createApp(ctx, { clientDir: clientDir ?? null, clientMiddleware: await devClient(env) });

  const server = app.listen(env.PORT, env.HOST, () => {
    const address = server.address() as AddressInfo;
    const lines = [`Benchpath is running (${handle.kind}: ${handle.location}).`, ...urls(address, env.HOST).map((u) => `  open ${u}`)];
    process.stdout.write(`${lines.join("\n")}\n`);
    void printDemoSignIns(ctx.db);
    if (ctx.mail.mode === "sink") logger.info("mail goes to the built-in sink (SMTP_URL is not set); the shop lead reads it under Sent mail");
    rollingBackup(handle, env.DATA_DIR, env.BACKUPS_KEPT)
      .then((file) => file && logger.info({ file }, "backup written"))
      .catch((error: unknown) => logger.warn({ err: error }, "backup failed"));
  });
  server.on("error", (error) => {
    store.release();
    fail(`Benchpath cannot listen on ${env.HOST}:${env.PORT}: ${error.message}`);
  });

  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, "stopping: no new requests");
    const force = setTimeout(() => server.closeAllConnections(), 5000);
    server.close(async () => {
      clearTimeout(force);
      try {
        await ctx.mail.close();
        await handle.checkpoint();
        await handle.close();
      } finally {
        store.release();
        process.exit(0);
      }
    });
    server.closeIdleConnections();
  };
  process.on("SIGTERM", () => stop("SIGTERM"));
  process.on("SIGINT", () => stop("SIGINT"));
}

async function printDemoSignIns(db: Parameters<typeof isEmpty>[0]) {
  const [first] = await db.select({ id: users.id }).from(users).where(eq(users.email, demoUsers[0]!.email)).limit(1);
  if (!first) return;
  process.stdout.write(`Demo shop "${demoShop.name}". Sign in as:\n${demoSignInLines().join("\n")}\n`);
}

await main();
