import { createReadStream } from "node:fs";
import { mkdir, rename, rm, stat, writeFile } from "node:fs/promises";
import path from "node:path";
import type { Readable } from "node:stream";
import type { Storage } from "./storage.ts";

// Keys are made by the server (random uuids); anything else could climb out of the folder.
const KEY = /^[a-z0-9][a-z0-9-]{7,80}(\.[a-z0-9]{1,8})?$/;

export function diskStorage(root: string): Storage {
  const fileOf = (key: string) => {
    if (!KEY.test(key)) throw new Error(`not a storage key: ${JSON.stringify(key)}`);
    // Two-character fan-out keeps any one folder small.
    return path.join(root, key.slice(0, 2), key);
  };
  return {
    async put(key, bytes) {
      const file = fileOf(key);
      await mkdir(path.dirname(file), { recursive: true });
      const partial = `${file}.partial`;
      await writeFile(partial, bytes, { mode: 0o600 });
      // Readers never see a half-written file.
      await rename(partial, file);
    },
    async get(key) {
      const file = fileOf(key);
      try {
        await stat(file);
      } catch {
        return null;
      }
      return createReadStream(file) as Readable;
    },
    async delete(key) {
      await rm(fileOf(key), { force: true });
    },
  };
}
