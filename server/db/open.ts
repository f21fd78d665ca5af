import path from "node:path";
import type { Env } from "../env.ts";
import { acquireDataLock } from "./lock.ts";
import { openDatabase, pingDatabase, type DatabaseHandle } from "./client.ts";

export interface OpenedStore {
  handle: DatabaseHandle;
  release(): void;
}

export const pgliteFolder = (env: Env) => path.join(path.resolve(env.DATA_DIR), "pgdata");

/** Opens the configured database, taking the data folder's lock first when it is embedded. */
export async function openStore(env: Env): Promise<OpenedStore> {
  if (env.DATABASE_URL) {
    const handle = await openDatabase({ kind: "postgres", url: env.DATABASE_URL });
    return { handle, release: () => {} };
  }
  const lock = acquireDataLock(env.DATA_DIR);
  try {
    const handle = await openDatabase({ kind: "pglite", dataDir: pgliteFolder(env) });
    return { handle, release: () => lock.release() };
  } catch (error) {
    lock.release();
    throw error;
  }
}

export function healthProbe(handle: DatabaseHandle) {
  return async () => {
    try {
      return { kind: handle.kind, ok: true, latencyMs: await pingDatabase(handle.db) };
    } catch (error) {
      return { kind: handle.kind, ok: false, latencyMs: null, error: (error as Error).message };
    }
  };
}
