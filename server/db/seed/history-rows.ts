// The invented history as table rows: each scheduled job becomes its customer, unit, work order with
// its state history, and its sessions with their events, photos, flags and reviews.
import type { attachments, auditLog, customers, diagnosticSessions, sessionEvents, units, workOrders, workOrderStateHistory } from "../schema.ts";
import type { UnitSystem } from "../../../shared/equipment.ts";
import type { FlowInput } from "../../../shared/flow/step-rules.ts";
import { sessionFlags } from "../../../shared/review/flags.ts";
import type { TankContents } from "../../../shared/schemas/work-orders.ts";
import { abandonReasons, alreadyTried, approvalComments, returnComments } from "./history-cast.ts";
import { flowOfKind, newCustomer, newUnit, pickTarget, complaintFor, type PlannedUnit } from "./history-units.ts";
import type { FlowGuide } from "./history-guide.ts";
import { afterDiagnosis, type StateChange } from "./history-orders.ts";
import type { Job, SessionSpec } from "./history-schedule.ts";
import { walkSession, type Walk } from "./history-walk.ts";
import { createRandom, type Random } from "./random.ts";

export interface PhotoInfo {
  size: number;
  width: number;
  height: number;
  sha256: string;
}

export interface HistoryWorld {
  seed: number;
  now: number;
  altitudeM: number;
  leadId: string;
  /** In the schedule's order. */
  techs: readonly { id: string; unitSystem: UnitSystem }[];
  guides: ReadonlyMap<string, FlowGuide>;
  images: readonly PhotoInfo[];
}

export interface HistoryRows {
  customers: (typeof customers.$inferInsert)[];
  units: (typeof units.$inferInsert)[];
  workOrders: (typeof workOrders.$inferInsert)[];
  history: (typeof workOrderStateHistory.$inferInsert)[];
  sessions: (typeof diagnosticSessions.$inferInsert)[];
  events: (typeof sessionEvents.$inferInsert)[];
  attachments: (typeof attachments.$inferInsert)[];
  audit: (typeof auditLog.$inferInsert)[];
  /** Which generated picture each attachment shows, for writing its files. */
  photoFiles: { storageKey: string; thumbKey: string; image: number }[];
}

const emptyRows = (): HistoryRows => ({ customers: [], units: [], workOrders: [], history: [], sessions: [], events: [], attachments: [], audit: [], photoFiles: [] });

/** A separate stream per job, so a job's rows do not depend on how the others were batched. */
function jobRandom(seed: number, index: number): Random {
  let h = (seed ^ Math.imul(index + 1, 0x9e3779b1)) >>> 0;
  h = Math.imul(h ^ (h >>> 16), 0x85ebca6b);
  h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35);
  return createRandom((h ^ (h >>> 16)) >>> 0);
}

const date = (ms: number) => new Date(Math.round(ms));

/** Cuts a walk before one of its answers (and before now): where a session left open or abandoned stands. */
function cut(walk: Walk, now: number, rng: Random): Walk {
  const answers = walk.events.map((e, i) => (i > 0 && walk.events[i - 1]!.at < now - 60_000 && (e.event.type === "step.answer" || e.event.type === "step.record") ? i : -1)).filter((i) => i >= 0);
  const at = answers.length === 0 ? 0 : answers[rng.int(Math.min(2, answers.length - 1), Math.max(0, answers.length - 2))]!;
  return { events: walk.events.slice(0, at), photos: walk.photos.filter((p) => p.index < at), findingStepId: null };
}

function tankContentsOf(walk: Walk, unit: PlannedUnit, rng: Random): TankContents {
  const answer = walk.events.find((e) => e.event.type === "step.answer" && e.event.stepId.endsWith("/fuel-tank"))?.event;
  const value = answer?.type === "step.answer" ? answer.value : null;
  if (rng.chance(0.2)) return "unknown";
  if (value === "stale") return "stale";
  if (value === "empty") return "empty";
  return unit.cycle === 2 ? "premix" : "fresh";
}

export function* historyRows(jobs: readonly Job[], world: HistoryWorld, jobsPerBatch: number): Generator<HistoryRows> {
  const customerIds = new Map<number, string>();
  const plannedUnits = new Map<number, PlannedUnit>();
  let rows = emptyRows();
  for (const [index, job] of jobs.entries()) {
    const rng = jobRandom(world.seed, index);
    let customerId = customerIds.get(job.customer);
    if (!customerId) {
      const customer = newCustomer(rng, job.intakeAt);
      customerIds.set(job.customer, (customerId = customer.id));
      rows.customers.push(customer);
    }
    let unit = plannedUnits.get(job.unit);
    if (!unit) {
      unit = newUnit(rng, job.kind, customerId, job.intakeAt);
      plannedUnits.set(job.unit, unit);
      rows.units.push(unit.row);
    }
    addJob(rows, job, unit, customerId, world, rng);
    if ((index + 1) % jobsPerBatch === 0) {
      yield rows;
      rows = emptyRows();
    }
  }
  if (rows.customers.length + rows.workOrders.length > 0) yield rows;
}

function addJob(rows: HistoryRows, job: Job, unit: PlannedUnit, customerId: string, world: HistoryWorld, rng: Random) {
  const guide = world.guides.get(flowOfKind(job.kind))!;
  const workOrderId = rng.uuid(job.intakeAt);
  const createdBy = rng.chance(0.7) ? world.leadId : world.techs[rng.int(0, world.techs.length - 1)]!.id;
  const changes: StateChange[] = [{ to: "waiting_for_diagnosis", at: job.intakeAt, by: createdBy }];
  const input: FlowInput = { profile: { cycle: unit.cycle, compressionRelease: unit.row.compressionRelease ?? "unknown", displacementCc: unit.row.displacementCc ?? null, specPsi: null }, altitudeM: world.altitudeM };
  const target = pickTarget(guide, unit.features, rng);
  let tank: TankContents | null = null;
  let lastCompleted: { at: number; returned: boolean } | null = null;
  let endedAt = job.intakeAt;
  for (const spec of job.sessions) {
    const tech = world.techs[spec.tech]!;
    const full = walkSession({ guide, features: unit.features, input, target, startedAt: spec.startedAt, system: tech.unitSystem, rush: spec.rush, overnight: spec.overnight }, rng);
    tank ??= tankContentsOf(full, unit, rng);
    const walk = spec.outcome === "completed" ? full : cut(full, world.now, rng);
    const sessionId = rng.uuid(spec.startedAt);
    changes.push({ to: "diagnosing", at: spec.startedAt, by: tech.id });
    const last = walk.events[walk.events.length - 1]?.at ?? spec.startedAt;
    const session = sessionRow(rows, spec, walk, sessionId, workOrderId, guide, input, world, rng, last);
    rows.sessions.push(session);
    addEvents(rows, walk, sessionId, tech.id, world, rng);
    if (spec.outcome === "completed") {
      changes.push({ to: "waiting_for_approval", at: session.completedAt!.getTime(), by: tech.id });
      lastCompleted = { at: session.completedAt!.getTime(), returned: spec.review === "returned" };
      endedAt = session.completedAt!.getTime();
    } else if (spec.outcome === "abandoned") {
      endedAt = last + rng.between(1, 20) * 60_000;
      if (!lastCompleted) changes.push({ to: "waiting_for_diagnosis", at: endedAt, by: tech.id });
    }
  }
  if (job.collected) changes.push({ to: "picked_up", at: endedAt + rng.between(4, 72) * 3_600_000, by: world.leadId });
  else if (lastCompleted && !lastCompleted.returned) changes.push(...afterDiagnosis(target, guide, lastCompleted.at, world.leadId, rng));
  const reached = changes.filter((c) => c.at <= world.now);
  const state = reached[reached.length - 1]!;
  rows.workOrders.push({
    id: workOrderId,
    customerId,
    unitId: unit.row.id,
    state: state.to,
    complaint: complaintFor(guide, target, rng),
    alreadyTried: rng.pick(alreadyTried),
    tankContents: tank ?? (unit.cycle === 2 ? "premix" : "unknown"),
    createdBy,
    createdAt: date(job.intakeAt),
    updatedAt: date(state.at),
  });
  reached.forEach((c, i) => rows.history.push({ id: rng.uuid(c.at), workOrderId, fromState: i === 0 ? null : reached[i - 1]!.to, toState: c.to, userId: c.by, at: date(c.at) }));
}

type SessionInsert = typeof diagnosticSessions.$inferInsert;

function sessionRow(rows: HistoryRows, spec: SessionSpec, walk: Walk, id: string, workOrderId: string, guide: FlowGuide, input: FlowInput, world: HistoryWorld, rng: Random, last: number): SessionInsert {
  const base = {
    id,
    workOrderId,
    flowVersionId: guide.versionId,
    techId: world.techs[spec.tech]!.id,
    input,
    startedAt: date(spec.startedAt),
    currentStepId: walk.events[walk.events.length - 1]?.standing ?? guide.flow.start,
    // Every column written out, so the rows can be copied in as they are.
    abandonReason: null,
    findingStepId: null,
    reviewState: "not_submitted" as const,
    reviewerId: null,
    reviewComment: null,
    reviewedAt: null,
    flags: null,
    flagCount: 0,
    completedAt: null,
  };
  if (spec.outcome === "open") return { ...base, status: "open" as const };
  if (spec.outcome === "abandoned") return { ...base, status: "abandoned" as const, abandonReason: rng.pick(abandonReasons) };
  const completedAt = last + rng.between(10, 120) * 1000;
  // Exactly as completing a session works them out.
  const flags = sessionFlags({
    flow: guide.flow,
    input,
    events: walk.events.map((e) => ({ recordedAt: date(e.at).toISOString(), event: e.event })),
    status: "completed",
    startedAt: date(spec.startedAt),
    completedAt: date(completedAt),
    now: date(completedAt),
  });
  const reviewedAt = completedAt + spec.reviewLag;
  const reviewed = spec.review !== "waiting" && reviewedAt < world.now;
  const review = reviewed ? { reviewState: spec.review as "approved" | "returned", reviewerId: world.leadId, reviewedAt: date(reviewedAt), reviewComment: (spec.review === "returned" ? rng.pick(returnComments) : rng.pick(approvalComments)) || null } : { reviewState: "waiting" as const };
  if (reviewed) {
    rows.audit.push({ id: rng.uuid(reviewedAt), userId: world.leadId, action: `session.${spec.review}`, recordType: "diagnostic_session", recordId: id, details: { comment: review.reviewComment ?? "" }, at: date(reviewedAt) });
  }
  return { ...base, status: "completed" as const, findingStepId: walk.findingStepId, completedAt: date(completedAt), flags, flagCount: flags.length, ...review };
}

function addEvents(rows: HistoryRows, walk: Walk, sessionId: string, techId: string, world: HistoryWorld, rng: Random) {
  walk.events.forEach((e, i) => {
    rows.events.push({ id: rng.uuid(e.at), sessionId, seq: i + 1, type: e.event.type, payload: e.event, recordedAt: date(e.at), receivedAt: date(e.at + rng.int(40, 900)) });
  });
  for (const photo of walk.photos) {
    const at = walk.events[photo.index]!.at - rng.int(1500, 6000);
    const image = rng.int(0, world.images.length - 1);
    const info = world.images[image]!;
    const storageKey = `${rng.uuid(at)}.webp`;
    const thumbKey = `${rng.uuid(at)}.webp`;
    rows.attachments.push({ id: photo.id, storageKey, thumbKey, ownerType: "session", ownerId: sessionId, stepId: photo.stepId, mimeType: "image/webp", size: info.size, width: info.width, height: info.height, sha256: info.sha256, createdBy: techId, createdAt: date(at) });
    rows.photoFiles.push({ storageKey, thumbKey, image });
  }
}
