// The session's log on this tablet: what the server has stored, then what is still on its way.
import type { AppendEventRequest, SessionEventBody, StoredEvent } from "../../../../shared/schemas/sessions.ts";

export interface EventVariables {
  sessionId: string;
  request: AppendEventRequest;
}

/** Stored events by seq, then pending ones that carry on from them without a gap. */
export function mergeLog(stored: readonly StoredEvent[], pending: readonly AppendEventRequest[]): AppendEventRequest[] {
  const out: AppendEventRequest[] = stored.map(({ receivedAt: _receivedAt, ...request }) => request).sort((a, b) => a.seq - b.seq);
  const known = new Set(out.map((r) => r.id));
  // A pending event that does not follow on (a refused one before it) can never be stored.
  for (const request of [...pending].sort((a, b) => a.seq - b.seq)) {
    if (known.has(request.id)) continue;
    if (request.seq !== out.length + 1) continue;
    out.push(request);
    known.add(request.id);
  }
  return out;
}

export function nextRequest(log: readonly AppendEventRequest[], event: SessionEventBody, id: string, now: Date): AppendEventRequest {
  return { id, seq: log.length + 1, recordedAt: now.toISOString(), event };
}
