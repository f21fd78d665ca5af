// The session's log on this tablet and its save line: answers and photos go to the server one after
// another, in the order they were given, whether the connection is there or comes back later.
import { useEffect, useState, useSyncExternalStore } from "react";
import { onlineManager, useMutation, useMutationState, useQueryClient, type Mutation } from "@tanstack/react-query";
import type { SessionDetail } from "../../../../shared/schemas/sessions.ts";
import { pendingRequests, sessionEventKey, sessionEventOptions, sessionScope } from "../api/append-event.ts";
import { keepPhoto, sessionPhotoKey, sessionPhotoOptions, type PhotoVariables } from "../api/upload-photo.ts";
import type { EventVariables } from "./event-log.ts";
import { mergeLog } from "./event-log.ts";
import { registerLog, SessionLogStore } from "./session-log-store.ts";

/** `count` is everything not yet on the server, `photos` the pictures among them. */
export type SaveState = { kind: "saved" } | { kind: "saving"; count: number; photos: number } | { kind: "waiting"; count: number; photos: number };

const saveKeys = new Set<unknown>([sessionEventKey[0], sessionPhotoKey[0]]);
const isSaveOf = (sessionId: string) => (m: Mutation<unknown, Error, unknown>) =>
  saveKeys.has(m.options.mutationKey?.[0]) && (m.state.variables as { sessionId?: string } | undefined)?.sessionId === sessionId;

function useSaveState(sessionId: string): SaveState {
  const online = useSyncExternalStore(onlineManager.subscribe.bind(onlineManager), () => onlineManager.isOnline(), () => true);
  const pending = useMutationState({
    filters: { status: "pending", predicate: isSaveOf(sessionId) },
    select: (m) => ({ failures: m.state.failureCount, photo: m.options.mutationKey?.[0] === sessionPhotoKey[0] }),
  });
  if (pending.length === 0) return { kind: "saved" };
  const failing = !online || pending.some((p) => p.failures > 0);
  return { kind: failing ? "waiting" : "saving", count: pending.length, photos: pending.filter((p) => p.photo).length };
}

/** What a session screen runs on: its log, its save state, and where answers and photos go. */
export interface SessionLog {
  store: SessionLogStore;
  log: ReturnType<SessionLogStore["getSnapshot"]>;
  save: SaveState;
  saveEvent: (variables: EventVariables) => void;
  savePhoto: (variables: PhotoVariables) => void;
  /** Holds the picture until it is sent (or, in a sandbox, for as long as the screen is open). */
  keepPhoto: (attachmentId: string, photo: Blob) => Promise<void>;
}

export function useSessionLog(detail: SessionDetail): SessionLog {
  const queryClient = useQueryClient();
  const [store] = useState(() => new SessionLogStore(detail.id, mergeLog(detail.events, pendingRequests(queryClient, detail.id))));
  useEffect(() => registerLog(store), [store]);
  // The server's answer can arrive after the screen opened on the tablet's older copy: take it up.
  useEffect(() => {
    const known = new Set(store.getSnapshot().requests.map((r) => r.id));
    if (detail.events.some((e) => !known.has(e.id))) store.resync(detail.events, pendingRequests(queryClient, detail.id), null);
  }, [store, detail.events, detail.id, queryClient]);
  const log = useSyncExternalStore(store.subscribe, store.getSnapshot, store.getSnapshot);
  // One scope for the session: a photo is on the server before the event that names it is sent.
  const scope = sessionScope(detail.id);
  const { mutate: saveEvent } = useMutation({ ...sessionEventOptions(queryClient), scope });
  const { mutate: savePhoto } = useMutation({ ...sessionPhotoOptions(), scope });
  const save = useSaveState(detail.id);
  return { store, log, save, saveEvent, savePhoto, keepPhoto };
}
