import { and, count, eq, gte, ilike, inArray, lt, sql, type SQL } from "drizzle-orm";
import { union, type PgSelect } from "drizzle-orm/pg-core";
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

/** Every record a queue row shows, joined for the page's own sessions only. */
function withRowJoins<T extends PgSelect>(query: T) {
  return query
    .innerJoin(workOrders, eq(workOrders.id, s.workOrderId))
    .innerJoin(customers, eq(customers.id, workOrders.customerId))
    .innerJoin(units, eq(units.id, workOrders.unitId))
    .innerJoin(users, eq(users.id, s.techId))
    .innerJoin(flowVersions, eq(flowVersions.id, s.flowVersionId))
    .innerJoin(flows, eq(flows.id, flowVersions.flowId));
}

/**
 * Finding the page and counting the total read the sessions alone, joining only what the sort
 * needs: every join of a queue row is a required foreign key, so leaving one out never changes which
 * sessions match, and the total of a hundred thousand sessions is counted from an index.
 */
function withSortJoins<T extends PgSelect>(query: T, q: ReviewQueueQuery) {
  let out: PgSelect = query;
  if (q.sort === "tech") out = out.innerJoin(users, eq(users.id, s.techId));
  if (q.sort === "flow") out = out.innerJoin(flowVersions, eq(flowVersions.id, s.flowVersionId)).innerJoin(flows, eq(flows.id, flowVersions.flowId));
  return out as T;
}

/**
 * A completed session's flags were counted when it was completed; an open one left longer than the
 * shop's limit carries its open_too_long flag now, so the flagged filter finds stale checks too.
 */
function staleOpen(now: Date, limits: FlagLimits) {
  const cutoff = new Date(now.getTime() - limits.openHours * 3_600_000);
  return sql`(${s.status} = 'open' and ${s.startedAt} < ${cutoff})`;
}
function flagCountOf(now: Date, limits: FlagLimits) {
  return sql<number>`(${s.flagCount} + case when ${staleOpen(now, limits)} then 1 else 0 end)`.mapWith(Number);
}

const sortColumns = { startedAt: s.startedAt, completedAt: s.completedAt, tech: users.name, flow: flows.title } satisfies Record<ReviewSort, unknown>;

type Db = Pick<AppContext, "db">["db"];

/**
 * The work orders the kind of equipment and the search allow, or null when neither is asked for.
 * A search matches the customer's name or the unit's make and model: the customers and the units
 * are found each in its own table, where a trigram index serves ILIKE, then their work orders.
 */
function matchingWorkOrders(db: Db, q: ReviewQueueQuery) {
  const ofKind = (query: PgSelect) => (q.equipmentKind ? query.innerJoin(units, eq(units.id, workOrders.unitId)) : query);
  const kind = q.equipmentKind ? eq(units.equipmentKind, q.equipmentKind) : undefined;
  const orders = () => db.select({ id: workOrders.id }).from(workOrders).$dynamic();
  if (!q.search) return q.equipmentKind ? ofKind(orders()).where(kind) : null;
  const like = `%${escapeLike(q.search)}%`;
  const namedCustomers = db.select({ id: customers.id }).from(customers).where(ilike(customers.name, like));
  // "Make model" holds the make and the model, so it matches whatever either of them matches.
  const namedUnits = db.select({ id: units.id }).from(units).where(ilike(sql`${units.make} || ' ' || ${units.model}`, like));
  return union(ofKind(orders()).where(and(inArray(workOrders.customerId, namedCustomers), kind)), ofKind(orders()).where(and(inArray(workOrders.unitId, namedUnits), kind)));
}

/** The filters as SQL; a tech (anyone without review.list_all) is held to their own sessions whatever they ask for. */
function conditions(user: PublicUser, q: ReviewQueueQuery, db: Db, now: Date, limits: FlagLimits): SQL | undefined {
  const where: (SQL | undefined)[] = [];
  if (!can(user, "review.list_all")) where.push(eq(s.techId, user.id));
  if (q.techId) where.push(eq(s.techId, q.techId));
  if (q.flowId) where.push(inArray(s.flowVersionId, db.select({ id: flowVersions.id }).from(flowVersions).where(eq(flowVersions.flowId, q.flowId))));
  if (q.findingStepId) where.push(eq(s.findingStepId, q.findingStepId));
  const orders = matchingWorkOrders(db, q);
  if (orders) where.push(inArray(s.workOrderId, orders));
  // Whole UTC days, both ends included.
  if (q.from) where.push(gte(s.startedAt, new Date(`${q.from}T00:00:00.000Z`)));
  if (q.to) where.push(lt(s.startedAt, new Date(Date.parse(`${q.to}T00:00:00.000Z`) + DAY_MS)));
  if (q.flagged !== undefined) where.push(q.flagged ? sql`(${s.flagCount} > 0 or ${staleOpen(now, limits)})` : sql`(${s.flagCount} = 0 and not ${staleOpen(now, limits)})`);
  if (q.reviewState) where.push(eq(s.reviewState, q.reviewState));
  return and(...where);
}

/**
 * The review queue, a page at a time. Ties on the sort key fall back to the session id (ascending),
 * and a session without a completion time sorts last either way, so pages never overlap.
 */
export async function reviewQueue(ctx: Pick<AppContext, "db">, user: PublicUser, q: ReviewQueueQuery, now = new Date(), limits: FlagLimits = DEFAULT_FLAG_LIMITS): Promise<ReviewQueueResponse> {
  const where = conditions(user, q, ctx.db, now, limits);
  const [totals] = await ctx.db.select({ total: count() }).from(s).where(where);
  const direction = q.order === "asc" ? sql`asc` : sql`desc`;
  const order = [sql`${sortColumns[q.sort]} ${direction} nulls last`, sql`${s.id} asc`];
  const page = await withSortJoins(ctx.db.select({ id: s.id }).from(s).$dynamic(), q)
    .where(where)
    .orderBy(...order)
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  const ids = page.map((p) => p.id);
  const rows =
    ids.length === 0
      ? []
      : await withRowJoins(
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
            .$dynamic(),
        ).where(inArray(s.id, ids));
  const position = new Map(ids.map((id, i) => [id, i]));
  rows.sort((a, b) => position.get(a.sessionId)! - position.get(b.sessionId)!);
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
