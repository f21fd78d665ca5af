import { and, eq, gte, lt, sql, type SQL } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import { diagnosticSessions, flows, flowVersions, units, users, workOrders } from "../db/schema.ts";
import { authorize } from "../auth/policies.ts";
import { compiledVersion } from "./flows.ts";
import type { InsightQuery, InsightResponse } from "../../shared/schemas/insight.ts";
import type { EquipmentKind } from "../../shared/equipment.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";
import type { reviewStates, sessionStatuses } from "../../shared/schemas/sessions.ts";

type Db = Pick<AppContext, "db">["db"];
type SessionStatus = (typeof sessionStatuses)[number];
type ReviewState = (typeof reviewStates)[number];
const s = diagnosticSessions;
const DAY_MS = 86_400_000;

/** Whole UTC days by the day a session began, both ends included. */
function inRange(q: InsightQuery): SQL {
  return and(gte(s.startedAt, new Date(`${q.from}T00:00:00.000Z`)), lt(s.startedAt, new Date(Date.parse(`${q.to}T00:00:00.000Z`) + DAY_MS)))!;
}

/**
 * One pass over the range's sessions, grouped two ways at once: by tech and what became of the
 * session (status, review, flagged or not), and by flow version, kind of equipment and finding
 * step. Names are joined on after the grouping, so they cost nothing per session.
 */
function countsQuery(db: Db, where: SQL) {
  const equipment = db
    .select({ workOrderId: sql<string>`${workOrders.id}`.as("equipment_work_order_id"), equipmentKind: sql<EquipmentKind>`${units.equipmentKind}`.as("equipment_kind_of_unit") })
    .from(workOrders)
    .innerJoin(units, eq(units.id, workOrders.unitId))
    .as("equipment");
  const flagged = sql`${s.flagCount} > 0`;
  const grouped = db
    .select({
      byTech: sql<boolean>`grouping(${s.techId}) = 0`.as("grouped_by_tech"),
      techId: sql<string | null>`${s.techId}`.as("grouped_tech_id"),
      status: sql<SessionStatus>`${s.status}`.as("grouped_status"),
      reviewState: sql<ReviewState | null>`${s.reviewState}`.as("grouped_review_state"),
      flagged: sql<boolean | null>`${flagged}`.as("grouped_flagged"),
      flowVersionId: sql<string | null>`${s.flowVersionId}`.as("grouped_flow_version_id"),
      equipmentKind: sql<EquipmentKind | null>`${equipment.equipmentKind}`.as("grouped_kind"),
      findingStepId: sql<string | null>`${s.findingStepId}`.as("grouped_finding_step_id"),
      sessions: sql<number>`count(*)::int`.as("grouped_sessions"),
      flags: sql<number>`sum(${s.flagCount})::int`.as("grouped_flags"),
    })
    .from(s)
    .innerJoin(equipment, eq(equipment.workOrderId, s.workOrderId))
    .where(where)
    .groupBy(sql`grouping sets ((${s.techId}, ${s.status}, ${s.reviewState}, ${flagged}), (${s.flowVersionId}, ${equipment.equipmentKind}, ${s.findingStepId}, ${s.status}))`)
    .as("grouped");
  return db
    .select({
      byTech: grouped.byTech,
      techId: grouped.techId,
      status: grouped.status,
      reviewState: grouped.reviewState,
      flagged: grouped.flagged,
      flowVersionId: grouped.flowVersionId,
      equipmentKind: grouped.equipmentKind,
      findingStepId: grouped.findingStepId,
      sessions: grouped.sessions,
      flags: grouped.flags,
      techName: users.name,
      flowId: flowVersions.flowId,
      version: flowVersions.number,
      flowTitle: flows.title,
    })
    .from(grouped)
    .leftJoin(users, eq(users.id, grouped.techId))
    .leftJoin(flowVersions, eq(flowVersions.id, grouped.flowVersionId))
    .leftJoin(flows, eq(flows.id, flowVersions.flowId));
}

/**
 * Median minutes from start to completion of completed sessions, per flow (all its versions
 * together) and over the whole range (the row with no flow). Each flow is given a small number
 * first, so the sessions are sorted by a number rather than by text.
 */
function mediansQuery(db: Db, where: SQL) {
  const flowKeys = db.$with("flow_keys").as(
    db.select({ versionId: sql<string>`${flowVersions.id}`.as("version_id"), flowId: sql<string>`${flowVersions.flowId}`.as("flow_id"), key: sql<number>`(dense_rank() over (order by ${flowVersions.flowId}))::int`.as("key") }).from(flowVersions),
  );
  const minutes = sql`date_part('epoch', ${s.completedAt} - ${s.startedAt}) / 60`;
  const grouped = db
    .select({
      key: sql<number | null>`${flowKeys.key}`.as("grouped_key"),
      completed: sql<number>`count(*)::int`.as("completed"),
      medianMinutes: sql<number | null>`percentile_cont(0.5) within group (order by ${minutes})`.as("median_minutes"),
    })
    .from(s)
    .innerJoin(flowKeys, eq(flowKeys.versionId, s.flowVersionId))
    .where(and(where, eq(s.status, "completed"), sql`${s.completedAt} is not null`))
    .groupBy(sql`rollup (${flowKeys.key})`)
    .as("grouped");
  const named = db.selectDistinct({ key: flowKeys.key, flowId: flowKeys.flowId }).from(flowKeys).as("named");
  return db
    .with(flowKeys)
    .select({ flowId: named.flowId, flowTitle: flows.title, completed: grouped.completed, medianMinutes: grouped.medianMinutes })
    .from(grouped)
    .leftJoin(named, eq(named.key, grouped.key))
    .leftJoin(flows, eq(flows.id, named.flowId));
}

interface Tally {
  sessions: number;
  completed: number;
  abandoned: number;
  open: number;
  reviewed: number;
  returned: number;
  flags: number;
  flaggedSessions: number;
}
const emptyTally = (): Tally => ({ sessions: 0, completed: 0, abandoned: 0, open: 0, reviewed: 0, returned: 0, flags: 0, flaggedSessions: 0 });

/** Adds one grouped row (sessions of one status, review state and flagged-or-not) to a tally. */
function addTo(tally: Tally, row: { status: SessionStatus; reviewState: ReviewState | null; flagged: boolean | null; sessions: number; flags: number }) {
  tally.sessions += row.sessions;
  if (row.status === "open") tally.open += row.sessions;
  if (row.status === "abandoned") tally.abandoned += row.sessions;
  if (row.status !== "completed") return;
  tally.completed += row.sessions;
  if (row.reviewState === "approved" || row.reviewState === "returned") tally.reviewed += row.sessions;
  if (row.reviewState === "returned") tally.returned += row.sessions;
  tally.flags += row.flags;
  if (row.flagged) tally.flaggedSessions += row.sessions;
}

const rate = (part: number, whole: number) => (whole === 0 ? null : part / whole);
/** Most frequent first, then by name so equal counts keep one order. */
const byCount = <T extends { count: number }>(name: (row: T) => string) => (a: T, b: T) => b.count - a.count || name(a).localeCompare(name(b));

/**
 * The shop lead's figures over a date range, from two grouped queries over the sessions begun in
 * it. Findings are grouped by flow version and step in SQL, the versions of one flow are merged,
 * and each finding is named once from the compiled flow of the newest version in the range that
 * reached it (so a step renamed in a later version shows its new title everywhere).
 */
export async function shopInsight(ctx: Pick<AppContext, "db">, user: PublicUser, q: InsightQuery): Promise<InsightResponse> {
  authorize(user, "insight.read");
  const where = inRange(q);
  const countRows = await countsQuery(ctx.db, where);
  const medianRows = await mediansQuery(ctx.db, where);

  const totals = emptyTally();
  const techs = new Map<string, Tally & { techName: string }>();
  const findingRows: { flowVersionId: string; flowId: string; flowTitle: string; version: number; equipmentKind: EquipmentKind; findingStepId: string; count: number }[] = [];
  for (const row of countRows) {
    if (row.byTech) {
      // Every session has one tech, so the techs' rows add up to the range.
      let tech = techs.get(row.techId!);
      if (!tech) techs.set(row.techId!, (tech = { ...emptyTally(), techName: row.techName ?? row.techId! }));
      addTo(tech, row);
      addTo(totals, row);
    } else if (row.status === "completed" && row.findingStepId !== null) {
      findingRows.push({ flowVersionId: row.flowVersionId!, flowId: row.flowId!, flowTitle: row.flowTitle!, version: row.version!, equipmentKind: row.equipmentKind!, findingStepId: row.findingStepId, count: row.sessions });
    }
  }

  // A flow's finding across its versions, named as the newest version in the range names it.
  const byFlow = new Map<string, InsightResponse["findingsByFlow"][number] & { version: number; flowVersionId: string }>();
  for (const row of findingRows) {
    const key = JSON.stringify([row.flowId, row.findingStepId]);
    const entry = byFlow.get(key);
    if (!entry) byFlow.set(key, { flowId: row.flowId, flowTitle: row.flowTitle, findingStepId: row.findingStepId, findingTitle: "", count: row.count, version: row.version, flowVersionId: row.flowVersionId });
    else {
      entry.count += row.count;
      if (row.version > entry.version) Object.assign(entry, { version: row.version, flowVersionId: row.flowVersionId });
    }
  }
  for (const entry of byFlow.values()) entry.findingTitle = (await compiledVersion(ctx.db, entry.flowVersionId)).steps[entry.findingStepId]?.title ?? entry.findingStepId;
  const byEquipment = new Map<string, InsightResponse["findingsByEquipment"][number]>();
  for (const row of findingRows) {
    const findingTitle = byFlow.get(JSON.stringify([row.flowId, row.findingStepId]))!.findingTitle;
    const key = JSON.stringify([row.equipmentKind, findingTitle]);
    const entry = byEquipment.get(key);
    if (entry) entry.count += row.count;
    else byEquipment.set(key, { equipmentKind: row.equipmentKind, findingTitle, count: row.count });
  }

  const overall = medianRows.find((r) => r.flowId === null);
  return {
    from: q.from,
    to: q.to,
    totals: {
      sessions: totals.sessions,
      completed: totals.completed,
      abandoned: totals.abandoned,
      open: totals.open,
      reviewed: totals.reviewed,
      returned: totals.returned,
      returnRate: rate(totals.returned, totals.reviewed),
      medianMinutesToFinding: overall && overall.completed > 0 ? overall.medianMinutes : null,
      flaggedSessions: totals.flaggedSessions,
    },
    findingsByFlow: [...byFlow.values()].map(({ version: _version, flowVersionId: _flowVersionId, ...r }) => r).sort(byCount((r) => `${r.flowTitle} ${r.findingTitle}`)),
    findingsByEquipment: [...byEquipment.values()].sort(byCount((r) => `${r.equipmentKind} ${r.findingTitle}`)),
    timeToFinding: medianRows
      .filter((r): r is typeof r & { flowId: string; medianMinutes: number } => r.flowId !== null && r.medianMinutes !== null)
      .map((r) => ({ flowId: r.flowId, flowTitle: r.flowTitle ?? r.flowId, completed: r.completed, medianMinutes: r.medianMinutes }))
      .sort((a, b) => a.flowTitle.localeCompare(b.flowTitle)),
    techs: [...techs.entries()]
      .map(([techId, t]) => ({ techId, techName: t.techName, sessions: t.sessions, completed: t.completed, reviewed: t.reviewed, returned: t.returned, returnRate: rate(t.returned, t.reviewed), flags: t.flags, flaggedSessions: t.flaggedSessions }))
      .sort((a, b) => a.techName.localeCompare(b.techName) || a.techId.localeCompare(b.techId)),
  };
}
