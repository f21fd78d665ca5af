// Flow files out and in: a version or the draft as a JSON file, and a file back as a draft.
import { and, desc, eq } from "drizzle-orm";
import type { z } from "zod";
import type { AppContext } from "../context.ts";
import { flowDrafts, flows, flowVersions } from "../db/schema.ts";
import { can } from "../auth/policies.ts";
import { badRequest, forbidden, isUniqueViolation, notFound } from "../lib/errors.ts";
import { recordAudit } from "./audit.ts";
import { draftExists } from "./flow-drafts.ts";
import { draftOf, problemsOf, readableFlow } from "./flow-authoring.ts";
import { errorCount, FORMAT_VERSION } from "../../shared/flow/draft.ts";
import { flowIdSchema } from "../../shared/flow/schema.ts";
import type { exportQuerySchema, importResponseSchema } from "../../shared/schemas/flows.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

export interface FlowFile {
  filename: string;
  /** The definition with `formatVersion` first, as the file's text. */
  text: string;
}

const fileText = (definition: Record<string, unknown>) => `${JSON.stringify({ formatVersion: FORMAT_VERSION, ...definition }, null, 2)}\n`;

/** A version (the latest by default) or, for editors, the draft, as `<id>-v<N>.json` / `<id>-draft.json`. */
export async function exportFlow(ctx: Pick<AppContext, "db">, user: PublicUser, flowId: string, version: z.output<typeof exportQuerySchema>["version"]): Promise<FlowFile> {
  await readableFlow(ctx.db, user, flowId);
  if (version === "draft") {
    if (!can(user, "flow.edit")) throw forbidden("forbidden", "Only senior techs and the shop lead see drafts.");
    const draft = await draftOf(ctx.db, flowId);
    if (!draft) throw notFound("This flow has no draft.");
    return { filename: `${flowId}-draft.json`, text: fileText(draft.definition) };
  }
  const query = ctx.db.select({ number: flowVersions.number, definition: flowVersions.definition }).from(flowVersions);
  const [row] =
    version === undefined
      ? await query.where(eq(flowVersions.flowId, flowId)).orderBy(desc(flowVersions.number)).limit(1)
      : await query.where(and(eq(flowVersions.flowId, flowId), eq(flowVersions.number, version)));
  if (!row) throw notFound(version === undefined ? "This flow has no published version yet." : `Version ${version} of this flow does not exist.`);
  return { filename: `${flowId}-v${row.number}.json`, text: fileText(row.definition) };
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);
const titleOf = (file: Record<string, unknown>, id: string) => (typeof file.title === "string" && file.title.trim() && file.title.length <= 120 ? file.title.trim() : id);

/**
 * A flow file becomes a draft: of a new flow (created with it), or of an existing flow that has no
 * draft. A published version is never touched. The file may be invalid: its problems come back.
 */
export async function importFlow(ctx: Pick<AppContext, "db">, user: PublicUser, file: unknown): Promise<z.output<typeof importResponseSchema>> {
  if (!isRecord(file)) throw badRequest("invalid_flow_file", "The file is not a Benchpath flow: it holds no JSON object.");
  const id = flowIdSchema.safeParse(file.id);
  if (!id.success) {
    throw badRequest("invalid_flow_file", `The file is not a Benchpath flow: its "id" ${file.id === undefined ? "is missing" : `is not a flow id (${id.error.issues[0]?.message ?? "invalid"})`}.`);
  }
  const flowId = id.data;
  const problems = problemsOf(flowId, file);
  const created = await ctx.db.transaction(async (tx) => {
    // A new flow is locked by nothing yet: two imports of one new id at once end in the unique key, answered below.
    const [flow] = await tx.select({ id: flows.id }).from(flows).where(eq(flows.id, flowId)).for("update");
    if (flow) {
      const [draft] = await tx.select({ revision: flowDrafts.revision }).from(flowDrafts).where(eq(flowDrafts.flowId, flowId));
      if (draft) throw draftExists(draft.revision);
    } else {
      await tx.insert(flows).values({ id: flowId, title: titleOf(file, flowId) });
    }
    await tx.insert(flowDrafts).values({ flowId, definition: file, revision: 1, basedOnVersion: null, updatedBy: user.id });
    await recordAudit(tx, { userId: user.id, action: "flow.imported", recordType: "flow", recordId: flowId, details: { created: !flow, errorCount: errorCount(problems) } });
    return !flow;
  }).catch((e: unknown) => {
    throw isUniqueViolation(e) ? draftExists(1) : e;
  });
  return { flowId, created, revision: 1, problems };
}
