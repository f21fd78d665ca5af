import { loadEnv, EnvError } from "../../env.ts";
import { openStore } from "../open.ts";
import { storageFor } from "../../storage/storage.ts";
import { DataFolderLockedError } from "../lock.ts";
import { demoShop, demoSignInLines, resetDemo } from "./demo.ts";

// `npm run seed`: empties the database and puts the demo shop back, with its few months of history.
try {
  const env = loadEnv();
  const store = await openStore(env);
  try {
    await resetDemo(store.handle.db, storageFor(env));
    await store.handle.checkpoint();
  } finally {
    await store.handle.close();
    store.release();
  }
  process.stdout.write(`Demo data reset at ${store.handle.location}: ${demoShop.name}. Sign-ins:\n${demoSignInLines().join("\n")}\n`);
} catch (error) {
  if (error instanceof EnvError || error instanceof DataFolderLockedError) {
    process.stderr.write(`${error.message}\n`);
    process.exit(1);
  }
  throw error;
}
