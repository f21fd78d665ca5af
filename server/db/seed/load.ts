// `npm run seed:load`: a large invented history for measuring queries, in its own data folder
// (data-load/ under the project, or LOAD_DATA_DIR), never the demo's.
import { existsSync, rmSync } from "node:fs";
import path from "node:path";
import { sql } from "drizzle-orm";
import { openDatabase } from "../client.ts";
import { acquireDataLock, DataFolderLockedError } from "../lock.ts";
import { installBuiltInFlows } from "../../services/flows.ts";
import { seedDemo } from "./demo.ts";
import { seedHistory } from "./history.ts";
import { LOAD_SESSIONS, loadDataDir, loadHistory } from "./load-options.ts";

async function main() {
  const dir = loadDataDir();
  const demo = path.resolve(process.env.DATA_DIR || "./data");
  if (dir === demo) throw new Error(`The load data goes in its own folder, not the demo's (${demo}): set LOAD_DATA_DIR to another folder.`);
  const lock = acquireDataLock(dir);
  const began = performance.now();
  const seconds = () => ((performance.now() - began) / 1000).toFixed(1);
  try {
    const pgdata = path.join(dir, "pgdata");
    if (existsSync(pgdata)) {
      process.stdout.write(`Emptying ${pgdata}\n`);
      rmSync(pgdata, { recursive: true, force: true });
    }
    const handle = await openDatabase({ kind: "pglite", dataDir: pgdata });
    try {
      await seedDemo(handle.db);
      await installBuiltInFlows(handle.db);
      const sessions = Number(process.env.LOAD_SESSIONS || LOAD_SESSIONS);
      process.stdout.write(`Writing ${sessions.toLocaleString("en-US")} sessions into ${pgdata}\n`);
      const counts = await seedHistory(handle.db, undefined, {
        ...loadHistory,
        sessions,
        onBatch: (c) => process.stdout.write(`  ${c.sessions.toLocaleString("en-US")} sessions, ${c.events.toLocaleString("en-US")} events (${seconds()} s)\n`),
      });
      // VACUUM marks the pages all-visible, so the queries can read from their indexes alone.
      process.stdout.write(`Vacuuming and analysing the tables (${seconds()} s)\n`);
      await handle.db.execute(sql`VACUUM ANALYZE`);
      await handle.checkpoint();
      process.stdout.write(`Done in ${seconds()} s: ${JSON.stringify(counts)}\n`);
    } finally {
      await handle.close();
    }
  } finally {
    lock.release();
  }
}

try {
  await main();
} catch (error) {
  if (error instanceof DataFolderLockedError || (error instanceof Error && error.message.startsWith("The load data"))) {
    process.stderr.write(`${error.message}\n`);
    process.exit(1);
  }
  throw error;
}
