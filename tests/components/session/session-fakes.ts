import { vi } from "vitest";
import type { FlowDefinition } from "../../../shared/flow/schema.ts";
import type { AppendEventRequest, SessionDetail, StoredEvent } from "../../../shared/schemas/sessions.ts";
import { json, signedInAs } from "../render-app.tsx";

/** A small flow of our own: a guarded choice, then a compression reading, then findings. */
export const benchTestFlow: FlowDefinition = {
  formatVersion: 1,
  id: "bench-test",
  title: "Trimmer bench test",
  appliesTo: { equipment: ["string_trimmer"], cycle: 2 },
  start: "guard",
  steps: {
    guard: {
      kind: "choice",
      title: "Is the spark plug cap off?",
      cautions: [{ signal: "WARNING", text: "Pull the plug cap before you touch the cutting head." }],
      options: [
        { value: "off", label: "Yes, the cap is off", next: "gauge" },
        { value: "on", label: "No, it is still on", next: "cap-on" },
      ],
    },
    gauge: {
      kind: "reading",
      title: "Record the highest gauge reading",
      quantity: "pressure",
      unit: "psi",
      evaluation: { kind: "compression", next: { good: "healthy", marginal: "healthy", low: "worn", implausible: "healthy" } },
    },
    healthy: { kind: "finding", title: "Compression is healthy", certainty: "likely", explanation: "The engine seals well enough to start.", repairs: [{ title: "Carry on with fuel checks", labourHours: 0.5, parts: [] }] },
    worn: { kind: "finding", title: "Worn rings", certainty: "likely", explanation: "The cylinder leaks.", repairs: [{ title: "Replace the rings", labourHours: 2, parts: ["Ring set"] }] },
    "cap-on": { kind: "finding", title: "Cap left on", certainty: "confirmed", explanation: "Work stopped for safety.", repairs: [{ title: "Pull the cap", labourHours: 0.1, parts: [] }] },
  },
};

export function storedEvents(events: AppendEventRequest["event"][]): StoredEvent[] {
  return events.map((event, i) => ({ id: `0190f0f0-0000-7000-8000-00000000000${i}`, seq: i + 1, recordedAt: "2026-03-02T09:00:00.000Z", receivedAt: "2026-03-02T09:00:01.000Z", event }));
}

export function buildSession(events: StoredEvent[] = []): SessionDetail {
  return {
    id: "se-1",
    workOrderId: "wo-1",
    workOrderNumber: 1042,
    customer: "Dana Whitcombe",
    unit: { equipmentKind: "string_trimmer", make: "Fieldline", model: "FT-25" },
    techId: "user-apprentice",
    techName: "Rosa Lindqvist",
    status: "open",
    abandonReason: null,
    reviewState: "not_submitted",
    reviewComment: null,
    reviewerName: null,
    reviewedAt: null,
    flow: { flowId: "bench-test", versionId: "fv-1", version: 1, title: "Trimmer bench test" },
    definition: benchTestFlow,
    input: { profile: { cycle: 2, compressionRelease: "no", displacementCc: 25.4 }, altitudeM: 0 },
    events,
    currentStepId: "guard",
    findingStepId: null,
    startedAt: "2026-03-02T09:00:00.000Z",
    completedAt: null,
  };
}

type EventAnswer = (request: AppendEventRequest) => Promise<Response>;
type PhotoAnswer = (form: FormData) => Promise<Response>;

/** A fake server for one session: GET answers the detail, POST /events goes to `onEvent`, POST /photos to `onPhoto`. */
export function stubSessionApi(detail: SessionDetail, onEvent: EventAnswer, onPhoto?: PhotoAnswer) {
  const posted: AppendEventRequest[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = typeof input === "string" ? input : input instanceof URL ? input.pathname : input.url;
    const method = init?.method ?? "GET";
    if (url === "/api/auth/me") return json(signedInAs("apprentice"));
    if (url === "/api/sessions/se-1" && method === "GET") return json(detail);
    if (url === "/api/sessions/se-1/events" && method === "POST") {
      const request = JSON.parse(String(init?.body)) as AppendEventRequest;
      posted.push(request);
      return onEvent(request);
    }
    if (url === "/api/sessions/se-1/photos" && method === "POST" && onPhoto) return onPhoto(init?.body as FormData);
    throw new Error(`No fake answer for ${method} ${url}`);
  });
  vi.stubGlobal("fetch", fetchMock);
  return posted;
}

export const storedAnswer: EventAnswer = async (request) =>
  json({ stored: true, event: { ...request, receivedAt: new Date().toISOString() }, currentStepId: "guard", findingStepId: null }, { status: 201 });
