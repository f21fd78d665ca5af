import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildSession } from "../../factories/sessions.ts";
import { buildCustomer, buildWorkOrder } from "../../factories/work-orders.ts";
import { users } from "../../../server/db/schema.ts";
import { compiledVersion, installBuiltInFlows, publishedFlows } from "../../../server/services/flows.ts";
import { reviewQueueQuerySchema, type ReviewQueueRow } from "../../../shared/schemas/review.ts";
import { reviewQueue } from "../../../server/services/review-queue.ts";
import type { EquipmentKind } from "../../../shared/equipment.ts";

let t: TestApp;
let lead: Awaited<ReturnType<typeof signedInAs>>;
let techs: Awaited<ReturnType<typeof signedInAs>>[];
/** Every seeded session as the queue should show it: the brute-force side of each comparison. */
const seeded: ReviewQueueRow[] = [];

// Names and titles that differ at their first letter sort the same under any collation the database uses.
const techNames = ["Alder Quinn", "Birch Okafor", "Cedar Lund"];
const flowIds = ["handheld-2-stroke-no-start", "walk-behind-mower-no-start", "generator-no-start"];
const customerNames = ["Marlow Ashby", "Priya Venn", "Odile Marsh", "Tomas Reyes", "Wren Harrow"];
const makes: [string, string][] = [["Fernhill", "FT-25"], ["Ostrander", "OX 40"], ["Kettle Bay", "KB-7"]];
const kinds: EquipmentKind[] = ["string_trimmer", "chainsaw", "walk_behind_mower", "generator"];

beforeAll(async () => {
  t = await createTestApp();
  await installBuiltInFlows(t.ctx.db);
  lead = await signedInAs(t, "shop_lead");
  techs = [await signedInAs(t, "apprentice"), await signedInAs(t, "apprentice"), await signedInAs(t, "senior_tech")];
  for (const [i, tech] of techs.entries()) await t.ctx.db.update(users).set({ name: techNames[i]! }).where(eq(users.id, tech.user.id));
  const customers = [];
  for (const name of customerNames) customers.push(await buildCustomer(t.ctx.db, { name }));
  const flows = [];
  for (const id of flowIds) {
    const [flow] = await publishedFlows(t.ctx.db, id);
    const compiled = await compiledVersion(t.ctx.db, flow!.versionId);
    flows.push({ ...flow!, id, findings: Object.values(compiled.steps).filter((s) => s.kind === "finding").slice(0, 2) });
  }
  for (let i = 0; i < 60; i++) {
    const tech = techs[i % 3]!;
    const flow = flows[Math.floor(i / 3) % 3]!;
    const customer = customers[Math.floor(i / 2) % 5]!;
    const [make, model] = makes[(i * 7) % 3]!;
    const equipmentKind = kinds[i % 4]!;
    const status = i % 5 === 0 ? "open" : i % 5 === 1 ? "abandoned" : "completed";
    const reviewState = status === "completed" ? (["waiting", "approved", "returned"] as const)[i % 3]! : "not_submitted";
    // Twenty distinct start times between 2026-03-02 and 2026-03-21, so several sessions share one.
    const startedAt = new Date(Date.UTC(2026, 2, 2 + ((i * 13) % 20), 9));
    const completedAt = status === "completed" ? new Date(startedAt.getTime() + ((i % 4) + 1) * 3_600_000) : null;
    const finding = status === "completed" ? flow.findings[i % 2]! : null;
    const storedFlags = status === "completed" ? (i * 5) % 4 : 0;
    const wo = await buildWorkOrder(t.ctx.db, { customerId: customer.id, createdBy: lead.user.id, state: "diagnosing", unit: { equipmentKind, make, model } });
    const session = await buildSession(t.ctx.db, {
      flowVersionId: flow.versionId, techId: tech.user.id, workOrderId: wo.id, status, reviewState, startedAt, completedAt, findingStepId: finding?.id ?? null, flagCount: storedFlags,
      ...(status === "abandoned" ? { abandonReason: "Customer collected it" } : {}),
    });
    seeded.push({
      sessionId: session.id, workOrderNumber: wo.number, customer: customer.name, unit: { equipmentKind, make, model }, techId: tech.user.id, techName: techNames[i % 3]!,
      flow: { flowId: flow.id, title: flow.title, version: 1 }, findingStepId: finding?.id ?? null, findingStepTitle: finding?.title ?? null,
      status, reviewState, startedAt: startedAt.toISOString(), completedAt: completedAt?.toISOString() ?? null,
      // Every open session here began months ago, past the 24-hour limit: it carries its open_too_long flag.
      flagCount: status === "open" ? storedFlags + 1 : storedFlags,
    });
  }
}, 120_000);
afterAll(() => t.close());

type Query = Record<string, string>;
const sortKey: Record<string, (r: ReviewQueueRow) => string | null> = { startedAt: (r) => r.startedAt, completedAt: (r) => r.completedAt, tech: (r) => r.techName, flow: (r) => r.flow.title };

/** The queue worked out in memory from the seeded rows: filter, sort (ties by id, no completion time last), page. */
function bruteForce(q: Query, ownerId?: string) {
  const search = q.search?.toLowerCase();
  const day = (iso: string) => iso.slice(0, 10);
  const rows = seeded.filter(
    (r) =>
      (!ownerId || r.techId === ownerId) &&
      (!q.techId || r.techId === q.techId) &&
      (!q.flowId || r.flow.flowId === q.flowId) &&
      (!q.findingStepId || r.findingStepId === q.findingStepId) &&
      (!q.equipmentKind || r.unit.equipmentKind === q.equipmentKind) &&
      (!q.from || day(r.startedAt) >= q.from) &&
      (!q.to || day(r.startedAt) <= q.to) &&
      (!q.flagged || (q.flagged === "true") === r.flagCount > 0) &&
      (!q.reviewState || r.reviewState === q.reviewState) &&
      (!search || [r.customer, r.unit.make, r.unit.model, `${r.unit.make} ${r.unit.model}`].some((text) => text.toLowerCase().includes(search))),
  );
  const key = sortKey[q.sort ?? "startedAt"]!;
  const sign = q.order === "asc" ? 1 : -1;
  rows.sort((a, b) => {
    const [x, y] = [key(a), key(b)];
    if (x !== y) {
      if (x === null) return 1;
      if (y === null) return -1;
      return x < y ? -sign : sign;
    }
    return a.sessionId < b.sessionId ? -1 : 1;
  });
  const page = Number(q.page ?? 1);
  const pageSize = Number(q.pageSize ?? 25);
  return { rows: rows.slice((page - 1) * pageSize, page * pageSize), total: rows.length, page, pageSize };
}

const combinations: Query[] = [
  { pageSize: "100" },
  {},
  { reviewState: "waiting", sort: "tech", order: "asc", pageSize: "5", page: "2" },
  { flagged: "true", flowId: flowIds[1]!, sort: "completedAt", order: "desc", pageSize: "7" },
  { flagged: "false", sort: "completedAt", order: "asc", pageSize: "9", page: "3" },
  { from: "2026-03-05", to: "2026-03-14", equipmentKind: "chainsaw", sort: "flow", order: "asc", pageSize: "4", page: "2" },
  { search: "OSTR", sort: "startedAt", order: "asc", pageSize: "6", page: "2" },
  { search: "priya", reviewState: "approved", sort: "flow", order: "desc" },
  { search: "kettle bay kb", pageSize: "50" },
  { from: "2026-03-10", to: "2026-03-10", sort: "tech", order: "desc" },
  { reviewState: "not_submitted", sort: "completedAt", order: "desc", pageSize: "10", page: "2" },
];

describe("GET /api/review/sessions", () => {
  it.each(combinations)("gives the shop lead what a brute-force filter gives for %o", async (q) => {
    const res = await lead.agent.get("/api/review/sessions").query(q);
    expect(res.status).toBe(200);
    expect(res.body).toEqual(bruteForce(q));
  });

  it("checks the seed is varied enough for the comparisons to mean something", () => {
    for (const q of combinations.slice(2)) expect(bruteForce(q).total, JSON.stringify(q)).toBeGreaterThan(0);
    expect(bruteForce({ findingStepId: seeded.find((r) => r.findingStepId)!.findingStepId! }).total).toBeGreaterThan(1);
  });

  it("counts an open session's open_too_long flag only once it is past the 24-hour limit", async () => {
    const open = seeded.filter((r) => r.status === "open");
    const latest = open.reduce((a, b) => (a.startedAt > b.startedAt ? a : b));
    const q = reviewQueueQuerySchema.parse({ flagged: "true", pageSize: "100" });
    // An hour after the latest open session began, it is not flagged yet; every other open one is older by a day or more.
    const early = await reviewQueue(t.ctx, lead.user, q, new Date(Date.parse(latest.startedAt) + 3_600_000));
    expect(early.rows.map((r) => r.sessionId)).not.toContain(latest.sessionId);
    const late = await reviewQueue(t.ctx, lead.user, q, new Date(Date.parse(latest.startedAt) + 25 * 3_600_000));
    expect(late.rows.find((r) => r.sessionId === latest.sessionId)?.flagCount).toBe(1);
  });

  it("filters by the finding step and by tech", async () => {
    const q = { findingStepId: seeded.find((r) => r.findingStepId)!.findingStepId!, techId: techs[1]!.user.id, sort: "startedAt", order: "asc" };
    const res = await lead.agent.get("/api/review/sessions").query(q);
    expect(res.body).toEqual(bruteForce(q));
  });

  it("shows a tech only their own sessions, whatever they filter on", async () => {
    for (const [i, tech] of techs.entries()) {
      const q = { sort: "tech", order: "asc", pageSize: "100" };
      const res = await tech.agent.get("/api/review/sessions").query(q);
      expect(res.status).toBe(200);
      expect(res.body).toEqual(bruteForce(q, tech.user.id));
      expect(res.body.total).toBe(20);
      const other = await tech.agent.get("/api/review/sessions").query({ techId: techs[(i + 1) % 3]!.user.id });
      expect(other.body).toEqual({ rows: [], total: 0, page: 1, pageSize: 25 });
    }
  });

  it("answers an empty page past the end with the true total", async () => {
    const res = await lead.agent.get("/api/review/sessions").query({ reviewState: "returned", page: "9", pageSize: "10" });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ rows: [], total: bruteForce({ reviewState: "returned" }).total, page: 9, pageSize: 10 });
    expect(res.body.total).toBeGreaterThan(0);
  });

  it.each([
    [{ reviewState: "pending" }, "reviewState", /one of "not_submitted", "waiting", "approved", "returned"/],
    [{ sort: "price" }, "sort", /one of "startedAt", "completedAt", "tech", "flow"/],
    [{ equipmentKind: "boat" }, "equipmentKind", /equipmentKind is one of/],
    [{ flagged: "yes" }, "flagged", /"true", "false"/],
    [{ pageSize: "101" }, "pageSize", /at most 100/],
    [{ page: "0" }, "page", /from 1/],
    [{ page: "two" }, "page", /whole number/],
    [{ from: "2026-03-20", to: "2026-03-01" }, "to", /on or after from/],
    [{ from: "March 1" }, "from", /YYYY-MM-DD/],
  ])("refuses %o with a message beside the parameter", async (q, field, message) => {
    const res = await lead.agent.get("/api/review/sessions").query(q);
    expect(res.status).toBe(400);
    expect(res.body.error.id).toBe("invalid_input");
    expect(res.body.error.details.fieldErrors[field][0]).toMatch(message);
  });

  it("refuses a filter it does not know", async () => {
    const res = await lead.agent.get("/api/review/sessions").query({ colour: "red" });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error.details)).toContain("Unknown filter: colour.");
  });
});
