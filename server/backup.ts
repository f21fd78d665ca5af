import { mkdir, readdir, rm, writeFile } from "node:fs/promises";
import path from "node:path";
import type { DatabaseHandle } from "./db/client.ts";

/** Writes a dated copy of the embedded database into DATA_DIR/backups and keeps the newest `keep`. */
export async function rollingBackup(handle: DatabaseHandle, dataDir: string, keep: number): Promise<string | null> {
  if (keep === 0) return null;
  const dump = await handle.dump();
  if (!dump) return null;
  const folder = path.join(path.resolve(dataDir), "backups");
  await mkdir(folder, { recursive: true });
  const file = path.join(folder, `benchpath-${new Date().toISOString().replace(/[:.]/g, "-")}.tar.gz`);
  await writeFile(file, Buffer.from(await dump.arrayBuffer()));
  const old = (await readdir(folder)).filter((f) => /^benchpath-.*\.tar\.gz$/.test(f)).sort().reverse().slice(keep);
  await Promise.all(old.map((f) => rm(path.join(folder, f))));
  return file;
}
