// A small flow and a fake of the flows API (shared/schemas/flows.ts) that keeps its draft between requests.
import { screen } from "@testing-library/react";
import type { FlowDefinition } from "../../../shared/flow/schema.ts";
import type { FlowDetail, FlowListItem } from "../../../shared/schemas/flows.ts";
import { json, meAnswers, signedInAs, type FakeRoute } from "../render-app.tsx";

export const seniorTech = meAnswers(signedInAs("senior_tech", { id: "user-tomas", name: "Tomás Reyes" }));
export const flowId = "plug-check";
const tomas = { id: "user-tomas", name: "Tomás Reyes" };
export const rosa = { id: "user-rosa", name: "Rosa Lindqvist" };

/** Check the plug, ask about the spark, end at one of two findings. */
export function buildDefinition(): FlowDefinition {
  return {
    formatVersion: 1,
    id: flowId,
    title: "Spark plug check",
    appliesTo: { equipment: ["chainsaw", "leaf_blower"], cycle: 2 },
    start: "pull-plug",
    steps: {
      "pull-plug": { kind: "instruction", title: "Take out the spark plug", next: "spark" },
      spark: {
        kind: "choice",
        title: "Is there a blue spark at the gap?",
        options: [
          { value: "yes", label: "Yes, a strong spark", next: "plug-fouled" },
          { value: "no", label: "No spark", next: "dead-coil" },
        ],
      },
      "plug-fouled": {
        kind: "finding",
        title: "The plug is fouled",
        certainty: "likely",
        explanation: "A spark at the tester but none at the plug points at the plug.",
        repairs: [{ title: "Replace the spark plug", labourHours: 0.2, parts: ["Spark plug"] }],
      },
      "dead-coil": {
        kind: "finding",
        title: "The ignition coil is dead",
        certainty: "confirmed",
        explanation: "No spark with a known-good plug and the kill switch open.",
        repairs: [{ title: "Replace the ignition coil", labourHours: 0.8, parts: ["Ignition coil"] }],
      },
    },
  };
}

export function buildDetail(overrides: Partial<FlowDetail> = {}, definition: Record<string, unknown> = buildDefinition()): FlowDetail {
  return {
    id: flowId,
    title: "Spark plug check",
    retired: false,
    versions: [
      { number: 2, note: "Ask about the spark before the coil", createdAt: "2025-03-02T15:00:00.000Z", createdBy: tomas, sessionCount: 12 },
      { number: 1, note: "First version", createdAt: "2025-02-01T15:00:00.000Z", createdBy: rosa, sessionCount: 30 },
    ],
    draft: { revision: 4, basedOnVersion: 2, definition, problems: [], updatedAt: "2025-03-03T09:00:00.000Z", updatedBy: tomas },
    ...overrides,
  };
}

export function buildListItem(overrides: Partial<FlowListItem> = {}): FlowListItem {
  return {
    id: flowId,
    title: "Spark plug check",
    appliesTo: { equipment: ["chainsaw", "leaf_blower"], cycle: 2 },
    retired: false,
    published: { number: 2, createdAt: "2025-03-02T15:00:00.000Z", createdBy: tomas },
    draft: { revision: 4, updatedAt: "2025-03-03T09:00:00.000Z", updatedBy: tomas, errorCount: 0 },
    lastEditedBy: tomas,
    sessionCount: 42,
    ...overrides,
  };
}

export interface FakeFlowServer {
  route: FakeRoute;
  detail: FlowDetail;
  /** Every PUT of the draft, as sent. */
  saves: Array<{ revision: number; definition: Record<string, unknown> }>;
  publishes: Array<{ revision: number; note: string }>;
  /** Someone else saves the draft, as another tablet would. */
  saveElsewhere: (definition: Record<string, unknown>) => void;
}

/** GET, PUT and publish for one flow, with the server's revision rule: a stale save gets 409. */
export function fakeFlowServer(detail: FlowDetail = buildDetail()): FakeFlowServer {
  const server: FakeFlowServer = {
    detail: structuredClone(detail),
    saves: [],
    publishes: [],
    saveElsewhere: (definition) => {
      const draft = server.detail.draft!;
      server.detail.draft = { ...draft, revision: draft.revision + 1, definition, updatedBy: rosa, updatedAt: "2025-03-03T10:30:00.000Z" };
    },
    route: ({ url, method, body }) => {
      const path = url.split("?")[0];
      const draft = server.detail.draft;
      if (method === "GET" && path === `/api/flows/${flowId}`) return json(server.detail);
      if (method === "PUT" && path === `/api/flows/${flowId}/draft` && draft) {
        const sent = body as { revision: number; definition: Record<string, unknown> };
        server.saves.push(sent);
        if (sent.revision !== draft.revision) {
          return json(
            { error: { id: "draft_stale", message: "Someone saved this draft since you opened it.", details: { revision: draft.revision, definition: draft.definition, updatedBy: draft.updatedBy, updatedAt: draft.updatedAt } } },
            { status: 409 },
          );
        }
        server.detail.draft = { ...draft, revision: draft.revision + 1, definition: sent.definition, updatedBy: tomas };
        return json({ revision: draft.revision + 1, problems: [], updatedAt: "2025-03-03T11:00:00.000Z" });
      }
      if (method === "POST" && path === `/api/flows/${flowId}/publish`) {
        server.publishes.push(body as { revision: number; note: string });
        const number = (server.detail.versions[0]?.number ?? 0) + 1;
        const version = { number, note: (body as { note: string }).note, createdAt: "2025-03-03T12:00:00.000Z", createdBy: tomas, sessionCount: 0 };
        server.detail = { ...server.detail, versions: [version, ...server.detail.versions], draft: null };
        return json(version, { status: 201 });
      }
      if (method === "PATCH" && path === `/api/flows/${flowId}`) {
        server.detail = { ...server.detail, retired: (body as { retired: boolean }).retired };
        return json(server.detail);
      }
      if (method === "DELETE" && path === `/api/flows/${flowId}/draft`) {
        server.detail = { ...server.detail, draft: null };
        return new Response(null, { status: 204 });
      }
      if (method === "POST" && path === `/api/flows/${flowId}/draft`) {
        const fromVersion = (body as { fromVersion: number }).fromVersion;
        server.detail = {
          ...server.detail,
          draft: { revision: 1, basedOnVersion: fromVersion, definition: buildDefinition(), problems: [], updatedAt: "2025-03-04T08:00:00.000Z", updatedBy: tomas },
        };
        return json(server.detail, { status: 201 });
      }
      return undefined;
    },
  };
  return server;
}

/** The editor has opened when its problems panel is up. */
export async function editorOpened() {
  await screen.findByRole("heading", { name: "Problems" }, { timeout: 8000 });
}

/** The base flow with a plug-gap reading between the plug and the spark question. */
export function withGapReading(): FlowDefinition {
  const definition = buildDefinition();
  definition.steps["pull-plug"] = { kind: "instruction", title: "Take out the spark plug", next: "gap" };
  definition.steps.gap = {
    kind: "reading",
    title: "Measure the plug gap",
    quantity: "length",
    unit: "mm",
    bands: [
      { from: null, to: { value: 0.5, inclusive: false }, label: "Too close", verdict: "low", next: "plug-fouled" },
      { from: { value: 0.5, inclusive: true }, to: null, label: "Within range", verdict: "good", next: "spark" },
    ],
  };
  return definition;
}
