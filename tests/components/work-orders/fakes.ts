import type { WorkOrderDetail, WorkOrderSummary } from "../../../shared/schemas/work-orders.ts";
import { json, type FakeRoute } from "../render-app.tsx";

export function buildSummary(overrides: Partial<WorkOrderSummary> = {}): WorkOrderSummary {
  return {
    id: "wo-1",
    number: 1042,
    state: "waiting_for_diagnosis",
    customerName: "Dana Whitcombe",
    equipmentKind: "string_trimmer",
    make: "Hollis",
    model: "TR-22",
    complaint: "Pulls over but never catches.",
    createdAt: new Date(Date.now() - 3 * 24 * 3600_000).toISOString(),
    updatedAt: new Date().toISOString(),
    ...overrides,
  };
}

export function buildDetail(overrides: Partial<WorkOrderDetail> = {}): WorkOrderDetail {
  return {
    ...buildSummary(),
    customer: { id: "cu-1", name: "Dana Whitcombe", phone: "555 0142", email: "dana@example.com" },
    unit: {
      id: "un-1",
      equipmentKind: "string_trimmer",
      make: "Hollis",
      model: "TR-22",
      engineModel: "HE-25",
      engineType: "A1",
      engineSerial: "",
      cycle: 2,
      displacementCc: 25.4,
      compressionRelease: "unknown",
      hours: null,
    },
    alreadyTried: "",
    tankContents: "stale",
    intakePhotoId: null,
    sessions: [],
    applicableFlows: [
      { flowId: "handheld-2-stroke", title: "Handheld 2-stroke no-start", summary: "Spark, compression, then fuel delivery on a premix engine.", version: 3 },
    ],
    ...overrides,
  };
}

/** Answers one method and path (query string ignored) with what the test gives. */
export function answers(method: string, path: string, answer: (body: unknown, url: string) => Response): FakeRoute {
  return ({ url, method: m, body }) => (m === method && url.split("?")[0] === path ? answer(body, url) : undefined);
}

/** The work order, and its estimates (none unless given): the screen asks for both. */
export function detailAnswers(detail: WorkOrderDetail, estimates: unknown[] = []): FakeRoute {
  const workOrder = answers("GET", `/api/work-orders/${detail.id}`, () => json(detail));
  const estimateList = answers("GET", "/api/estimates", () => json({ estimates }));
  return (request) => workOrder(request) ?? estimateList(request);
}
