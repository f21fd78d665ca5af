import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildSession } from "../../factories/sessions.ts";
import { buildFlow, flowDefinition } from "../../factories/flows.ts";
import { buildWorkOrder } from "../../factories/work-orders.ts";
import { users } from "../../../server/db/schema.ts";
import type { InsightResponse } from "../../../shared/schemas/insight.ts";
import type { EquipmentKind } from "../../../shared/equipment.ts";

let t: TestApp;
let lead: Awaited<ReturnType<typeof signedInAs>>;
let apprentice: Awaited<ReturnType<typeof signedInAs>>;
let others: Awaited<ReturnType<typeof signedInAs>>[] = [];

type Status = "open" | "completed" | "abandoned";
type Review = "not_submitted" | "waiting" | "approved" | "returned";
/** Every seeded session as the test knows it: the brute-force side of each comparison. */
interface Seeded {
  techId: string;
  techName: string;
  flowId: string;
  flowTitle: string;
  version: number;
  /** The finding step's title in this session's version. */
  findingTitle: string | null;
  findingStepId: string | null;
  equipmentKind: EquipmentKind;
  status: Status;
  reviewState: Review;
  flagCount: number;
  startedAt: Date;
  completedAt: Date | null;
}
const seeded: Seeded[] = [];

// Invented techs, flows and findings; names differ at their first letter so any collation sorts them alike.
const techNames = ["Juniper Hale", "Marten Oduya", "Sorrel Tamm"];
const kinds: EquipmentKind[] = ["string_trimmer", "chainsaw", "leaf_blower", "generator"];
const MINUTE = 60_000;

interface FlowVersionUnderTest {
  flowId: string;
  flowTitle: string;
  version: number;
  versionId: string;
  titles: Record<string, string>;
}
let versions: FlowVersionUnderTest[] = [];

async function seed(v: FlowVersionUnderTest, techIndex: number, kind: EquipmentKind, status: Status, startedAt: Date, extra: { minutes?: number; finding?: string; reviewState?: Review; flagCount?: number } = {}) {
  const tech = techIndex === 0 ? lead : techIndex === 1 ? apprentice : others[techIndex - 2]!;
  const completedAt = status === "completed" ? new Date(startedAt.getTime() + (extra.minutes ?? 30) * MINUTE) : null;
  const findingStepId = status === "completed" ? (extra.finding ?? "fuel") : null;
  const reviewState = status === "completed" ? (extra.reviewState ?? "waiting") : "not_submitted";
  const flagCount = status === "completed" ? (extra.flagCount ?? 0) : 0;
  const wo = await buildWorkOrder(t.ctx.db, { createdBy: lead.user.id, state: "diagnosing", unit: { equipmentKind: kind } });
  await buildSession(t.ctx.db, {
    flowVersionId: v.versionId, techId: tech.user.id, workOrderId: wo.id, status, reviewState, startedAt, completedAt, findingStepId, flagCount,
    ...(status === "abandoned" ? { abandonReason: "Customer collected it" } : {}),
  });
  seeded.push({
    techId: tech.user.id, techName: techNames[techIndex]!, flowId: v.flowId, flowTitle: v.flowTitle, version: v.version, findingStepId,
    findingTitle: findingStepId ? v.titles[findingStepId]! : null, equipmentKind: kind, status, reviewState, flagCount, startedAt, completedAt,
  });
}
beforeAll(async () => {
  t = await createTestApp();
  lead = await signedInAs(t, "shop_lead");
  apprentice = await signedInAs(t, "apprentice");
  others = [await signedInAs(t, "senior_tech")];
  for (const [i, who] of [lead, apprentice, ...others].entries()) await t.ctx.db.update(users).set({ name: techNames[i]! }).where(eq(users.id, who.user.id));

  // Flow "carb" has two versions; version 2 renames the fuel finding, so merged rows must take the new title.
  const v1 = flowDefinition("carb-check");
  const v2 = flowDefinition("carb-check", { steps: { ...v1.steps, fuel: { ...v1.steps.fuel!, title: "Stale or watered fuel" } } as typeof v1.steps });
  const carb = await buildFlow(t.ctx.db, { id: "carb-check", title: "Carb and fuel check", versions: [v1, v2] });
  const sparkDef = flowDefinition("spark-first");
  const spark = await buildFlow(t.ctx.db, { id: "spark-first", title: "Spark first", versions: [sparkDef] });
  versions = [
    { flowId: carb.id, flowTitle: "Carb and fuel check", version: 1, versionId: carb.versionIds[0]!, titles: { fuel: "Stale fuel", coil: "Failed ignition coil" } },
    { flowId: carb.id, flowTitle: "Carb and fuel check", version: 2, versionId: carb.versionIds[1]!, titles: { fuel: "Stale or watered fuel", coil: "Failed ignition coil" } },
    { flowId: spark.id, flowTitle: "Spark first", version: 1, versionId: spark.versionIds[0]!, titles: { fuel: "Stale fuel", coil: "Failed ignition coil" } },
  ];

  // Forty-two sessions through April 2026, varied by tech, flow version, equipment, outcome and review.
  for (let i = 0; i < 42; i++) {
    const status: Status = i % 6 === 0 ? "open" : i % 6 === 1 ? "abandoned" : "completed";
    const startedAt = new Date(Date.UTC(2026, 3, 1 + ((i * 7) % 30), 8 + (i % 9), (i * 13) % 60));
    await seed(versions[i % 3]!, (i + Math.floor(i / 3)) % 3, kinds[(i * 3) % 4]!, status, startedAt, {
      minutes: 5 + ((i * 17) % 90) + (i % 2) * 0.5,
      finding: Math.floor(i / 2) % 2 === 0 ? "fuel" : "coil",
      reviewState: (["waiting", "approved", "returned", "approved", "not_submitted"] as const)[i % 5],
      flagCount: (i * 7) % 3,
    });
  }
  // The edges of April, to the millisecond.
  await seed(versions[0]!, 0, "chainsaw", "completed", new Date("2026-03-31T23:59:59.999Z"), { minutes: 11, reviewState: "returned" });
  await seed(versions[1]!, 1, "chainsaw", "completed", new Date("2026-04-01T00:00:00.000Z"), { minutes: 13, reviewState: "returned", flagCount: 2 });
  await seed(versions[2]!, 2, "generator", "completed", new Date("2026-04-30T23:59:00.000Z"), { minutes: 17, finding: "coil", reviewState: "approved" });
  await seed(versions[2]!, 0, "generator", "completed", new Date("2026-05-01T00:00:00.000Z"), { minutes: 19, finding: "coil", reviewState: "returned", flagCount: 1 });

  // Two days in June with known durations: four completed on the 10th (and one abandoned), three on the 11th.
  for (const [i, minutes] of [10, 70, 20, 40].entries()) await seed(versions[i % 2]!, i % 3, "tiller", "completed", new Date(Date.UTC(2026, 5, 10, 9 + i)), { minutes });
  await seed(versions[0]!, 1, "tiller", "abandoned", new Date(Date.UTC(2026, 5, 10, 15)));
  for (const [i, minutes] of [61.5, 12, 18].entries()) await seed(versions[2]!, i, "tiller", "completed", new Date(Date.UTC(2026, 5, 11, 9 + i)), { minutes });
}, 120_000);
afterAll(() => t.close());

/** The median worked out by hand: the middle value, or the mean of the two middle values. */
function median(values: number[]): number | null {
  // From memory: the median of an even count is the mean of the two middle values (the textbook definition).
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

const minutesOf = (r: Seeded) => (r.completedAt!.getTime() - r.startedAt.getTime()) / MINUTE;
const share = (part: number, whole: number) => (whole === 0 ? null : part / whole);

/** What the answer should be, worked out from the seeded list with plain loops. */
function bruteForce(from: string, to: string) {
  const day = (d: Date) => d.toISOString().slice(0, 10);
  const rows = seeded.filter((r) => day(r.startedAt) >= from && day(r.startedAt) <= to);
  const done = rows.filter((r) => r.status === "completed");
  const figures = (list: Seeded[]) => {
    const completed = list.filter((r) => r.status === "completed");
    const reviewed = completed.filter((r) => r.reviewState === "approved" || r.reviewState === "returned").length;
    const returned = completed.filter((r) => r.reviewState === "returned").length;
    return { sessions: list.length, completed: completed.length, reviewed, returned, returnRate: share(returned, reviewed), flaggedSessions: completed.filter((r) => r.flagCount > 0).length };
  };
  const { returnRate, ...rest } = figures(rows);
  const totals = {
    ...rest,
    abandoned: rows.filter((r) => r.status === "abandoned").length,
    open: rows.filter((r) => r.status === "open").length,
    returnRate,
    medianMinutesToFinding: median(done.map(minutesOf)),
  };

  const newestTitle = new Map<string, { version: number; title: string }>();
  for (const r of done) {
    const key = `${r.flowId}|${r.findingStepId}`;
    const seen = newestTitle.get(key);
    if (!seen || r.version > seen.version) newestTitle.set(key, { version: r.version, title: r.findingTitle! });
  }
  const findingsByFlow = new Map<string, InsightResponse["findingsByFlow"][number]>();
  const findingsByEquipment = new Map<string, InsightResponse["findingsByEquipment"][number]>();
  for (const r of done) {
    const findingTitle = newestTitle.get(`${r.flowId}|${r.findingStepId}`)!.title;
    const f = findingsByFlow.get(`${r.flowId}|${r.findingStepId}`) ?? { flowId: r.flowId, flowTitle: r.flowTitle, findingStepId: r.findingStepId!, findingTitle, count: 0 };
    f.count += 1;
    findingsByFlow.set(`${r.flowId}|${r.findingStepId}`, f);
    const e = findingsByEquipment.get(`${r.equipmentKind}|${findingTitle}`) ?? { equipmentKind: r.equipmentKind, findingTitle, count: 0 };
    e.count += 1;
    findingsByEquipment.set(`${r.equipmentKind}|${findingTitle}`, e);
  }

  const flowIds = [...new Set(done.map((r) => r.flowId))];
  const timeToFinding = flowIds.map((flowId) => {
    const mine = done.filter((r) => r.flowId === flowId);
    return { flowId, flowTitle: mine[0]!.flowTitle, completed: mine.length, medianMinutes: median(mine.map(minutesOf))! };
  });

  const techIds = [...new Set(rows.map((r) => r.techId))];
  const techs = techIds.map((techId) => {
    const mine = rows.filter((r) => r.techId === techId);
    const completed = mine.filter((r) => r.status === "completed");
    return { techId, techName: mine[0]!.techName, ...figures(mine), flags: completed.reduce((sum, r) => sum + r.flagCount, 0) };
  });
  return { totals, findingsByFlow: [...findingsByFlow.values()], findingsByEquipment: [...findingsByEquipment.values()], timeToFinding, techs };
}

const byKey = <T>(key: (row: T) => string) => (rows: T[]) => [...rows].sort((a, b) => (key(a) < key(b) ? -1 : key(a) > key(b) ? 1 : 0));
const flowKey = byKey<InsightResponse["findingsByFlow"][number]>((r) => `${r.flowId}|${r.findingStepId}`);
const kindKey = byKey<InsightResponse["findingsByEquipment"][number]>((r) => `${r.equipmentKind}|${r.findingTitle}`);
const timeKey = byKey<InsightResponse["timeToFinding"][number]>((r) => r.flowId);
const nonIncreasing = (counts: number[]) => counts.every((c, i) => i === 0 || counts[i - 1]! >= c);

async function insight(from: string, to: string): Promise<InsightResponse> {
  const res = await lead.agent.get("/api/insight").query({ from, to });
  expect(res.status).toBe(200);
  return res.body as InsightResponse;
}

/** The whole answer against the brute force; medians within rounding, everything else exactly. */
function expectMatches(body: InsightResponse, from: string, to: string) {
  const expected = bruteForce(from, to);
  const { medianMinutesToFinding, ...totals } = body.totals;
  const { medianMinutesToFinding: expectedMedian, ...expectedTotals } = expected.totals;
  expect({ from: body.from, to: body.to }).toEqual({ from, to });
  expect(totals).toEqual(expectedTotals);
  if (expectedMedian === null) expect(medianMinutesToFinding).toBeNull();
  else expect(medianMinutesToFinding).toBeCloseTo(expectedMedian, 9);
  expect(flowKey(body.findingsByFlow)).toEqual(flowKey(expected.findingsByFlow));
  expect(kindKey(body.findingsByEquipment)).toEqual(kindKey(expected.findingsByEquipment));
  const times = timeKey(body.timeToFinding);
  const expectedTimes = timeKey(expected.timeToFinding);
  expect(times.map(({ medianMinutes: _m, ...r }) => r)).toEqual(expectedTimes.map(({ medianMinutes: _m, ...r }) => r));
  for (const [i, row] of times.entries()) expect(row.medianMinutes).toBeCloseTo(expectedTimes[i]!.medianMinutes, 9);
  expect(body.techs).toEqual([...expected.techs].sort((a, b) => (a.techName < b.techName ? -1 : 1)));
  expect(nonIncreasing(body.findingsByFlow.map((r) => r.count))).toBe(true);
  expect(nonIncreasing(body.findingsByEquipment.map((r) => r.count))).toBe(true);
}

describe("GET /api/insight", () => {
  it.each([
    ["2026-04-01", "2026-04-30"],
    ["2026-03-01", "2026-06-30"],
    ["2026-04-08", "2026-04-19"],
    ["2026-04-15", "2026-04-15"],
    ["2026-06-10", "2026-06-11"],
  ])("gives what a brute-force count of the seeded sessions gives for %s to %s", async (from, to) => {
    expectMatches(await insight(from, to), from, to);
  });

  it("checks the seed is varied enough for the comparisons to mean something", () => {
    const april = bruteForce("2026-04-01", "2026-04-30");
    expect(april.totals.open).toBeGreaterThan(0);
    expect(april.totals.abandoned).toBeGreaterThan(0);
    expect(april.totals.returned).toBeGreaterThan(0);
    expect(april.totals.reviewed).toBeGreaterThan(april.totals.returned);
    expect(april.totals.flaggedSessions).toBeGreaterThan(0);
    expect(april.techs).toHaveLength(3);
    expect(april.timeToFinding).toHaveLength(2);
    expect(new Set(april.findingsByEquipment.map((r) => r.equipmentKind)).size).toBe(4);
    // Both versions of the carb flow reached the renamed finding in April.
    expect(new Set(seeded.filter((r) => r.flowId === "carb-check" && r.findingStepId === "fuel" && r.startedAt.getUTCMonth() === 3).map((r) => r.version))).toEqual(new Set([1, 2]));
  });

  it("merges a finding across a flow's versions under the newest version's title", async () => {
    const body = await insight("2026-04-01", "2026-04-30");
    const carbFuel = body.findingsByFlow.filter((r) => r.flowId === "carb-check" && r.findingStepId === "fuel");
    expect(carbFuel).toHaveLength(1);
    expect(carbFuel[0]!.findingTitle).toBe("Stale or watered fuel");
    expect(carbFuel[0]!.count).toBe(seeded.filter((r) => r.flowId === "carb-check" && r.findingStepId === "fuel" && r.startedAt.toISOString().slice(0, 10) >= "2026-04-01" && r.startedAt.toISOString().slice(0, 10) <= "2026-04-30").length);
    // The other flow still calls its fuel finding by its own title.
    expect(body.findingsByFlow.find((r) => r.flowId === "spark-first" && r.findingStepId === "fuel")?.findingTitle).toBe("Stale fuel");
  });

  it("counts whole UTC days by the start, both ends included", async () => {
    const body = await insight("2026-04-30", "2026-04-30");
    // 23:59 on the last day is in; 00:00 the next day is not.
    expect(body.techs.find((r) => r.techName === "Sorrel Tamm")).toBeDefined();
    expect(body.totals.sessions).toBe(seeded.filter((r) => r.startedAt >= new Date("2026-04-30T00:00:00Z") && r.startedAt < new Date("2026-05-01T00:00:00Z")).length);
    const may = await insight("2026-05-01", "2026-05-01");
    expect(may.totals).toMatchObject({ sessions: 1, completed: 1, reviewed: 1, returned: 1, returnRate: 1, flaggedSessions: 1, medianMinutesToFinding: 19 });
    const first = await insight("2026-04-01", "2026-04-01");
    expect(first.totals.sessions).toBe(seeded.filter((r) => r.startedAt.toISOString().startsWith("2026-04-01")).length);
    const march = await insight("2026-03-31", "2026-03-31");
    expect(march.totals).toMatchObject({ sessions: 1, medianMinutesToFinding: 11, returnRate: 1 });
  });

  it("takes the median of an even count as the mean of the two middle values, and of an odd count as the middle one", async () => {
    // From memory: median of 10, 20, 40, 70 is (20 + 40) / 2 = 30; of 12, 18, 61.5 it is 18; of all seven, the fourth (20).
    const even = await insight("2026-06-10", "2026-06-10");
    expect(even.totals).toMatchObject({ sessions: 5, completed: 4, abandoned: 1 });
    expect(even.totals.medianMinutesToFinding).toBeCloseTo(30, 9);
    const odd = await insight("2026-06-11", "2026-06-11");
    expect(odd.totals.medianMinutesToFinding).toBeCloseTo(18, 9);
    expect(odd.timeToFinding).toEqual([{ flowId: "spark-first", flowTitle: "Spark first", completed: 3, medianMinutes: 18 }]);
    const both = await insight("2026-06-10", "2026-06-11");
    expect(both.totals.medianMinutesToFinding).toBeCloseTo(20, 9);
  });

  it("answers an empty range with zeros, nulls and empty lists", async () => {
    const body = await insight("2025-01-01", "2025-12-31");
    expect(body).toEqual({
      from: "2025-01-01",
      to: "2025-12-31",
      totals: { sessions: 0, completed: 0, abandoned: 0, open: 0, reviewed: 0, returned: 0, returnRate: null, medianMinutesToFinding: null, flaggedSessions: 0 },
      findingsByFlow: [],
      findingsByEquipment: [],
      timeToFinding: [],
      techs: [],
    });
  });

  it("refuses techs", async () => {
    const res = await apprentice.agent.get("/api/insight").query({ from: "2026-04-01", to: "2026-04-30" });
    expect(res.status).toBe(403);
    const senior = await others[0]!.agent.get("/api/insight").query({ from: "2026-04-01", to: "2026-04-30" });
    expect(senior.status).toBe(403);
  });

  it.each([
    [{ from: "2026-04-01" }, "to", /to is a date written YYYY-MM-DD/],
    [{ from: "April 1", to: "2026-04-30" }, "from", /from is a date written YYYY-MM-DD/],
    [{ from: "2026-02-30", to: "2026-04-30" }, "from", /YYYY-MM-DD/],
    [{ from: "2026-04-30", to: "2026-04-01" }, "to", /on or after from/],
    [{ from: "2020-01-01", to: "2026-04-30" }, "from", /at most 1098 days/],
  ])("refuses %o with a message beside the parameter", async (q, field, message) => {
    const res = await lead.agent.get("/api/insight").query(q);
    expect(res.status).toBe(400);
    expect(res.body.error.id).toBe("invalid_input");
    expect(res.body.error.details.fieldErrors[field][0]).toMatch(message);
  });

  it("gives a malformed day its own message and no other", async () => {
    const res = await lead.agent.get("/api/insight").query({ from: "2026-04-01", to: "30/04/2026" });
    expect(res.status).toBe(400);
    expect(res.body.error.details.fieldErrors).toEqual({ to: ["to is a date written YYYY-MM-DD."] });
  });

  it("refuses a parameter it does not know, and a repeated one", async () => {
    const res = await lead.agent.get("/api/insight").query({ from: "2026-04-01", to: "2026-04-30", tech: "x" });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error.details)).toContain("Unknown parameter: tech.");
    const twice = await lead.agent.get("/api/insight?from=2026-04-01&from=2026-04-02&to=2026-04-30");
    expect(twice.status).toBe(400);
    expect(twice.body.error.details.fieldErrors.from[0]).toMatch(/YYYY-MM-DD/);
  });
});
