// A compiled flow seen as a map for the invented history: which answers a step can honestly get on
// a given unit, which findings the unit can reach, and how far each step is from a chosen finding.
import type { CompiledFlow, CompiledStep } from "../../../shared/flow/compile.ts";
import type { Band, CompressionVerdict } from "../../../shared/flow/schema.ts";
import { DONE } from "../../../shared/flow/schema.ts";

/** What the unit has, as far as the flows ask about it. */
export interface UnitFeatures {
  cycle: 2 | 4;
  primer: boolean;
  fuelValve: boolean;
  oilSensor: boolean;
  arrestor: boolean;
}

export type Move = { kind: "answer"; value: string } | { kind: "band"; band: Band; index: number } | { kind: "verdict"; verdict: CompressionVerdict };
export interface Edge {
  move: Move;
  next: string;
}

/** The answers that describe the unit rather than a fault: a 2-stroke has no dipstick, a trimmer no fuel valve. */
function allowed(key: string, f: UnitFeatures): readonly string[] | null {
  switch (key) {
    case "safety-and-reproduce/fuel-valve":
      return f.fuelValve ? ["open", "closed"] : ["none"];
    case "safety-and-reproduce/oil-level":
      return f.cycle === 4 ? ["ok", "low", "over"] : ["none"];
    case "fuel-delivery/primer":
      return [f.primer ? "yes" : "no"];
    case "spark-check/oil-sensor":
      return [f.oilSensor ? "yes" : "no"];
    case "generator-no-start/lamp":
      return f.oilSensor ? null : ["no"];
    case "air-and-exhaust/two-stroke":
      return [f.cycle === 2 ? "yes" : "no"];
    case "air-and-exhaust/arrestor-result":
      return f.arrestor ? ["blocked", "clear"] : ["none"];
    case "air-and-exhaust/oil-source":
      return f.cycle === 4 ? null : ["no"];
    default:
      return null;
  }
}

const featureKey = (f: UnitFeatures) => `${f.cycle}${+f.primer}${+f.fuelValve}${+f.oilSensor}${+f.arrestor}`;

export class FlowGuide {
  private readonly edgeCache = new Map<string, Edge[]>();
  private readonly findingCache = new Map<string, string[]>();
  private readonly distanceCache = new Map<string, Map<string, number>>();

  constructor(
    readonly flowId: string,
    readonly versionId: string,
    readonly flow: CompiledFlow,
  ) {}

  key(step: CompiledStep): string {
    return `${step.origin.section ?? this.flow.id}/${step.origin.stepId}`;
  }

  edges(stepId: string, f: UnitFeatures): Edge[] {
    const cacheKey = `${featureKey(f)} ${stepId}`;
    const hit = this.edgeCache.get(cacheKey);
    if (hit) return hit;
    const step = this.flow.steps[stepId]!;
    let edges: Edge[] = [];
    if (step.kind === "instruction") edges = [{ move: { kind: "answer", value: DONE }, next: step.next }];
    else if (step.kind === "choice") {
      const only = allowed(this.key(step), f);
      edges = step.options.filter((o) => !only || only.includes(o.value)).map((o) => ({ move: { kind: "answer", value: o.value }, next: o.next }));
    } else if (step.kind === "reading" && step.evaluation) {
      edges = (Object.entries(step.evaluation.next) as [CompressionVerdict, string][]).map(([verdict, next]) => ({ move: { kind: "verdict", verdict }, next }));
    } else if (step.kind === "reading") {
      edges = (step.bands ?? []).map((band, index) => ({ move: { kind: "band", band, index }, next: band.next }));
    }
    this.edgeCache.set(cacheKey, edges);
    return edges;
  }

  /** Every finding the unit can end on, in the flow's order. */
  findings(f: UnitFeatures): string[] {
    const k = featureKey(f);
    const hit = this.findingCache.get(k);
    if (hit) return hit;
    const seen = new Set([this.flow.start]);
    const queue = [this.flow.start];
    while (queue.length > 0) {
      for (const e of this.edges(queue.shift()!, f)) {
        if (seen.has(e.next)) continue;
        seen.add(e.next);
        queue.push(e.next);
      }
    }
    const found = Object.values(this.flow.steps).filter((s) => s.kind === "finding" && seen.has(s.id)).map((s) => s.id);
    this.findingCache.set(k, found);
    return found;
  }

  /** Steps from each step to the target finding; a step that cannot reach it is missing. */
  distances(f: UnitFeatures, target: string): Map<string, number> {
    const k = `${featureKey(f)} ${target}`;
    const hit = this.distanceCache.get(k);
    if (hit) return hit;
    const into = new Map<string, string[]>();
    for (const id of Object.keys(this.flow.steps)) {
      for (const e of this.edges(id, f)) {
        const list = into.get(e.next);
        if (list) list.push(id);
        else into.set(e.next, [id]);
      }
    }
    const distance = new Map([[target, 0]]);
    const queue = [target];
    while (queue.length > 0) {
      const id = queue.shift()!;
      for (const from of into.get(id) ?? []) {
        if (distance.has(from)) continue;
        distance.set(from, distance.get(id)! + 1);
        queue.push(from);
      }
    }
    this.distanceCache.set(k, distance);
    return distance;
  }
}
