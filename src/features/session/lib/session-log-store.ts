// The log one open session screen runs on: changed at the tap, read by React through useSyncExternalStore.
import type { AppendEventRequest, SessionEventBody, StoredEvent } from "../../../../shared/schemas/sessions.ts";
import { mergeLog, nextRequest } from "./event-log.ts";

export interface SessionLogState {
  requests: AppendEventRequest[];
  /** Why the tablet's view was put back on the server's, until the tech goes on. */
  problem: string | null;
  /** Bumped on every re-sync, so screens can drop what they showed for a discarded answer. */
  generation: number;
}

export class SessionLogStore {
  readonly sessionId: string;
  private state: SessionLogState;
  private readonly listeners = new Set<() => void>();

  constructor(sessionId: string, requests: AppendEventRequest[]) {
    this.sessionId = sessionId;
    this.state = { requests, problem: null, generation: 0 };
  }

  getSnapshot = (): SessionLogState => this.state;

  subscribe = (listener: () => void) => {
    this.listeners.add(listener);
    return () => {
      this.listeners.delete(listener);
    };
  };

  /** The request for the event, with the next seq, added to the log at once. */
  append(event: SessionEventBody, id: string, now: Date): AppendEventRequest {
    const request = nextRequest(this.state.requests, event, id, now);
    this.set({ ...this.state, requests: [...this.state.requests, request], problem: null });
    return request;
  }

  resync(stored: readonly StoredEvent[], pending: readonly AppendEventRequest[], problem: string | null) {
    this.set({ requests: mergeLog(stored, pending), problem, generation: this.state.generation + 1 });
  }

  dismissProblem() {
    if (this.state.problem !== null) this.set({ ...this.state, problem: null });
  }

  private set(state: SessionLogState) {
    this.state = state;
    this.listeners.forEach((l) => l());
  }
}

const open = new Map<string, SessionLogStore>();

/** The log of a session whose screen is open, if any. */
export function logFor(sessionId: string): SessionLogStore | undefined {
  return open.get(sessionId);
}

export function registerLog(store: SessionLogStore) {
  open.set(store.sessionId, store);
  return () => {
    if (open.get(store.sessionId) === store) open.delete(store.sessionId);
  };
}
