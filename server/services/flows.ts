import { and, desc, eq, inArray, sql } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { Database } from "../db/client.ts";
import { flows, flowVersions } from "../db/schema.ts";
import { loadBuiltInFlows } from "../flows/builtin.ts";
import { compileFlow, type CompiledFlow } from "../../shared/flow/compile.ts";
import type { AppliesTo, FlowDefinition } from "../../shared/flow/schema.ts";
import type { EngineCycle, EquipmentKind } from "../../shared/equipment.ts";

type Tx = Pick<Database, "select" | "insert">;

/** Installs each built-in flow as version 1 unless a flow with its id is already there; returns the ids installed. */
export async function installBuiltInFlows(db: Database, definitions: FlowDefinition[] = loadBuiltInFlows()): Promise<string[]> {
  if (definitions.length === 0) return [];
  return db.transaction(async (tx) => {
    const present = await tx.select({ id: flows.id }).from(flows).where(inArray(flows.id, definitions.map((d) => d.id)));
    const have = new Set(present.map((p) => p.id));
    const missing = definitions.filter((d) => !have.has(d.id));
    for (const d of missing) {
      await tx.insert(flows).values({ id: d.id, title: d.title });
      await tx.insert(flowVersions).values({ id: uuidv7(), flowId: d.id, number: 1, definition: d, note: "Built-in flow", createdBy: null });
    }
    return missing.map((d) => d.id);
  });
}

// A version never changes, so its compiled form is kept for the life of the process.
const compiledByVersion = new Map<string, CompiledFlow>();

/** The pinned version compiled once; reads the definition only the first time. */
export async function compiledVersion(db: Pick<Database, "select">, versionId: string): Promise<CompiledFlow> {
  const hit = compiledByVersion.get(versionId);
  if (hit) return hit;
  const [row] = await db.select({ definition: flowVersions.definition }).from(flowVersions).where(eq(flowVersions.id, versionId));
  if (!row) throw new Error(`flow version ${versionId} is missing`);
  const compiled = compileFlow(row.definition);
  compiledByVersion.set(versionId, compiled);
  return compiled;
}

export interface PublishedFlow {
  flowId: string;
  versionId: string;
  version: number;
  title: string;
  summary: string;
  appliesTo: AppliesTo;
}

/** The latest version of every flow that is not retired, without the (large) definitions. */
export async function publishedFlows(db: Tx, flowId?: string): Promise<PublishedFlow[]> {
  const rows = await db
    .select({
      flowId: flowVersions.flowId,
      versionId: flowVersions.id,
      version: flowVersions.number,
      title: flows.title,
      summary: sql<string | null>`${flowVersions.definition}->>'summary'`,
      appliesTo: sql<AppliesTo>`${flowVersions.definition}->'appliesTo'`,
    })
    .from(flowVersions)
    .innerJoin(flows, eq(flows.id, flowVersions.flowId))
    .where(and(eq(flows.retired, false), flowId === undefined ? undefined : eq(flows.id, flowId)))
    .orderBy(flows.title, desc(flowVersions.number));
  const latest = new Map<string, PublishedFlow>();
  for (const r of rows) if (!latest.has(r.flowId)) latest.set(r.flowId, { ...r, summary: r.summary ?? "" });
  return [...latest.values()];
}

export function appliesToUnit(appliesTo: AppliesTo, unit: { equipmentKind: EquipmentKind; cycle: number }): boolean {
  return appliesTo.equipment.includes(unit.equipmentKind) && (appliesTo.cycle === "any" || appliesTo.cycle === (unit.cycle as EngineCycle));
}
