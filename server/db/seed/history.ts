// seedHistory: a few months of invented past work for the demo shop, on the built-in flows, made
// deterministically from a seed. The demo's own people must be there first (seedDemo), and the
// built-in flows installed (installBuiltInFlows).
import { asc } from "drizzle-orm";
import type { Database } from "../client.ts";
import { attachments, auditLog, customers, diagnosticSessions, sessionEvents, units, users, workOrders, workOrderStateHistory } from "../schema.ts";
import { hashPassword } from "../../auth/password.ts";
import { compiledVersion, publishedFlows } from "../../services/flows.ts";
import { getSettings } from "../../services/settings.ts";
import type { Storage } from "../../storage/storage.ts";
import { historyTechs, kinds, type TechSpec } from "./history-cast.ts";
import { FlowGuide } from "./history-guide.ts";
import { generatedPhotos, writePhotos } from "./history-photos.ts";
import { historyRows, type HistoryRows } from "./history-rows.ts";
import { schedule, type ScheduleOptions } from "./history-schedule.ts";
import { flowOfKind } from "./history-units.ts";
import { insertInBatches } from "./bulk.ts";
import { createRandom } from "./random.ts";

const DAY = 86_400_000;

export interface HistoryOptions extends Omit<ScheduleOptions, "now" | "kindsAvailable" | "techs"> {
  now: Date;
  /** Techs to add beside the demo's apprentice and senior tech. */
  extraTechs: readonly TechSpec[];
  /** Jobs (work orders) per batch; each batch is one transaction. */
  jobsPerBatch: number;
  onBatch?: (done: HistoryCounts) => void;
}

export interface HistoryCounts {
  users: number;
  customers: number;
  workOrders: number;
  sessions: number;
  events: number;
  attachments: number;
}

/** About four months of the demo shop's work: some 400 sessions, in one transaction. */
export const demoHistory: Omit<HistoryOptions, "now"> = {
  seed: 4127,
  days: 122,
  sessions: 420,
  extraTechs: historyTechs,
  openSessions: 2,
  waitingForDiagnosis: 3,
  returnRate: 0,
  returnedPerTech: 1,
  minWaitingPerTech: 3,
  minFlaggedWaitingPerTech: 2,
  newCustomerShare: 0.7,
  jobsPerBatch: Number.POSITIVE_INFINITY,
};

async function worldOf(db: Database, options: HistoryOptions) {
  const now = options.now.getTime();
  const rng = createRandom(options.seed);
  const extra = new Set(options.extraTechs.map((t) => t.email));
  const present = (await db.select().from(users).orderBy(asc(users.email))).filter((u) => !extra.has(u.email));
  const lead = present.find((u) => u.role === "shop_lead");
  const demoTechs = present.filter((u) => u.role !== "shop_lead" && u.active);
  if (!lead || demoTechs.length === 0) throw new Error("seedHistory needs the demo shop's people: run seedDemo first");
  const added = options.extraTechs.map((t) => ({ id: rng.uuid(now - options.days * DAY - 30 * DAY), email: t.email, name: t.name, role: t.role, unitSystem: t.unitSystem, password: t.password, share: t.share }));
  // The demo's own apprentice signs in first in every walkthrough: their bench home stays tidy.
  const techs = [...demoTechs.map((t) => ({ id: t.id, unitSystem: t.unitSystem, share: 1, tidy: t.role === "apprentice" })), ...added.map((t) => ({ id: t.id, unitSystem: t.unitSystem, share: t.share, tidy: false }))];
  const guides = new Map<string, FlowGuide>();
  for (const flow of await publishedFlows(db)) guides.set(flow.flowId, new FlowGuide(flow.flowId, flow.versionId, await compiledVersion(db, flow.versionId)));
  const settings = await getSettings({ db });
  const kindsAvailable = new Set(kinds.map((_, i) => i).filter((i) => guides.has(flowOfKind(i))));
  if (kindsAvailable.size === 0) throw new Error("seedHistory needs the built-in flows: run installBuiltInFlows first");
  return { now, lead, techs, added, guides, kindsAvailable, altitudeM: settings?.altitudeM ?? 0 };
}

async function insertRows(tx: Pick<Database, "execute">, rows: HistoryRows) {
  await insertInBatches(tx, customers, rows.customers);
  await insertInBatches(tx, units, rows.units);
  await insertInBatches(tx, workOrders, rows.workOrders);
  await insertInBatches(tx, workOrderStateHistory, rows.history);
  await insertInBatches(tx, diagnosticSessions, rows.sessions);
  await insertInBatches(tx, sessionEvents, rows.events);
  await insertInBatches(tx, attachments, rows.attachments);
  await insertInBatches(tx, auditLog, rows.audit);
}

/** The history as it will be written: the techs to add and the rows, batch by batch; the same options give the same rows. */
export async function planHistory(db: Database, overrides: Partial<HistoryOptions> = {}) {
  const options: HistoryOptions = { ...demoHistory, now: new Date(), ...overrides };
  const world = await worldOf(db, options);
  const photos = await generatedPhotos();
  const jobs = schedule({ ...options, now: world.now, kindsAvailable: world.kindsAvailable, techs: world.techs });
  const rowsWorld = { seed: options.seed, now: world.now, altitudeM: world.altitudeM, leadId: world.lead.id, techs: world.techs, guides: world.guides, images: photos.map((p) => p.info) };
  return { options, techs: world.added, photos, batches: () => historyRows(jobs, rowsWorld, options.jobsPerBatch) };
}

/**
 * Adds the invented history. With a storage the photos' files are written too; without one only
 * their rows are (the server tests and the load data need no pictures).
 */
export async function seedHistory(db: Database, storage?: Storage, overrides: Partial<HistoryOptions> = {}): Promise<HistoryCounts> {
  const extra = overrides.extraTechs ?? demoHistory.extraTechs;
  // argon2 works on its own threads while the history is planned.
  const hashing = Promise.all([...new Set(extra.map((t) => t.password))].map(async (p) => [p, await hashPassword(p)] as const));
  const { options, techs, photos, batches } = await planHistory(db, overrides);
  const hashes = new Map(await hashing);
  const counts: HistoryCounts = { users: techs.length, customers: 0, workOrders: 0, sessions: 0, events: 0, attachments: 0 };
  let first = true;
  for (const rows of batches()) {
    // The files first, never inside the transaction, as an upload does.
    if (storage) await writePhotos(storage, rows.photoFiles, photos);
    await db.transaction(async (tx) => {
      if (first && techs.length > 0) await tx.insert(users).values(techs.map(({ share: _share, password, ...u }) => ({ ...u, passwordHash: hashes.get(password)! })));
      await insertRows(tx, rows);
      if (first) await tx.insert(auditLog).values({ id: createRandom(options.seed + 1).uuid(options.now.getTime()), userId: null, action: "demo.history_seeded", recordType: "shop", recordId: "1", details: { seed: options.seed, days: options.days }, at: options.now });
    });
    first = false;
    counts.customers += rows.customers.length;
    counts.workOrders += rows.workOrders.length;
    counts.sessions += rows.sessions.length;
    counts.events += rows.events.length;
    counts.attachments += rows.attachments.length;
    options.onBatch?.({ ...counts });
  }
  return counts;
}
