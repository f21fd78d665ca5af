import path from "node:path";
import type { Readable } from "node:stream";
import type { Env } from "../env.ts";
import { diskStorage } from "./disk.ts";

/** Where attachment bytes live, by random key; a disk folder now, an S3-compatible store later. */
export interface Storage {
  put(key: string, bytes: Buffer): Promise<void>;
  /** The stored bytes as a stream, or null when there is nothing under the key. */
  get(key: string): Promise<Readable | null>;
  delete(key: string): Promise<void>;
}

export const uploadsDir = (env: Pick<Env, "DATA_DIR" | "UPLOADS_DIR">) => path.resolve(env.UPLOADS_DIR ?? path.join(env.DATA_DIR, "uploads"));

const byFolder = new Map<string, Storage>();

export function storageFor(env: Pick<Env, "DATA_DIR" | "UPLOADS_DIR">): Storage {
  const dir = uploadsDir(env);
  let storage = byFolder.get(dir);
  if (!storage) byFolder.set(dir, (storage = diskStorage(dir)));
  return storage;
}
