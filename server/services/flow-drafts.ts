// A flow's one draft: start it from a version, save it with optimistic concurrency on its revision,
// discard it, or publish it as the next immutable version.
import { and, desc, eq, max, sql } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { AppContext } from "../context.ts";
import type { Database } from "../db/client.ts";
import { flowDrafts, flows, flowVersions } from "../db/schema.ts";
import { conflict, isUniqueViolation, notFound, unprocessable } from "../lib/errors.ts";
import { loadBuiltInSections } from "../flows/builtin.ts";
import { recordAudit } from "./audit.ts";
import { draftOf, person, problemsOf } from "./flow-authoring.ts";
import { resolveSections } from "../../shared/flow/compile.ts";
import { draftHasErrors, starterDefinition } from "../../shared/flow/draft.ts";
import type { SaveDraftResponse, VersionSummary } from "../../shared/schemas/flows.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

type Db = Pick<Database, "select">;

const noFlow = () => notFound("There is no such flow.");
const noDraft = () => notFound("This flow has no draft: it was published or discarded. Start a new draft from the latest version.");
export const draftExists = (revision: number) =>
  conflict("draft_exists", "This flow already has a draft; open it, or discard it first.", { revision });

async function flowRow(db: Db, id: string, lock = false) {
  const query = db.select().from(flows).where(eq(flows.id, id));
  const [row] = lock ? await query.for("update") : await query;
  if (!row) throw noFlow();
  return row;
}

/** The 409 for a save or publish from an older revision, with the draft as it now stands. */
async function staleDraft(db: Db, flowId: string) {
  const current = await draftOf(db, flowId);
  if (!current) return noDraft();
  return conflict(
    "draft_stale",
    `Someone saved this draft after you opened it (it is now at revision ${current.revision}${current.updatedBy ? `, by ${current.updatedBy.name}` : ""}). Reload it before saving again.`,
    { revision: current.revision, definition: current.definition, updatedBy: current.updatedBy, updatedAt: current.updatedAt.toISOString() },
  );
}


/** Starts the draft from a version (the latest by default; a flow never published starts from the one finding step). */
export async function startDraft(ctx: Pick<AppContext, "db">, user: PublicUser, flowId: string, fromVersion: number | undefined): Promise<void> {
  const flow = await flowRow(ctx.db, flowId);
  const existing = await draftOf(ctx.db, flowId);
  if (existing) throw draftExists(existing.revision);
  const query = ctx.db.select({ number: flowVersions.number, definition: flowVersions.definition }).from(flowVersions);
  const [version] =
    fromVersion === undefined
      ? await query.where(eq(flowVersions.flowId, flowId)).orderBy(desc(flowVersions.number)).limit(1)
      : await query.where(and(eq(flowVersions.flowId, flowId), eq(flowVersions.number, fromVersion)));
  if (fromVersion !== undefined && !version) throw notFound(`Version ${fromVersion} of this flow does not exist.`);
  try {
    await ctx.db.transaction(async (tx) => {
      await tx.insert(flowDrafts).values({
        flowId,
        definition: version ? version.definition : starterDefinition(flowId, flow.title),
        revision: 1,
        basedOnVersion: version?.number ?? null,
        updatedBy: user.id,
      });
      await recordAudit(tx, { userId: user.id, action: "flow.draft_started", recordType: "flow", recordId: flowId, details: { fromVersion: version?.number ?? null } });
    });
  } catch (e) {
    if (isUniqueViolation(e)) throw draftExists(1);
    throw e;
  }
}

/** Saves the draft when `revision` is the stored one (it then goes up by one); an invalid draft still saves. */
export async function saveDraft(ctx: Pick<AppContext, "db">, user: PublicUser, flowId: string, revision: number, definition: Record<string, unknown>): Promise<SaveDraftResponse> {
  await flowRow(ctx.db, flowId);
  // One conditional UPDATE: of two saves from the same revision exactly one matches.
  const [saved] = await ctx.db
    .update(flowDrafts)
    .set({ definition, revision: sql`${flowDrafts.revision} + 1`, updatedBy: user.id, updatedAt: new Date() })
    .where(and(eq(flowDrafts.flowId, flowId), eq(flowDrafts.revision, revision)))
    .returning({ revision: flowDrafts.revision, updatedAt: flowDrafts.updatedAt });
  if (!saved) throw await staleDraft(ctx.db, flowId);
  return { revision: saved.revision, problems: problemsOf(flowId, definition), updatedAt: saved.updatedAt.toISOString() };
}

export async function discardDraft(ctx: Pick<AppContext, "db">, user: PublicUser, flowId: string): Promise<void> {
  await flowRow(ctx.db, flowId);
  await ctx.db.transaction(async (tx) => {
    const gone = await tx.delete(flowDrafts).where(eq(flowDrafts.flowId, flowId)).returning({ revision: flowDrafts.revision });
    if (gone.length === 0) throw noDraft();
    await recordAudit(tx, { userId: user.id, action: "flow.draft_discarded", recordType: "flow", recordId: flowId, details: { revision: gone[0]!.revision } });
  });
}

/**
 * Publishes the draft at `revision` as version n+1, with its sections embedded, and deletes the draft.
 * Refused with 422 while the draft has errors, 409 when the revision is stale.
 */
export async function publishDraft(ctx: Pick<AppContext, "db">, user: PublicUser, flowId: string, revision: number, note: string): Promise<VersionSummary> {
  return ctx.db.transaction(async (tx) => {
    // The flow row is the lock that puts two publishes one after the other.
    await flowRow(tx, flowId, true);
    const [draft] = await tx.select().from(flowDrafts).where(eq(flowDrafts.flowId, flowId)).for("update");
    if (!draft) throw noDraft();
    if (draft.revision !== revision) throw await staleDraft(tx, flowId);
    const problems = problemsOf(flowId, draft.definition);
    if (draftHasErrors(problems)) {
      const errors = problems.filter((p) => p.severity === "error").length;
      throw unprocessable("draft_has_errors", `The draft has ${errors} error${errors === 1 ? "" : "s"} to fix before it can be published.`, { problems });
    }
    const definition = resolveSections(draft.definition, loadBuiltInSections());
    const [{ latest } = { latest: null }] = await tx.select({ latest: max(flowVersions.number) }).from(flowVersions).where(eq(flowVersions.flowId, flowId));
    const number = (latest ?? 0) + 1;
    const [version] = await tx
      .insert(flowVersions)
      .values({ id: uuidv7(), flowId, number, definition, note, createdBy: user.id })
      .returning({ createdAt: flowVersions.createdAt });
    await tx.update(flows).set({ title: definition.title }).where(eq(flows.id, flowId));
    await tx.delete(flowDrafts).where(eq(flowDrafts.flowId, flowId));
    await recordAudit(tx, { userId: user.id, action: "flow.published", recordType: "flow", recordId: flowId, details: { version: number, revision, note, basedOnVersion: draft.basedOnVersion } });
    return { number, note, createdAt: version!.createdAt.toISOString(), createdBy: person(user.id, user.name), sessionCount: 0 };
  });
}
