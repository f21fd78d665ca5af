import type { FlowDefinition } from "../../../shared/flow/schema.ts";
import type { ReviewOptionsResponse, ReviewQueueRow, SessionFlagsResponse } from "../../../shared/schemas/review.ts";
import type { AppendEventRequest, SessionDetail, StoredEvent } from "../../../shared/schemas/sessions.ts";
import { json, type FakeRoute } from "../render-app.tsx";
import { answers } from "../work-orders/fakes.ts";

export function buildRow(overrides: Partial<ReviewQueueRow> = {}): ReviewQueueRow {
  return {
    sessionId: "se-1",
    workOrderNumber: 1042,
    customer: "Marlow Ashby",
    unit: { equipmentKind: "string_trimmer", make: "Fernhill", model: "FT-25" },
    techId: "tech-alder",
    techName: "Alder Quinn",
    flow: { flowId: "trimmer-check", title: "Trimmer no-start", version: 2 },
    findingStepId: "healthy",
    findingStepTitle: "Compression is healthy",
    status: "completed",
    reviewState: "waiting",
    startedAt: "2026-03-02T09:00:00.000Z",
    completedAt: "2026-03-02T09:40:00.000Z",
    flagCount: 2,
    ...overrides,
  };
}

export const reviewOptions: ReviewOptionsResponse = {
  techs: [
    { id: "tech-alder", name: "Alder Quinn" },
    { id: "tech-birch", name: "Birch Okafor" },
  ],
  flows: [
    { flowId: "mower-check", title: "Mower no-start", findings: [{ stepId: "healthy", title: "Mower compression is fine" }] },
    {
      flowId: "trimmer-check",
      title: "Trimmer no-start",
      findings: [
        { stepId: "healthy", title: "Compression is healthy" },
        { stepId: "worn", title: "Worn rings" },
      ],
    },
  ],
};

export const optionsAnswers: FakeRoute = answers("GET", "/api/review/options", () => json(reviewOptions));

/**
 * The queue's fake server: records each request's query string and answers `respond(params)`,
 * by default a page cut from `rows` the way the server would (page and pageSize only).
 */
export function queueAnswers(seen: string[], rows: ReviewQueueRow[] = [buildRow()], respond?: (params: URLSearchParams) => Response): FakeRoute {
  return answers("GET", "/api/review/sessions", (_body, url) => {
    const query = url.split("?")[1] ?? "";
    seen.push(query);
    const params = new URLSearchParams(query);
    if (respond) return respond(params);
    const page = Number(params.get("page") ?? 1);
    const pageSize = Number(params.get("pageSize") ?? 25);
    return json({ rows: rows.slice((page - 1) * pageSize, page * pageSize), total: rows.length, page, pageSize });
  });
}

/** A flow of our own: a guarded choice, an instruction that takes photos, a plug-gap reading, a compression reading. */
export const reviewFlow: FlowDefinition = {
  formatVersion: 1,
  id: "trimmer-check",
  title: "Trimmer no-start",
  appliesTo: { equipment: ["string_trimmer"], cycle: 2 },
  start: "guard",
  steps: {
    guard: {
      kind: "choice",
      title: "Is the spark plug cap off?",
      cautions: [{ signal: "WARNING", text: "Pull the plug cap before you touch the cutting head." }],
      options: [
        { value: "yes", label: "Yes, the cap is off", next: "inspect" },
        { value: "no", label: "No, it is still on", next: "cap-on" },
      ],
    },
    inspect: { kind: "instruction", title: "Look the plug over", minSeconds: 30, photo: { requirement: "optional", prompt: "The plug's firing end" }, next: "gap" },
    gap: {
      kind: "reading",
      title: "Measure the plug gap",
      quantity: "length",
      unit: "in",
      bands: [
        { from: null, to: { value: 0.02, inclusive: false }, label: "Too narrow", verdict: "low", next: "gauge" },
        { from: { value: 0.02, inclusive: true }, to: { value: 0.04, inclusive: true }, label: "In range", verdict: "good", next: "gauge" },
        { from: { value: 0.04, inclusive: false }, to: null, label: "Too wide", verdict: "high", next: "gauge" },
      ],
    },
    gauge: {
      kind: "reading",
      title: "Record the highest gauge reading",
      quantity: "pressure",
      unit: "psi",
      evaluation: { kind: "compression", next: { good: "healthy", marginal: "healthy", low: "worn", implausible: "healthy" } },
    },
    healthy: { kind: "finding", title: "Compression is healthy", certainty: "likely", explanation: "The engine seals well enough to start.", repairs: [] },
    worn: { kind: "finding", title: "Worn rings", certainty: "likely", explanation: "The cylinder leaks.", repairs: [] },
    "cap-on": { kind: "finding", title: "Cap left on", certainty: "confirmed", explanation: "Work stopped for safety.", repairs: [] },
  },
};

export const PHOTOS = ["0190f0f0-0000-7000-8000-0000000000a1", "0190f0f0-0000-7000-8000-0000000000a2"] as const;

const at = (secondsAfterStart: number) => new Date(Date.parse("2026-03-02T09:00:00.000Z") + secondsAfterStart * 1000).toISOString();

/** The tech measures the gap, goes on, comes back to measure it again, then reads the gauge. */
export const revisedLog: [number, AppendEventRequest["event"]][] = [
  [20, { type: "caution.acknowledge", stepId: "guard", signal: "WARNING" }],
  [45, { type: "step.answer", stepId: "guard", value: "yes" }],
  [60, { type: "photo.attach", stepId: "inspect", attachmentId: PHOTOS[0] }],
  [70, { type: "photo.attach", stepId: "inspect", attachmentId: PHOTOS[1] }],
  [75, { type: "note.add", stepId: "inspect", text: "Plug boot is cracked." }],
  [80, { type: "step.answer", stepId: "inspect", value: "done" }],
  [190, { type: "step.record", stepId: "gap", value: 0.76, unit: "mm" }],
  [250, { type: "step.back" }],
  [280, { type: "step.record", stepId: "gap", value: 0.9, unit: "mm" }],
  [400, { type: "step.record", stepId: "gauge", value: 120, unit: "psi" }],
];

export function storedLog(log: [number, AppendEventRequest["event"]][]): StoredEvent[] {
  return log.map(([s, event], i) => ({ id: `0190f0f0-0000-7000-8000-${String(i).padStart(12, "0")}`, seq: i + 1, recordedAt: at(s), receivedAt: at(s + 1), event }));
}

export function buildReviewSession(overrides: Partial<SessionDetail> = {}): SessionDetail {
  return {
    id: "se-1",
    workOrderId: "wo-1",
    workOrderNumber: 1042,
    customer: "Marlow Ashby",
    unit: { equipmentKind: "string_trimmer", make: "Fernhill", model: "FT-25" },
    techId: "tech-alder",
    techName: "Alder Quinn",
    status: "completed",
    abandonReason: null,
    reviewState: "waiting",
    reviewComment: null,
    reviewerName: null,
    reviewedAt: null,
    flow: { flowId: "trimmer-check", versionId: "fv-2", version: 2, title: "Trimmer no-start" },
    definition: reviewFlow,
    input: { profile: { cycle: 2, compressionRelease: "no", displacementCc: 25.4 }, altitudeM: 0 },
    events: storedLog(revisedLog),
    currentStepId: "healthy",
    findingStepId: "healthy",
    startedAt: at(0),
    completedAt: at(420),
    ...overrides,
  };
}

export const revisedFlags: SessionFlagsResponse = {
  sessionId: "se-1",
  computedAt: at(420),
  flags: [
    { code: "step_too_fast", stepId: "inspect", reason: `"Look the plug over" was done in 5 seconds; it takes at least 30 seconds.` },
    { code: "open_too_long", stepId: null, reason: "The session was open for 30 hours, more than the 24 hours a session should take." },
  ],
};

export function flagsAnswers(flags: SessionFlagsResponse = revisedFlags): FakeRoute {
  return answers("GET", `/api/review/sessions/${flags.sessionId}/flags`, () => json(flags));
}
