// The tablet keeps the query cache and unsent saves in IndexedDB, so answers survive a reload or a dead battery.
import type { QueryClient } from "@tanstack/react-query";
import { createAsyncStoragePersister } from "@tanstack/query-async-storage-persister";
import { persistQueryClientRestore, persistQueryClientSubscribe, type Persister } from "@tanstack/react-query-persist-client";
import { del, get, set } from "idb-keyval";

/** How long opening the app waits for the kept cache. */
const RESTORE_WAIT_MS = 3000;

/** A day: longer than a shift, short enough that an old cache never opens a stale check. */
export const PERSIST_MAX_AGE_MS = 24 * 60 * 60 * 1000;

export function createIdbPersister(): Persister {
  return createAsyncStoragePersister({
    storage: { getItem: (key) => get<string>(key).then((v) => v ?? null), setItem: (key, value) => set(key, value), removeItem: (key) => del(key) },
    key: "benchpath-cache",
    throttleTime: 500,
  });
}

export const persistDehydrateOptions = {
  // A save still retrying (server unreachable) is kept too, not only one paused by the browser's offline flag.
  shouldDehydrateMutation: (mutation: { state: { status: string } }) => mutation.state.status === "pending",
};

/** Starts the saves restored from storage again, oldest first; saves of one session wait for each other. */
export async function resumeRestoredSaves(queryClient: QueryClient) {
  const restored = queryClient.getMutationCache().getAll().filter((m) => m.state.status === "pending" && !m.state.isPaused);
  restored.forEach((m) => void m.continue().catch(() => undefined));
  await queryClient.resumePausedMutations();
}

/**
 * Takes the tablet's kept cache and saves back before anything asks the server, then keeps them
 * stored. Run before the router starts: with no connection, opening the app again then shows the
 * signed-in person and their open check from what was kept, and the waiting saves go out later.
 */
export async function startPersistence(queryClient: QueryClient, persister: Persister): Promise<void> {
  // The persist packages bring their own copy of query-core's types (a patch release behind); the
  // client is the same object at run time, so it is passed as their type.
  const client = queryClient as unknown as Parameters<typeof persistQueryClientRestore>[0]["queryClient"];
  // A browser whose storage never answers must not keep the app from opening: wait a few seconds at most.
  const restored = persistQueryClientRestore({ queryClient: client, persister, maxAge: PERSIST_MAX_AGE_MS }).catch(() => undefined);
  await Promise.race([restored, new Promise((resolve) => setTimeout(resolve, RESTORE_WAIT_MS))]);
  persistQueryClientSubscribe({ queryClient: client, persister, dehydrateOptions: persistDehydrateOptions });
  void resumeRestoredSaves(queryClient);
}
