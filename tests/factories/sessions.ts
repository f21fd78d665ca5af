import { v7 as uuidv7 } from "uuid";
import type { Database } from "../../server/db/client.ts";
import { diagnosticSessions, type DiagnosticSessionRow } from "../../server/db/schema.ts";
import { compiledVersion, installBuiltInFlows, publishedFlows } from "../../server/services/flows.ts";
import { buildUser } from "./users.ts";
import { buildWorkOrder } from "./work-orders.ts";
import type { FlowInput } from "../../shared/flow/step-rules.ts";

export const HANDHELD_2_STROKE = "handheld-2-stroke-no-start";

/** An open session on the flow's latest version (the built-in flows are installed when missing), with its tech and work order made when not given. */
export async function buildSession(db: Database, overrides: Partial<DiagnosticSessionRow> & { flowId?: string } = {}): Promise<DiagnosticSessionRow> {
  const { flowId = HANDHELD_2_STROKE, ...rest } = overrides;
  let [flow] = await publishedFlows(db, flowId);
  if (!flow) {
    await installBuiltInFlows(db);
    [flow] = await publishedFlows(db, flowId);
  }
  const versionId = rest.flowVersionId ?? flow!.versionId;
  const compiled = await compiledVersion(db, versionId);
  const techId = rest.techId ?? (await buildUser(db)).id;
  const workOrderId = rest.workOrderId ?? (await buildWorkOrder(db, { state: "diagnosing" })).id;
  const input: FlowInput = { profile: { cycle: 2, compressionRelease: "no", displacementCc: 25, specPsi: null }, altitudeM: 0 };
  const [row] = await db
    .insert(diagnosticSessions)
    .values({ id: uuidv7(), workOrderId, flowVersionId: versionId, techId, currentStepId: compiled.start, input, ...rest })
    .returning();
  return row!;
}

