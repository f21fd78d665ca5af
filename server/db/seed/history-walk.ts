// One invented session: a walk through the compiled flow towards a chosen finding, with the
// acknowledgements, photos, notes and readings a tech gives on the way, and the time each took.
import type { UnitSystem } from "../../../shared/equipment.ts";
import type { CompiledStep } from "../../../shared/flow/compile.ts";
import { ACKNOWLEDGED_SIGNALS } from "../../../shared/flow/session-log.ts";
import type { SignalWord } from "../../../shared/flow/schema.ts";
import type { FlowInput } from "../../../shared/flow/step-rules.ts";
import type { SessionEventBody } from "../../../shared/schemas/sessions.ts";
import { benchNotes } from "./history-cast.ts";
import type { Edge, FlowGuide, UnitFeatures } from "./history-guide.ts";
import { readingFor } from "./history-readings.ts";
import type { Random } from "./random.ts";

export interface WalkRequest {
  guide: FlowGuide;
  features: UnitFeatures;
  input: FlowInput;
  target: string;
  startedAt: number;
  system: UnitSystem;
  /** Do one timed step in less than its minimum (the review flags it). */
  rush: boolean;
  /** Leave the session overnight part-way (open longer than a day). */
  overnight: boolean;
}

export interface WalkedEvent {
  event: SessionEventBody;
  at: number;
  /** Where the session stands once this event is in. */
  standing: string;
}

export interface Walk {
  events: WalkedEvent[];
  /** The photos attached, by the position of their photo.attach event. */
  photos: { id: string; stepId: string; index: number }[];
  findingStepId: string | null;
}

/** How strongly a tech keeps to the straight road to the fault: each step of detour divides the odds by e^1.4. */
const DETOUR = 1.4;
const TOO_FAST_PER_STEP = 0.012;
const SECOND = 1000;

interface Pending {
  event: SessionEventBody;
  gap: number;
  standing: string;
  minSeconds?: number;
}

function choose(edges: Edge[], distance: Map<string, number>, here: number, rng: Random, straight: boolean): Edge {
  const reachable = edges.filter((e) => distance.has(e.next));
  if (reachable.length === 0) throw new Error("the walk cannot reach its finding from here");
  const weights = reachable.map((e) => {
    const extra = 1 + distance.get(e.next)! - here;
    if (straight) return extra === 0 ? 1 : 0;
    // A slip of the gauge or the finger, now and then: it sends the tech back to measure again.
    if (e.move.kind === "verdict" && e.move.verdict === "implausible") return 0.03;
    return Math.exp(-DETOUR * extra);
  });
  return rng.weighted(reachable.map((e, i) => [e, weights[i]!] as const));
}

function answerOf(step: CompiledStep, edge: Edge, req: WalkRequest, rng: Random): SessionEventBody {
  if (edge.move.kind === "answer") return { type: "step.answer", stepId: step.id, value: edge.move.value };
  const { value, unit } = readingFor(step, edge.move, req.input, req.system, rng);
  return { type: "step.record", stepId: step.id, value, unit };
}

function answerGap(step: CompiledStep, rng: Random): number {
  if (step.kind === "instruction" && step.minSeconds !== undefined) {
    if (rng.chance(TOO_FAST_PER_STEP)) return step.minSeconds * rng.between(0.2, 0.7);
    return step.minSeconds * rng.between(1.05, 1.7) + rng.between(5, 40);
  }
  if (step.kind === "instruction") return rng.between(20, 150);
  if (step.kind === "reading") return rng.between(40, 160);
  return rng.between(6, 50);
}

export function walkSession(req: WalkRequest, rng: Random): Walk {
  const { guide, features } = req;
  const distance = guide.distances(features, req.target);
  const pending: Pending[] = [];
  const photoSteps: { index: number; stepId: string }[] = [];
  const acknowledged = new Map<string, Set<SignalWord>>();
  const photographed = new Set<string>();
  let here = guide.flow.start;
  let answers = 0;
  const push = (event: SessionEventBody, gap: number, standing = here, minSeconds?: number) =>
    pending.push({ event, gap, standing, ...(minSeconds === undefined ? {} : { minSeconds }) });
  for (;;) {
    const step = guide.flow.steps[here]!;
    if (step.kind === "finding") {
      if (rng.chance(0.25)) push({ type: "note.add", stepId: step.id, text: rng.pick(benchNotes) }, rng.between(20, 90));
      break;
    }
    const acks = acknowledged.get(step.id) ?? new Set<SignalWord>();
    acknowledged.set(step.id, acks);
    for (const signal of new Set((step.cautions ?? []).map((c) => c.signal))) {
      // DANGER and WARNING must be acknowledged; CAUTION and NOTICE usually are.
      if (acks.has(signal) || (!ACKNOWLEDGED_SIGNALS.includes(signal) && !rng.chance(0.85))) continue;
      acks.add(signal);
      push({ type: "caution.acknowledge", stepId: step.id, signal }, rng.between(3, 12));
    }
    if (step.photo && !photographed.has(step.id) && (step.photo.requirement === "required" || rng.chance(0.35))) {
      photographed.add(step.id);
      photoSteps.push({ index: pending.length, stepId: step.id });
      push({ type: "photo.attach", stepId: step.id, attachmentId: "" }, rng.between(15, 70));
    }
    if (rng.chance(0.02)) push({ type: "note.add", stepId: step.id, text: rng.pick(benchNotes) }, rng.between(20, 90));
    const edges = guide.edges(here, features);
    const edge = choose(edges, distance, distance.get(here)!, rng, answers > 150);
    if (step.kind === "choice" && rng.chance(0.02)) {
      // Tapped the wrong answer, saw the next screen, and went back.
      const slip = edges.find((e) => e !== edge && guide.flow.steps[e.next]?.kind !== "finding");
      if (slip) {
        push(answerOf(step, slip, req, rng), rng.between(4, 20), slip.next);
        push({ type: "step.back" }, rng.between(4, 20));
      }
    }
    push(answerOf(step, edge, req, rng), answerGap(step, rng), edge.next, step.kind === "instruction" ? step.minSeconds : undefined);
    answers++;
    here = edge.next;
  }
  adjustTimes(pending, req, rng);
  const events: WalkedEvent[] = [];
  let at = req.startedAt;
  for (const p of pending) {
    at += p.gap * SECOND;
    events.push({ event: p.event, at: Math.round(at), standing: p.standing });
  }
  const photos = photoSteps.map(({ index, stepId }) => {
    const id = rng.uuid(events[index]!.at);
    const e = events[index]!.event;
    if (e.type === "photo.attach") e.attachmentId = id;
    return { id, stepId, index };
  });
  return { events, photos, findingStepId: here };
}

/** A rushed step and a night away, where the request asks for them. */
function adjustTimes(pending: Pending[], req: WalkRequest, rng: Random) {
  const timed = pending.map((p, i) => (p.minSeconds !== undefined ? i : -1)).filter((i) => i >= 0);
  if (req.rush && timed.length > 0 && !timed.some((i) => pending[i]!.gap < pending[i]!.minSeconds!)) {
    const p = pending[rng.pick(timed)]!;
    p.gap = p.minSeconds! * rng.between(0.2, 0.7);
  }
  if (req.overnight && pending.length > 4) pending[rng.int(2, pending.length - 2)]!.gap += rng.between(23, 30) * 3600;
}
