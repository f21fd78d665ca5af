import { and, count, eq, gte, ilike, lt, or, sql, type SQL } from "drizzle-orm";
import type { PgSelect } from "drizzle-orm/pg-core";
import type { AppContext } from "../context.ts";
import { customers, diagnosticSessions, flows, flowVersions, units, users, workOrders } from "../db/schema.ts";
import { can } from "../auth/policies.ts";
import { compiledVersion } from "./flows.ts";
import { DEFAULT_FLAG_LIMITS, type FlagLimits } from "../../shared/review/flags.ts";
import type { ReviewQueueQuery, ReviewQueueResponse, ReviewSort } from "../../shared/schemas/review.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

const s = diagnosticSessions;
const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);
const DAY_MS = 86_400_000;

/** The records a queue row reads from; the page and its total join the same way. */
function withQueueJoins<T extends PgSelect>(query: T) {
  return query
    .innerJoin(workOrders, eq(workOrders.id, s.workOrderId))
    .innerJoin(customers, eq(customers.id, workOrders.customerId))
    .innerJoin(units, eq(units.id, workOrders.unitId))
    .innerJoin(users, eq(users.id, s.techId))
    .innerJoin(flowVersions, eq(flowVersions.id, s.flowVersionId))
    .innerJoin(flows, eq(flows.id, flowVersions.flowId));
}

/**
 * A completed session's flags were counted when it was completed; an open one left longer than the
 * shop's limit carries its open_too_long flag now, so the flagged filter finds stale checks too.
 */
function flagCountOf(now: Date, limits: FlagLimits) {
  const cutoff = new Date(now.getTime() - limits.openHours * 3_600_000);
  return sql<number>`(${s.flagCount} + case when ${s.status} = 'open' and ${s.startedAt} < ${cutoff} then 1 else 0 end)`.mapWith(Number);
}

const sortColumns = { startedAt: s.startedAt, completedAt: s.completedAt, tech: users.name, flow: flows.title } satisfies Record<ReviewSort, unknown>;

/** The filters as SQL; a tech (anyone without review.list_all) is held to their own sessions whatever they ask for. */
function conditions(user: PublicUser, q: ReviewQueueQuery, now: Date, limits: FlagLimits): SQL | undefined {
  const where: (SQL | undefined)[] = [];
  if (!can(user, "review.list_all")) where.push(eq(s.techId, user.id));
  if (q.techId) where.push(eq(s.techId, q.techId));
  if (q.flowId) where.push(eq(flows.id, q.flowId));
  if (q.findingStepId) where.push(eq(s.findingStepId, q.findingStepId));
  if (q.equipmentKind) where.push(eq(units.equipmentKind, q.equipmentKind));
  // Whole UTC days, both ends included.
  if (q.from) where.push(gte(s.startedAt, new Date(`${q.from}T00:00:00.000Z`)));
  if (q.to) where.push(lt(s.startedAt, new Date(Date.parse(`${q.to}T00:00:00.000Z`) + DAY_MS)));
  if (q.flagged !== undefined) where.push(q.flagged ? sql`${flagCountOf(now, limits)} > 0` : sql`${flagCountOf(now, limits)} = 0`);
  if (q.reviewState) where.push(eq(s.reviewState, q.reviewState));
  if (q.search) {
    const like = `%${escapeLike(q.search)}%`;
    where.push(or(ilike(customers.name, like), ilike(units.make, like), ilike(units.model, like), ilike(sql`${units.make} || ' ' || ${units.model}`, like)));
  }
  return and(...where);
}

/**
 * The review queue, a page at a time. Ties on the sort key fall back to the session id (ascending),
 * and a session without a completion time sorts last either way, so pages never overlap.
 */
export async function reviewQueue(ctx: Pick<AppContext, "db">, user: PublicUser, q: ReviewQueueQuery, now = new Date(), limits: FlagLimits = DEFAULT_FLAG_LIMITS): Promise<ReviewQueueResponse> {
  const where = conditions(user, q, now, limits);
  const base = () =>
    ctx.db
      .select({
        sessionId: s.id,
        workOrderNumber: workOrders.number,
        customer: customers.name,
        unit: { equipmentKind: units.equipmentKind, make: units.make, model: units.model },
        techId: s.techId,
        techName: users.name,
        flowId: flows.id,
        flowTitle: flows.title,
        version: flowVersions.number,
        flowVersionId: s.flowVersionId,
        findingStepId: s.findingStepId,
        status: s.status,
        reviewState: s.reviewState,
        startedAt: s.startedAt,
        completedAt: s.completedAt,
        flagCount: flagCountOf(now, limits),
      })
      .from(s)
      .$dynamic();
  const [totals] = await withQueueJoins(ctx.db.select({ total: count() }).from(s).$dynamic()).where(where);
  const direction = q.order === "asc" ? sql`asc` : sql`desc`;
  const rows = await withQueueJoins(base())
    .where(where)
    .orderBy(sql`${sortColumns[q.sort]} ${direction} nulls last`, sql`${s.id} asc`)
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  const out: ReviewQueueResponse["rows"] = [];
  for (const { flowId, flowTitle, version, flowVersionId, startedAt, completedAt, ...r } of rows) {
    const finding = r.findingStepId ? (await compiledVersion(ctx.db, flowVersionId)).steps[r.findingStepId] : undefined;
    out.push({
      ...r,
      flow: { flowId, title: flowTitle, version },
      findingStepTitle: r.findingStepId ? (finding?.title ?? r.findingStepId) : null,
      startedAt: startedAt.toISOString(),
      completedAt: completedAt?.toISOString() ?? null,
    });
  }
  return { rows: out, total: totals?.total ?? 0, page: q.page, pageSize: q.pageSize };
}
