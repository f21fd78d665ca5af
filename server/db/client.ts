import { mkdirSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { PGlite } from "@electric-sql/pglite";
import { pg_trgm } from "@electric-sql/pglite/contrib/pg_trgm";
import { drizzle as drizzlePglite } from "drizzle-orm/pglite";
import { migrate as migratePglite } from "drizzle-orm/pglite/migrator";
import { drizzle as drizzlePg } from "drizzle-orm/node-postgres";
import { migrate as migratePg } from "drizzle-orm/node-postgres/migrator";
import type { PgDatabase, PgQueryResultHKT } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import pg from "pg";
import * as schema from "./schema.ts";

export type Schema = typeof schema;
export type Database = PgDatabase<PgQueryResultHKT, Schema>;

export interface DatabaseHandle {
  db: Database;
  kind: "pglite" | "postgres";
  /** Where the data lives, for messages: a folder, "memory", or the server's host. */
  location: string;
  checkpoint(): Promise<void>;
  close(): Promise<void>;
  /** A gzipped tarball of the embedded data folder; null on a PostgreSQL server. */
  dump(): Promise<Blob | null>;
}

export type DatabaseTarget = { kind: "pglite"; dataDir: string | null } | { kind: "postgres"; url: string };

// Both the bundled server (dist/server) and the sources (server/db) sit two levels below the root.
const here = path.dirname(fileURLToPath(import.meta.url));
export const migrationsFolder = path.resolve(here, "..", "..", "drizzle");

export async function openDatabase(target: DatabaseTarget): Promise<DatabaseHandle> {
  if (target.kind === "postgres") {
    const pool = new pg.Pool({ connectionString: target.url, max: 10 });
    const db = drizzlePg(pool, { schema }) as unknown as Database;
    await migratePg(db as never, { migrationsFolder });
    return {
      db,
      kind: "postgres",
      location: new URL(target.url).host,
      checkpoint: async () => {},
      close: () => pool.end(),
      dump: async () => null,
    };
  }
  if (target.dataDir) mkdirSync(path.dirname(path.resolve(target.dataDir)), { recursive: true });
  // pg_trgm lets the review queue's search by customer, make or model use an index.
  const extensions = { pg_trgm };
  const client = target.dataDir ? new PGlite(target.dataDir, { extensions }) : new PGlite({ extensions });
  await client.waitReady;
  // The embedded data is read from memory and the file cache: a random read costs about what a
  // sequential one does, so the planner is told so and picks index lookups where they are cheaper.
  await client.exec("SET random_page_cost = 1.1");
  const db = drizzlePglite(client, { schema }) as unknown as Database;
  await migratePglite(db as never, { migrationsFolder });
  return {
    db,
    kind: "pglite",
    location: target.dataDir ? path.resolve(target.dataDir) : "memory",
    checkpoint: async () => {
      await client.exec("CHECKPOINT");
    },
    close: () => client.close(),
    dump: () => client.dumpDataDir("gzip"),
  };
}

export async function pingDatabase(db: Database): Promise<number> {
  const started = performance.now();
  await db.execute(sql`select 1`);
  return Math.round((performance.now() - started) * 100) / 100;
}
