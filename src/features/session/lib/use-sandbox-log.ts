// A log for trying a flow out: it runs the same screens and rules as a real check, keeps everything
// in memory for as long as the screen is open, and sends nothing anywhere.
import { useEffect, useState, useSyncExternalStore } from "react";
import { SessionLogStore } from "./session-log-store.ts";
import type { SessionLog } from "./use-session-log.ts";

const saved = { kind: "saved" } as const;
const sendNothing = () => undefined;

/** Pictures taken while trying a flow, by id, as addresses the screen can show. */
export class SandboxPhotos {
  private readonly urls = new Map<string, string>();
  keep = async (attachmentId: string, photo: Blob) => {
    this.urls.set(attachmentId, URL.createObjectURL(photo));
  };
  /** For PhotoSourceContext: the picture's address, which this store owns and lets go. */
  source = async (attachmentId: string) => {
    const url = this.urls.get(attachmentId);
    return url ? { url, owned: false } : null;
  };
  forget() {
    this.urls.forEach((url) => URL.revokeObjectURL(url));
    this.urls.clear();
  }
}

export function useSandboxLog(): SessionLog & { photos: SandboxPhotos } {
  const [store] = useState(() => new SessionLogStore("sandbox", []));
  const [photos] = useState(() => new SandboxPhotos());
  useEffect(() => () => photos.forget(), [photos]);
  const log = useSyncExternalStore(store.subscribe, store.getSnapshot, store.getSnapshot);
  return { store, log, save: saved, saveEvent: sendNothing, savePhoto: sendNothing, keepPhoto: photos.keep, photos };
}
