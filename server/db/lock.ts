import { closeSync, mkdirSync, openSync, readFileSync, unlinkSync, writeSync } from "node:fs";
import os from "node:os";
import path from "node:path";

interface LockOwner {
  pid: number;
  host: string;
  startedAt: string;
}

export class DataFolderLockedError extends Error {
  constructor(
    readonly folder: string,
    readonly owner: LockOwner,
  ) {
    super(
      `The data folder ${folder} is already in use by process ${owner.pid} on ${owner.host} (since ${owner.startedAt}). ` +
        `Stop that Benchpath server first, or point DATA_DIR at another folder.`,
    );
    this.name = "DataFolderLockedError";
  }
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === "EPERM";
  }
}

function sleepSync(ms: number): void {
  Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, ms);
}

function readOwner(file: string): LockOwner | null {
  try {
    const parsed = JSON.parse(readFileSync(file, "utf8")) as Partial<LockOwner>;
    return typeof parsed.pid === "number" ? { pid: parsed.pid, host: String(parsed.host), startedAt: String(parsed.startedAt) } : null;
  } catch {
    return null;
  }
}

/**
 * Takes the data folder's exclusive lock (PGlite has none of its own: two processes on one folder
 * corrupt it). A lock left by a dead process on this host is taken over.
 */
export function acquireDataLock(folder: string): { release(): void } {
  const dir = path.resolve(folder);
  mkdirSync(dir, { recursive: true });
  const file = path.join(dir, "benchpath.lock");
  const me: LockOwner = { pid: process.pid, host: os.hostname(), startedAt: new Date().toISOString() };
  for (let attempt = 0; attempt < 3; attempt++) {
    try {
      const fd = openSync(file, "wx");
      writeSync(fd, JSON.stringify(me));
      closeSync(fd);
      let released = false;
      return {
        release() {
          if (released) return;
          released = true;
          if (readOwner(file)?.pid === process.pid) unlinkSync(file);
        },
      };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error;
      // A lock file with no owner yet may be mid-write by another starting process: look twice.
      const owner = readOwner(file) ?? (sleepSync(250), readOwner(file));
      const stale = owner === null || (owner.host === me.host && !isAlive(owner.pid));
      if (!stale || owner?.pid === process.pid) throw new DataFolderLockedError(dir, owner ?? me);
      unlinkSync(file);
    }
  }
  throw new Error(`Could not take the lock on ${dir}.`);
}
