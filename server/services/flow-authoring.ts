// Flows as senior techs author them: the list, a new flow, the detail with its versions and draft,
// one published version, and retiring. Drafts and publishing are in flow-drafts.ts.
import { and, count, desc, eq } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import type { Database } from "../db/client.ts";
import { diagnosticSessions, flowDrafts, flows, flowVersions, users, type FlowRow } from "../db/schema.ts";
import { can } from "../auth/policies.ts";
import { conflict, isUniqueViolation, notFound } from "../lib/errors.ts";
import { loadBuiltInSections } from "../flows/builtin.ts";
import { recordAudit } from "./audit.ts";
import { draftProblems, errorCount, starterDefinition, type DraftProblem } from "../../shared/flow/draft.ts";
import { appliesToSchema, type AppliesTo } from "../../shared/flow/schema.ts";
import type { FlowDetail, FlowListItem, FlowVersion, VersionSummary } from "../../shared/schemas/flows.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

type Db = Pick<Database, "select">;
export type Person = { id: string; name: string } | null;

export const person = (id: string | null, name: string | null): Person => (id !== null && name !== null ? { id, name } : null);

/** A draft's problems: the shared validator with the built-in section library, plus the id rule. */
export const problemsOf = (flowId: string, definition: unknown): DraftProblem[] => draftProblems(flowId, definition, loadBuiltInSections());

const hidden = () => notFound("There is no such flow.");

/** The flow's row and its latest version number; 404 for an unknown flow or one the user may not read. */
export async function readableFlow(db: Db, user: PublicUser, id: string): Promise<FlowRow & { latest: number | null }> {
  const [row] = await db.select().from(flows).where(eq(flows.id, id));
  if (!row) throw hidden();
  const [latest] = await db.select({ number: flowVersions.number }).from(flowVersions).where(eq(flowVersions.flowId, id)).orderBy(desc(flowVersions.number)).limit(1);
  if (!can(user, "flow.read", { published: latest !== undefined, retired: row.retired })) throw hidden();
  return { ...row, latest: latest?.number ?? null };
}

/** The draft with its editor's name, or null. */
export async function draftOf(db: Db, flowId: string) {
  const [row] = await db
    .select({ draft: flowDrafts, editorName: users.name })
    .from(flowDrafts)
    .leftJoin(users, eq(users.id, flowDrafts.updatedBy))
    .where(eq(flowDrafts.flowId, flowId));
  return row ? { ...row.draft, updatedBy: person(row.draft.updatedBy, row.editorName) } : null;
}

const appliesToOf = (definition: unknown): AppliesTo | null => {
  const parsed = appliesToSchema.safeParse((definition as { appliesTo?: unknown } | null)?.appliesTo);
  return parsed.success ? parsed.data : null;
};

export async function listFlows(ctx: Pick<AppContext, "db">, user: PublicUser): Promise<FlowListItem[]> {
  const editor = can(user, "flow.edit");
  const rows = await ctx.db.select().from(flows).orderBy(flows.title, flows.id);
  const latest = await ctx.db
    .selectDistinctOn([flowVersions.flowId], {
      flowId: flowVersions.flowId,
      number: flowVersions.number,
      createdAt: flowVersions.createdAt,
      createdBy: flowVersions.createdBy,
      authorName: users.name,
      definition: flowVersions.definition,
    })
    .from(flowVersions)
    .leftJoin(users, eq(users.id, flowVersions.createdBy))
    .orderBy(flowVersions.flowId, desc(flowVersions.number));
  const versionOf = new Map(latest.map((v) => [v.flowId, v]));
  const drafts = editor
    ? await ctx.db.select({ draft: flowDrafts, editorName: users.name }).from(flowDrafts).leftJoin(users, eq(users.id, flowDrafts.updatedBy))
    : [];
  const draftFor = new Map(drafts.map((d) => [d.draft.flowId, d]));
  const sessionCounts = await ctx.db
    .select({ flowId: flowVersions.flowId, n: count() })
    .from(diagnosticSessions)
    .innerJoin(flowVersions, eq(flowVersions.id, diagnosticSessions.flowVersionId))
    .groupBy(flowVersions.flowId);
  const sessionsOf = new Map(sessionCounts.map((s) => [s.flowId, s.n]));

  return rows
    .filter((f) => can(user, "flow.read", { published: versionOf.has(f.id), retired: f.retired }))
    .map((f) => {
      const v = versionOf.get(f.id);
      const d = draftFor.get(f.id);
      const published = v ? { number: v.number, createdAt: v.createdAt.toISOString(), createdBy: person(v.createdBy, v.authorName) } : null;
      const draft = d
        ? { revision: d.draft.revision, updatedAt: d.draft.updatedAt.toISOString(), updatedBy: person(d.draft.updatedBy, d.editorName), errorCount: errorCount(problemsOf(f.id, d.draft.definition)) }
        : null;
      return {
        id: f.id,
        title: f.title,
        appliesTo: appliesToOf(v?.definition) ?? appliesToOf(d?.draft.definition),
        retired: f.retired,
        published,
        draft,
        lastEditedBy: draft ? draft.updatedBy : (published?.createdBy ?? null),
        sessionCount: sessionsOf.get(f.id) ?? 0,
      };
    });
}

const flowExists = (id: string) => conflict("flow_exists", `There is already a flow with the id "${id}"; choose another id.`);

/** A new flow: its row and a draft that starts with one finding step. Nothing is published. */
export async function createFlow(ctx: Pick<AppContext, "db">, user: PublicUser, input: { id: string; title: string }): Promise<void> {
  const [existing] = await ctx.db.select({ id: flows.id }).from(flows).where(eq(flows.id, input.id));
  if (existing) throw flowExists(input.id);
  try {
    await ctx.db.transaction(async (tx) => {
      await tx.insert(flows).values({ id: input.id, title: input.title });
      await tx.insert(flowDrafts).values({ flowId: input.id, definition: starterDefinition(input.id, input.title), revision: 1, basedOnVersion: null, updatedBy: user.id });
      await recordAudit(tx, { userId: user.id, action: "flow.created", recordType: "flow", recordId: input.id, details: { title: input.title } });
    });
  } catch (e) {
    if (isUniqueViolation(e)) throw flowExists(input.id);
    throw e;
  }
}

async function versionSummaries(db: Db, flowId: string): Promise<VersionSummary[]> {
  const rows = await db
    .select({ id: flowVersions.id, number: flowVersions.number, note: flowVersions.note, createdAt: flowVersions.createdAt, createdBy: flowVersions.createdBy, authorName: users.name })
    .from(flowVersions)
    .leftJoin(users, eq(users.id, flowVersions.createdBy))
    .where(eq(flowVersions.flowId, flowId))
    .orderBy(desc(flowVersions.number));
  const counts = await db
    .select({ versionId: diagnosticSessions.flowVersionId, n: count() })
    .from(diagnosticSessions)
    .innerJoin(flowVersions, eq(flowVersions.id, diagnosticSessions.flowVersionId))
    .where(eq(flowVersions.flowId, flowId))
    .groupBy(diagnosticSessions.flowVersionId);
  const sessionsOf = new Map(counts.map((c) => [c.versionId, c.n]));
  return rows.map((r) => ({ number: r.number, note: r.note, createdAt: r.createdAt.toISOString(), createdBy: person(r.createdBy, r.authorName), sessionCount: sessionsOf.get(r.id) ?? 0 }));
}

/** The flow, its versions newest first, and for editors its draft with the validator's problems. */
export async function getFlowDetail(ctx: Pick<AppContext, "db">, user: PublicUser, id: string): Promise<FlowDetail> {
  const flow = await readableFlow(ctx.db, user, id);
  const draft = can(user, "flow.edit") ? await draftOf(ctx.db, id) : null;
  return {
    id: flow.id,
    title: flow.title,
    retired: flow.retired,
    versions: await versionSummaries(ctx.db, id),
    draft: draft && {
      revision: draft.revision,
      basedOnVersion: draft.basedOnVersion,
      definition: draft.definition,
      problems: problemsOf(id, draft.definition),
      updatedAt: draft.updatedAt.toISOString(),
      updatedBy: draft.updatedBy,
    },
  };
}

/** One published version, definition and all. */
export async function getFlowVersion(ctx: Pick<AppContext, "db">, user: PublicUser, id: string, number: number): Promise<FlowVersion> {
  await readableFlow(ctx.db, user, id);
  const [row] = await ctx.db
    .select({ version: flowVersions, authorName: users.name })
    .from(flowVersions)
    .leftJoin(users, eq(users.id, flowVersions.createdBy))
    .where(and(eq(flowVersions.flowId, id), eq(flowVersions.number, number)));
  if (!row) throw notFound(`Version ${number} of this flow does not exist.`);
  const [sessions] = await ctx.db.select({ n: count() }).from(diagnosticSessions).where(eq(diagnosticSessions.flowVersionId, row.version.id));
  const v = row.version;
  return {
    flowId: id,
    number: v.number,
    note: v.note,
    createdAt: v.createdAt.toISOString(),
    createdBy: person(v.createdBy, row.authorName),
    sessionCount: sessions?.n ?? 0,
    definition: v.definition,
  };
}

/** Retires a flow (no new session is offered or started on it) or brings it back; running sessions go on. */
export async function setRetired(ctx: Pick<AppContext, "db">, user: PublicUser, id: string, retired: boolean): Promise<void> {
  await ctx.db.transaction(async (tx) => {
    const [row] = await tx.select().from(flows).where(eq(flows.id, id)).for("update");
    if (!row) throw hidden();
    if (row.retired === retired) return;
    await tx.update(flows).set({ retired }).where(eq(flows.id, id));
    await recordAudit(tx, { userId: user.id, action: retired ? "flow.retired" : "flow.restored", recordType: "flow", recordId: id });
  });
}
