import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { asc, eq } from "drizzle-orm";
import { createTestApp, type TestApp } from "./helpers/test-app.ts";
import { demoUsers, seedDemo } from "../../server/db/seed/demo.ts";
import { planHistory, seedHistory } from "../../server/db/seed/history.ts";
import { attachments, customers, diagnosticSessions, flowVersions, sessionEvents, units, users, workOrders, type DiagnosticSessionRow, type SessionEventRow } from "../../server/db/schema.ts";
import { appliesToUnit, compiledVersion, installBuiltInFlows } from "../../server/services/flows.ts";
import { storageFor } from "../../server/storage/storage.ts";
import { replaySession } from "../../shared/flow/session-log.ts";
import { sessionFlags } from "../../shared/review/flags.ts";
import type { BenchHomeResponse } from "../../shared/schemas/sessions.ts";
import type { ReviewQueueResponse } from "../../shared/schemas/review.ts";

const DAY = 86_400_000;
const NOW = new Date("2026-05-20T15:30:00.000Z");
const robin = demoUsers.find((u) => u.role === "apprentice")!;
const lead = demoUsers.find((u) => u.role === "shop_lead")!;

let t: TestApp;
let uploads: string;
let sessions: DiagnosticSessionRow[];
const eventsOf = new Map<string, SessionEventRow[]>();
const findingTitles = new Map<string, string>();

beforeAll(async () => {
  uploads = mkdtempSync(path.join(os.tmpdir(), "benchpath-history-"));
  t = await createTestApp({ UPLOADS_DIR: uploads });
  await seedDemo(t.ctx.db);
  await installBuiltInFlows(t.ctx.db);
  await seedHistory(t.ctx.db, storageFor(t.ctx.env), { now: NOW });
  sessions = await t.ctx.db.select().from(diagnosticSessions).orderBy(asc(diagnosticSessions.id));
  for (const e of await t.ctx.db.select().from(sessionEvents).orderBy(asc(sessionEvents.sessionId), asc(sessionEvents.seq))) {
    const list = eventsOf.get(e.sessionId) ?? [];
    list.push(e);
    eventsOf.set(e.sessionId, list);
  }
  for (const s of sessions.filter((x) => x.findingStepId)) findingTitles.set(`${s.flowVersionId} ${s.findingStepId}`, (await compiledVersion(t.ctx.db, s.flowVersionId)).steps[s.findingStepId!]!.title);
}, 120_000);
afterAll(async () => {
  await t.close();
  rmSync(uploads, { recursive: true, force: true });
});

async function signIn(email: string, password: string) {
  const agent = t.agent();
  const res = await agent.post("/api/auth/sign-in").send({ email, password });
  expect(res.status).toBe(200);
  return agent;
}

async function idOf(email: string) {
  const [row] = await t.ctx.db.select({ id: users.id }).from(users).where(eq(users.email, email));
  return row!.id;
}

const completed = () => sessions.filter((s) => s.status === "completed");

describe("the demo shop's history", () => {
  it("makes the same rows again from the same seed, and others from another seed", async () => {
    const byId = <T extends { id: string }>(rows: T[]) => rows.sort((a, b) => a.id.localeCompare(b.id));
    const rowsOf = async (seed?: number) => {
      const plan = await planHistory(t.ctx.db, { now: NOW, ...(seed === undefined ? {} : { seed }) });
      const out = { sessions: [] as object[], events: [] as object[], workOrders: [] as object[] };
      for (const rows of plan.batches()) {
        out.sessions.push(...rows.sessions.map((s) => ({ id: s.id, status: s.status, techId: s.techId, findingStepId: s.findingStepId ?? null, startedAt: s.startedAt, flagCount: s.flagCount ?? 0 })));
        out.events.push(...rows.events.map((e) => ({ id: e.id, sessionId: e.sessionId, seq: e.seq, payload: e.payload, recordedAt: e.recordedAt })));
        out.workOrders.push(...rows.workOrders.map((w) => ({ id: w.id!, state: w.state, complaint: w.complaint })));
      }
      return { sessions: byId(out.sessions as { id: string }[]), events: byId(out.events as { id: string }[]), workOrders: byId(out.workOrders as { id: string }[]) };
    };
    const again = await rowsOf();
    expect(again.sessions).toEqual(sessions.map((s) => ({ id: s.id, status: s.status, techId: s.techId, findingStepId: s.findingStepId, startedAt: s.startedAt, flagCount: s.flagCount })));
    expect(again.events).toEqual(byId(sessions.flatMap((s) => eventsOf.get(s.id) ?? []).map((e) => ({ id: e.id, sessionId: e.sessionId, seq: e.seq, payload: e.payload, recordedAt: e.recordedAt }))));
    expect(again.workOrders).toEqual(byId((await t.ctx.db.select().from(workOrders)).map((w) => ({ id: w.id, state: w.state, complaint: w.complaint }))));
    const other = await rowsOf(99);
    const ids = new Set(again.sessions.map((x) => x.id));
    expect(other.sessions.filter((x) => ids.has(x.id))).toEqual([]);
    expect(other.sessions.length).toBeGreaterThan(300);
  });

  it("has some 300 to 500 sessions on all four built-in flows, each on equipment the flow is written for", async () => {
    expect(sessions.length).toBeGreaterThanOrEqual(300);
    expect(sessions.length).toBeLessThanOrEqual(500);
    const rows = await t.ctx.db
      .select({ flowId: flowVersions.flowId, definition: flowVersions.definition, equipmentKind: units.equipmentKind, cycle: units.cycle })
      .from(diagnosticSessions)
      .innerJoin(flowVersions, eq(flowVersions.id, diagnosticSessions.flowVersionId))
      .innerJoin(workOrders, eq(workOrders.id, diagnosticSessions.workOrderId))
      .innerJoin(units, eq(units.id, workOrders.unitId));
    const perFlow = new Map<string, number>();
    for (const r of rows) {
      expect(appliesToUnit(r.definition.appliesTo, r), `${r.flowId} on a ${r.cycle}-stroke ${r.equipmentKind}`).toBe(true);
      perFlow.set(r.flowId, (perFlow.get(r.flowId) ?? 0) + 1);
    }
    expect([...perFlow.keys()].sort()).toEqual(["generator-no-start", "handheld-2-stroke-no-start", "handheld-4-stroke-no-start", "walk-behind-mower-no-start"]);
    for (const n of perFlow.values()) expect(n).toBeGreaterThanOrEqual(15);
  });

  it("replays every session's log without a refusal to where the session row says it stands, with the flags completion stores", async () => {
    for (const s of sessions) {
      const flow = await compiledVersion(t.ctx.db, s.flowVersionId);
      const events = eventsOf.get(s.id) ?? [];
      const result = replaySession(flow, s.input, events.map((e) => e.payload));
      expect(result.ok ? null : result, `session ${s.id}`).toBeNull();
      if (!result.ok) continue;
      expect(result.stepId).toBe(s.currentStepId);
      expect(result.status).toBe(s.status === "completed" ? "finding" : "in_progress");
      expect(result.findingStepId).toBe(s.findingStepId);
      events.forEach((e, i) => expect(e.seq).toBe(i + 1));
      if (s.status !== "completed") {
        expect(s.flags).toBeNull();
        continue;
      }
      const stored = events.map((e) => ({ recordedAt: e.recordedAt.toISOString(), event: e.payload }));
      const flags = sessionFlags({ flow, input: s.input, events: stored, status: "completed", startedAt: s.startedAt, completedAt: s.completedAt, now: s.completedAt! });
      expect(s.flags).toEqual(flags);
      expect(s.flagCount).toBe(flags.length);
    }
  });

  it("attaches only photos stored for the same session and step, and their files are there", async () => {
    const photos = new Map((await t.ctx.db.select().from(attachments)).map((a) => [a.id, a]));
    let attached = 0;
    for (const s of sessions) {
      for (const e of eventsOf.get(s.id) ?? []) {
        if (e.payload.type !== "photo.attach") continue;
        const photo = photos.get(e.payload.attachmentId);
        expect(photo?.ownerId).toBe(s.id);
        expect(photo?.stepId).toBe(e.payload.stepId);
        expect(photo?.createdBy).toBe(s.techId);
        attached++;
      }
    }
    expect(attached).toBe(photos.size);
    const robinId = await idOf(robin.email);
    const robinsPhoto = [...photos.values()].find((p) => p.createdBy === robinId)!;
    const agent = await signIn(robin.email, robin.password);
    for (const which of ["", "/thumb"]) {
      const image = await agent.get(`/api/attachments/${robinsPhoto.id}${which}`);
      expect(image.status).toBe(200);
      expect(image.headers["content-type"]).toMatch(/^image\/webp/);
    }
  });

  it("ends most sessions on a fuel finding, then spark, then air and exhaust, then compression", () => {
    // Our own reading of the finding titles, apart from the generator's table.
    const areas: [string, RegExp][] = [
      ["fuel", /stale fuel|carburettor|fuel filter|fuel lines|primer bulb|tank vent|choke/i],
      ["spark", /spark plug|ignition|stop switch/i],
      ["air", /air filter|spark arrestor|exhaust port/i],
      ["compression", /compression|valve clearances|air leak/i],
    ];
    const count: Record<string, number> = { fuel: 0, spark: 0, air: 0, compression: 0, other: 0 };
    for (const s of completed()) {
      const title = findingTitles.get(`${s.flowVersionId} ${s.findingStepId}`)!;
      count[areas.find(([, re]) => re.test(title))?.[0] ?? "other"]! += 1;
    }
    // Common practice (no published source): fuel and carburettor problems are behind most no-starts, often quoted as about 80 %; then ignition, then air and exhaust, then compression.
    expect(count.fuel!).toBeGreaterThan(0.4 * completed().length);
    expect(count.fuel!).toBeGreaterThan(count.spark!);
    expect(count.spark!).toBeGreaterThan(count.air!);
    expect(count.air!).toBeGreaterThan(count.compression!);
    expect(count.fuel!).toBeGreaterThan(count.other!);
  });

  it("mixes the states of a working shop: mostly approved, some waiting, a few returned, abandoned or open", () => {
    const by = (status: string, review?: string) => sessions.filter((s) => s.status === status && (review === undefined || s.reviewState === review)).length;
    expect(by("completed", "approved")).toBeGreaterThan(0.75 * sessions.length);
    expect(by("completed", "waiting")).toBeGreaterThanOrEqual(10);
    expect(by("completed", "returned")).toBeGreaterThanOrEqual(3);
    expect(by("abandoned")).toBeGreaterThanOrEqual(3);
    expect(by("open")).toBeGreaterThanOrEqual(1);
    expect(by("open")).toBeLessThanOrEqual(2);
    for (const s of sessions.filter((x) => x.reviewState === "approved" || x.reviewState === "returned")) {
      expect(s.reviewerId).not.toBeNull();
      expect(s.reviewedAt!.getTime()).toBeGreaterThan(s.completedAt!.getTime());
    }
    for (const s of sessions.filter((x) => x.reviewState === "returned")) expect(s.reviewComment).toBeTruthy();
    for (const s of sessions.filter((x) => x.status === "abandoned")) expect(s.abandonReason).toBeTruthy();
  });

  it("spreads the work over about four months before now, in time order on each log", () => {
    const starts = sessions.map((s) => s.startedAt.getTime());
    expect(Math.min(...starts)).toBeGreaterThan(NOW.getTime() - 130 * DAY);
    expect(Math.min(...starts)).toBeLessThan(NOW.getTime() - 110 * DAY);
    for (const s of sessions) {
      let previous = s.startedAt.getTime();
      for (const e of eventsOf.get(s.id) ?? []) {
        expect(e.recordedAt.getTime()).toBeGreaterThanOrEqual(previous);
        expect(e.receivedAt.getTime()).toBeGreaterThanOrEqual(e.recordedAt.getTime());
        previous = e.recordedAt.getTime();
      }
      expect(previous).toBeLessThan(NOW.getTime());
      if (s.completedAt) expect(s.completedAt.getTime()).toBeGreaterThan(previous);
      if (s.reviewedAt) expect(s.reviewedAt.getTime()).toBeLessThan(NOW.getTime());
    }
  });

  it("keeps to the steps' minimum times and plausible readings, with the odd exception the review flags", () => {
    const codes = completed().flatMap((s) => (s.flags ?? []).map((f) => f.code));
    const share = (code: string) => codes.filter((c) => c === code).length / completed().length;
    expect(share("step_too_fast")).toBeGreaterThan(0);
    expect(share("step_too_fast")).toBeLessThan(0.15);
    expect(share("reading_implausible")).toBeGreaterThan(0);
    expect(share("reading_implausible")).toBeLessThan(0.05);
    expect(share("open_too_long")).toBeLessThan(0.05);
  });

  it("gives every tech flagged sessions waiting for review, and leaves the demo apprentice's bench home tidy", async () => {
    const techs = new Set(sessions.map((s) => s.techId));
    expect(techs.size).toBeGreaterThanOrEqual(5);
    for (const tech of techs) {
      const own = sessions.filter((s) => s.techId === tech);
      expect(own.length).toBeGreaterThanOrEqual(30);
      expect(own.filter((s) => s.reviewState === "waiting" && s.flagCount > 0).length).toBeGreaterThanOrEqual(1);
    }
    const robinId = await idOf(robin.email);
    const leadAgent = await signIn(lead.email, lead.password);
    const queue = await leadAgent.get("/api/review/sessions").query({ flagged: "true", reviewState: "waiting", techId: robinId });
    expect(queue.status).toBe(200);
    expect((queue.body as ReviewQueueResponse).total).toBeGreaterThanOrEqual(2);
    const home = await (await signIn(robin.email, robin.password)).get("/api/bench/home");
    expect(home.status).toBe(200);
    const body = home.body as BenchHomeResponse;
    expect(body.open).toEqual([]);
    expect(body.returned.length).toBeLessThanOrEqual(2);
    expect(body.waitingForReview.length).toBeLessThanOrEqual(8);
  });

  it("moves each work order on as far as its check and the time since allow", async () => {
    const orders = await t.ctx.db.select().from(workOrders);
    const byOrder = new Map(orders.map((w) => [w.id, w]));
    for (const s of sessions) {
      const state = byOrder.get(s.workOrderId)!.state;
      if (s.status === "open") expect(state).toBe("diagnosing");
      if (s.status === "completed") expect(["waiting_for_diagnosis", "diagnosing"]).not.toContain(state);
    }
    const onTheShelf = orders.filter((w) => w.state === "waiting_for_diagnosis" || w.state === "diagnosing");
    expect(onTheShelf.length).toBeGreaterThanOrEqual(2);
    expect(onTheShelf.length).toBeLessThanOrEqual(8);
    expect(orders.filter((w) => w.state === "picked_up").length).toBeGreaterThan(0.6 * orders.length);
  });

  it("invents its customers and units: no real brand, reserved phone numbers and e-mail domains", async () => {
    // From memory: makers of outdoor power equipment, small engines and their parts sold in North America, Europe and Australia.
    const brands = [
      "stihl", "husqvarna", "echo", "honda", "briggs", "stratton", "kohler", "toro", "craftsman", "ryobi", "poulan", "homelite", "mcculloch", "tanaka",
      "shindaiwa", "redmax", "makita", "dolmar", "oregon", "troy-bilt", "cub cadet", "mtd", "snapper", "ariens", "simplicity", "murray", "worx",
      "greenworks", "ego", "dewalt", "black+decker", "champion", "generac", "westinghouse", "predator", "yamaha", "kawasaki", "subaru", "robin",
      "tecumseh", "loncin", "lifan", "kipor", "hyundai", "powermate", "duromax", "firman", "pulsar", "john deere", "kubota", "lawn-boy", "flymo",
      "bosch", "mountfield", "hayter", "stiga", "al-ko", "einhell", "efco", "oleo-mac", "jonsered", "zenoah", "maruyama", "walbro", "zama", "ngk",
      "victa", "masport", "rover", "greenfield", "viking", "atco", "qualcast", "gravely", "exmark", "scag", "hustler", "swisher", "bolens", "weed eater",
      "sun joe", "hart", "kobalt", "cobra", "webb", "ozito", "remington", "gardena", "wacker", "mitsubishi", "yard machines", "yard-man",
    ];
    const unitRows = await t.ctx.db.select().from(units);
    const customerRows = await t.ctx.db.select().from(customers);
    const texts = [...unitRows.flatMap((u) => [u.make, u.model, u.engineModel]), ...customerRows.map((c) => c.name)];
    for (const text of new Set(texts)) {
      for (const brand of brands) expect(new RegExp(`(^|[^a-z])${brand.replace(/[+]/g, "\\+")}($|[^a-z])`, "i").test(text), `${text} names ${brand}`).toBe(false);
    }
    for (const c of customerRows) {
      // Source: the North American Numbering Plan Administrator sets 555-0100 to 555-0199 aside for fictional use.
      expect(c.phone).toMatch(/^555-01\d\d$/);
      // Source: RFC 2606 reserves example.com, example.net and example.org.
      expect(c.email).toMatch(/^$|@example\.(com|net|org)$/);
    }
  });
});
