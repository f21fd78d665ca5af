import { randomBytes } from "node:crypto";
import pg from "pg";
import request from "supertest";
import type { Express } from "express";
import { createApp } from "../../../server/app.ts";
import { createContext, type AppContext } from "../../../server/context.ts";
import { openDatabase, type DatabaseHandle } from "../../../server/db/client.ts";
import { healthProbe } from "../../../server/db/open.ts";
import { loadEnv } from "../../../server/env.ts";
import { createLogger } from "../../../server/lib/logger.ts";

export const HOST = "bench.test";
export const ORIGIN = `http://${HOST}`;

export interface TestApp {
  app: Express;
  ctx: AppContext;
  handle: DatabaseHandle;
  /** A cookie-keeping client that sends our Host and Origin, like the browser would. */
  agent(): ReturnType<typeof request.agent>;
  close(): Promise<void>;
}

/**
 * A fresh, migrated database per test file: in-memory PGlite, or a new database on the PostgreSQL
 * server named by DATABASE_URL.
 */
async function freshDatabase(): Promise<{ handle: DatabaseHandle; drop(): Promise<void> }> {
  const url = process.env.DATABASE_URL;
  if (!url) {
    const handle = await openDatabase({ kind: "pglite", dataDir: null });
    return { handle, drop: () => handle.close() };
  }
  const name = `bp_test_${randomBytes(6).toString("hex")}`;
  const admin = new pg.Client({ connectionString: url });
  await admin.connect();
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.end();
  const target = new URL(url);
  target.pathname = `/${name}`;
  const handle = await openDatabase({ kind: "postgres", url: target.toString() });
  return {
    handle,
    drop: async () => {
      await handle.close();
      const cleanup = new pg.Client({ connectionString: url });
      await cleanup.connect();
      await cleanup.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
      await cleanup.end();
    },
  };
}

export async function createTestApp(envOverrides: Record<string, string> = {}): Promise<TestApp> {
  const { handle, drop } = await freshDatabase();
  const env = loadEnv({ NODE_ENV: "test", LOG_LEVEL: "silent", ...envOverrides });
  const ctx = createContext({ db: handle.db, env, logger: createLogger("silent"), health: healthProbe(handle) });
  const app = createApp(ctx);
  return {
    app,
    ctx,
    handle,
    agent: () => request.agent(app).set("Host", HOST).set("Origin", ORIGIN),
    close: async () => {
      await ctx.mail.close();
      await drop();
    },
  };
}
