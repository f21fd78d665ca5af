// Benchmark: the review queue and shop insight on the load data (npm run seed:load): a hundred
// thousand sessions over two years. Warms up, then times each realistic query 60 times and prints
// one JSON line at the end with the 50th and 95th percentiles against their targets (every case's
// 95th percentile must be within its target).
import { existsSync } from "node:fs";
import path from "node:path";
import v8 from "node:v8";
import vm from "node:vm";
import { count, eq, sql } from "drizzle-orm";
import { openDatabase } from "../../server/db/client.ts";
import { acquireDataLock, DataFolderLockedError } from "../../server/db/lock.ts";
import { diagnosticSessions, sessionEvents, users } from "../../server/db/schema.ts";
import { demoUsers } from "../../server/db/seed/demo.ts";
import { lastNames } from "../../server/db/seed/history-cast.ts";
import { loadDataDir } from "../../server/db/seed/load-options.ts";
import { shopInsight } from "../../server/services/insight.ts";
import { reviewQueue } from "../../server/services/review-queue.ts";
import { insightQuerySchema } from "../../shared/schemas/insight.ts";
import { reviewQueueQuerySchema } from "../../shared/schemas/review.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

const QUEUE_TARGET_P95_MS = 50;
const INSIGHT_TARGET_P95_MS = 250;
const WARM_UP = 5;
const RUNS = 60;
const DAY = 86_400_000;

// Collecting between cases (never inside a run) keeps one case's garbage out of another's time.
v8.setFlagsFromString("--expose-gc");
const collect = vm.runInNewContext("gc") as () => void;

const dir = loadDataDir();
const pgdata = path.join(dir, "pgdata");
if (!existsSync(pgdata)) {
  console.error(`There is no load data in ${dir}: run npm run seed:load first.`);
  process.exit(1);
}

function percentile(xs: number[], p: number): number {
  const sorted = [...xs].sort((a, b) => a - b);
  return Number(sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!.toFixed(2));
}

const summary = (ms: number[]) => ({ p50Ms: percentile(ms, 50), p95Ms: percentile(ms, 95), runs: ms.length });
const day = (ms: number) => new Date(ms).toISOString().slice(0, 10);

function lockOrExit() {
  try {
    return acquireDataLock(dir);
  } catch (error) {
    if (!(error instanceof DataFolderLockedError)) throw error;
    console.error(error.message);
    process.exit(1);
  }
}

const lock = lockOrExit();
const opening = performance.now();
const handle = await openDatabase({ kind: "pglite", dataDir: pgdata });
try {
  const { db } = handle;
  console.log(`opened ${pgdata} and applied any new migrations in ${((performance.now() - opening) / 1000).toFixed(1)} s`);
  const [lead] = await db.select({ id: users.id, email: users.email, name: users.name, role: users.role, unitSystem: users.unitSystem }).from(users).where(eq(users.email, demoUsers.find((u) => u.role === "shop_lead")!.email));
  if (!lead) throw new Error("the load data has no shop lead: run npm run seed:load again");
  const shopLead: PublicUser = lead;
  const [sessions] = await db.select({ n: count() }).from(diagnosticSessions);
  const [events] = await db.select({ n: count() }).from(sessionEvents);
  const techs = (await db.selectDistinct({ id: diagnosticSessions.techId }).from(diagnosticSessions)).map((t) => t.id).sort();
  const [{ latest } = { latest: new Date() }] = await db.select({ latest: sql<Date>`max(${diagnosticSessions.startedAt})`.mapWith((v: string) => new Date(v)) }).from(diagnosticSessions);
  const now = latest.getTime();
  console.log(`${sessions!.n} sessions, ${events!.n} events, ${techs.length} techs, the latest begun ${latest.toISOString()}`);

  const kinds = ["string_trimmer", "chainsaw", "leaf_blower", "hedge_trimmer", "walk_behind_mower", "generator"] as const;
  // Each case makes its i-th query: the filters a shop lead would use, varied from run to run.
  const queueCases: Record<string, (i: number) => Record<string, string>> = {
    everythingNewestFirst: (i) => ({ page: String(1 + (i % 3)) }),
    flaggedWaitingByCompletion: () => ({ flagged: "true", reviewState: "waiting", sort: "completedAt", order: "desc" }),
    techAndDateRange: (i) => ({ techId: techs[i % techs.length]!, from: day(now - (120 + (i % 8) * 30) * DAY), to: day(now - (i % 8) * 30 * DAY), sort: "startedAt" }),
    equipmentAndCustomerSearch: (i) => ({ equipmentKind: kinds[i % kinds.length]!, search: lastNames[(i * 7) % lastNames.length]!, sort: "startedAt" }),
    deepPage: (i) => ({ reviewState: "approved", sort: "completedAt", order: "desc", page: String(150 + (i % 10) * 20), pageSize: "25" }),
  };
  const queue: Record<string, ReturnType<typeof summary> & { total: number }> = {};
  const all: number[] = [];
  for (const [name, make] of Object.entries(queueCases)) {
    collect();
    for (let i = 0; i < WARM_UP; i++) await reviewQueue({ db }, shopLead, reviewQueueQuerySchema.parse(make(i)));
    const ms: number[] = [];
    let total = 0;
    for (let i = 0; i < RUNS; i++) {
      const q = reviewQueueQuerySchema.parse(make(i));
      const began = performance.now();
      const page = await reviewQueue({ db }, shopLead, q);
      ms.push(performance.now() - began);
      total += page.total;
    }
    all.push(...ms);
    queue[name] = { ...summary(ms), total: Math.round(total / RUNS) };
    console.log(`queue ${name}: p50 ${queue[name].p50Ms} ms, p95 ${queue[name].p95Ms} ms over ${RUNS} runs (about ${queue[name].total} matching sessions a query)`);
  }
  const queueMeets = Object.values(queue).every((c) => c.p95Ms <= QUEUE_TARGET_P95_MS);

  // The last 90 days and the last year, ending on a day that moves back a little from run to run.
  const insightCases: Record<string, number> = { days90: 90, days365: 365 };
  const insight: Record<string, ReturnType<typeof summary> & { sessions: number }> = {};
  const allInsight: number[] = [];
  for (const [name, days] of Object.entries(insightCases)) {
    collect();
    const range = (i: number) => insightQuerySchema.parse({ from: day(now - (days - 1 + (i % 10)) * DAY), to: day(now - (i % 10) * DAY) });
    for (let i = 0; i < WARM_UP; i++) await shopInsight({ db }, shopLead, range(i));
    const ms: number[] = [];
    let seen = 0;
    for (let i = 0; i < RUNS; i++) {
      const q = range(i);
      const began = performance.now();
      const figures = await shopInsight({ db }, shopLead, q);
      ms.push(performance.now() - began);
      seen += figures.totals.sessions;
    }
    allInsight.push(...ms);
    insight[name] = { ...summary(ms), sessions: Math.round(seen / RUNS) };
    console.log(`insight ${name}: p50 ${insight[name].p50Ms} ms, p95 ${insight[name].p95Ms} ms over ${RUNS} runs (about ${insight[name].sessions} sessions in the range)`);
  }
  const insightMeets = Object.values(insight).every((c) => c.p95Ms <= INSIGHT_TARGET_P95_MS);
  const result = {
    benchmark: "review",
    sessions: sessions!.n,
    events: events!.n,
    queue: { ...summary(all), targetP95Ms: QUEUE_TARGET_P95_MS, meets: queueMeets, cases: queue },
    insight: { ...summary(allInsight), targetP95Ms: INSIGHT_TARGET_P95_MS, meets: insightMeets, cases: insight },
    met: queueMeets && insightMeets,
  };
  console.log(JSON.stringify(result));
} finally {
  await handle.close();
  lock.release();
}
