import { v7 as uuidv7 } from "uuid";
import type { Database } from "../../server/db/client.ts";
import { flowDrafts, flows, flowVersions, sessionEvents } from "../../server/db/schema.ts";
import { buildSession } from "./sessions.ts";
import type { FlowDefinition } from "../../shared/flow/schema.ts";

let counter = 0;

/**
 * A small valid flow for a 2-stroke string trimmer: a choice between two findings. `title` changes
 * the first step's title, so two versions can be told apart.
 */
export function flowDefinition(id: string, overrides: Partial<FlowDefinition> & { firstTitle?: string } = {}): FlowDefinition {
  const { firstTitle = "Does the plug spark on the tester?", ...rest } = overrides;
  return {
    formatVersion: 1,
    id,
    title: `Test flow ${id}`,
    appliesTo: { equipment: ["string_trimmer"], cycle: 2 },
    start: "look",
    steps: {
      look: {
        kind: "choice",
        title: firstTitle,
        options: [
          { value: "yes", label: "Yes", next: "fuel" },
          { value: "no", label: "No", next: "coil" },
        ],
      },
      fuel: { kind: "finding", title: "Stale fuel", certainty: "likely", explanation: "Spark is there, so fuel is next.", repairs: [{ title: "Drain and refill", labourHours: 0.3, parts: [] }] },
      coil: { kind: "finding", title: "Failed ignition coil", certainty: "likely", explanation: "No spark on the tester.", repairs: [{ title: "Replace the coil", labourHours: 0.8, parts: ["Ignition coil"] }] },
    },
    ...rest,
  };
}

export interface BuildFlowOptions {
  id?: string;
  title?: string;
  /** Published versions, oldest first (each a definition); none by default. */
  versions?: FlowDefinition[];
  /** A draft's definition (any object), or none. */
  draft?: Record<string, unknown>;
  draftRevision?: number;
  retired?: boolean;
  /** The versions' author, and the draft's editor unless `draftBy` is given. */
  createdBy?: string | null;
  draftBy?: string | null;
}

/** A flow row with the versions and the draft asked for; returns its id and the version ids, oldest first. */
export async function buildFlow(db: Database, options: BuildFlowOptions = {}): Promise<{ id: string; versionIds: string[] }> {
  counter += 1;
  const id = options.id ?? `test-flow-${counter}-${uuidv7().slice(-6)}`;
  await db.insert(flows).values({ id, title: options.title ?? `Test flow ${counter}`, retired: options.retired ?? false });
  const versionIds: string[] = [];
  for (const [i, definition] of (options.versions ?? []).entries()) {
    const versionId = uuidv7();
    await db.insert(flowVersions).values({ id: versionId, flowId: id, number: i + 1, definition, note: `Version ${i + 1}`, createdBy: options.createdBy ?? null });
    versionIds.push(versionId);
  }
  if (options.draft) {
    await db.insert(flowDrafts).values({ flowId: id, definition: options.draft, revision: options.draftRevision ?? 1, basedOnVersion: versionIds.length || null, updatedBy: options.draftBy ?? options.createdBy ?? null });
  }
  return { id, versionIds };
}

/** A completed session on the version, ended at `findingStepId`, with one stored event per [stepId, recordedAt]. */
export async function buildCompletedSession(db: Database, flowVersionId: string, findingStepId: string, events: [stepId: string | null, recordedAt: Date][]) {
  const session = await buildSession(db, { flowVersionId, status: "completed", currentStepId: findingStepId, findingStepId, completedAt: new Date() });
  for (const [i, [stepId, recordedAt]] of events.entries()) {
    const payload = stepId === null ? { type: "step.back" as const } : { type: "step.answer" as const, stepId, value: "done" };
    await db.insert(sessionEvents).values({ id: uuidv7(), sessionId: session.id, seq: i + 1, type: payload.type, payload, recordedAt });
  }
  return session;
}
