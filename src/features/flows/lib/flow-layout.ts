// The flow map's pure half: a draft definition, however unfinished, as nodes and edges laid out top to bottom.
import dagre from "@dagrejs/dagre";
import { formatInterval } from "../../../../shared/flow/bands.ts";
import type { Problem } from "../../../../shared/flow/problems.ts";
import { CONTINUE, type Bound } from "../../../../shared/flow/schema.ts";

export type StepStatus = "error" | "warning" | "fine";

export interface StepNodeData {
  stepId: string;
  /** Null while the step has no title yet. */
  title: string | null;
  kindWord: string;
  status: StepStatus;
  problems: Problem[];
  isStart: boolean;
}

/** A step of the draft, a target no step answers to, a way out not written yet, or a section's hand-back. */
export type MapNode =
  | { id: string; type: "step"; step: StepNodeData }
  | { id: string; type: "missing"; target: string }
  | { id: string; type: "unset"; stepId: string }
  | { id: string; type: "hand-back" };

export interface MapEdge {
  id: string;
  source: string;
  target: string;
  label: string | null;
  /** Leads to a missing step or to a way out not written yet. */
  broken: boolean;
}

export interface FlowMap {
  nodes: MapNode[];
  edges: MapEdge[];
}

export interface Point {
  x: number;
  y: number;
}

export interface Placement {
  /** Top-left corner of each node, by node id. */
  nodes: Record<string, Point>;
  /** Bends of each edge and the centre of its label, by edge id. */
  edges: Record<string, { points: Point[]; label: Point | null }>;
  width: number;
  height: number;
}

export const nodeSize: Record<MapNode["type"], { width: number; height: number }> = {
  step: { width: 272, height: 168 },
  missing: { width: 224, height: 104 },
  unset: { width: 224, height: 80 },
  "hand-back": { width: 224, height: 80 },
};

export const stepKindWords: Record<string, string> = {
  instruction: "Instruction",
  choice: "Choice",
  reading: "Reading",
  finding: "Finding",
  section: "Section",
};

export const outcomeWords = { good: "Good", marginal: "Marginal", low: "Low", implausible: "Not believable" } as const;
const outcomes = Object.keys(outcomeWords) as Array<keyof typeof outcomeWords>;

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);
const hasOwn = (o: object, k: string) => Object.prototype.hasOwnProperty.call(o, k);
const text = (v: unknown): string | null => (typeof v === "string" && v.trim() !== "" ? v : null);
const isBound = (v: unknown): v is Bound => isRecord(v) && typeof v.value === "number" && typeof v.inclusive === "boolean";

export const stepNodeId = (stepId: string) => `step:${stepId}`;

function kindWordOf(kind: unknown): string {
  if (typeof kind === "string" && hasOwn(stepKindWords, kind)) return stepKindWords[kind]!;
  return text(kind) ? `Unknown kind "${kind as string}"` : "No kind yet";
}

function bandLabel(band: unknown, i: number, unit: string): string {
  if (isRecord(band)) {
    const label = text(band.label);
    if (label) return label;
    const from = band.from === null || isBound(band.from) ? band.from : undefined;
    const to = band.to === null || isBound(band.to) ? band.to : undefined;
    if (from !== undefined && to !== undefined) return formatInterval(from, to, unit).trim();
  }
  return `Band ${i + 1}`;
}

/** Every way out a step has written, or ought to have, read leniently from whatever is there. */
export function exitsOf(raw: unknown): Array<{ label: string | null; target: unknown }> {
  if (!isRecord(raw)) return [];
  const out: Array<{ label: string | null; target: unknown }> = [];
  if (raw.kind === "instruction" || raw.kind === "section" || hasOwn(raw, "next")) {
    out.push({ label: raw.kind === "section" ? "After the section" : null, target: raw.next });
  }
  if (Array.isArray(raw.options)) {
    raw.options.forEach((o: unknown, i) => {
      const label = isRecord(o) ? (text(o.label) ?? text(o.value)) : null;
      out.push({ label: label ?? `Option ${i + 1}`, target: isRecord(o) ? o.next : undefined });
    });
  }
  if (Array.isArray(raw.bands)) {
    const unit = typeof raw.unit === "string" ? raw.unit : "";
    raw.bands.forEach((b: unknown, i) => out.push({ label: bandLabel(b, i, unit), target: isRecord(b) ? b.next : undefined }));
  }
  if (isRecord(raw.evaluation)) {
    const next = isRecord(raw.evaluation.next) ? raw.evaluation.next : {};
    for (const outcome of outcomes) out.push({ label: outcomeWords[outcome], target: next[outcome] });
    // A misspelt outcome still shows, under the name the author wrote.
    for (const key of Object.keys(next)) if (!hasOwn(outcomeWords, key)) out.push({ label: key, target: next[key] });
  }
  return out;
}

function statusOf(problems: Problem[]): StepStatus {
  if (problems.some((p) => p.severity === "error")) return "error";
  return problems.length > 0 ? "warning" : "fine";
}

/** The node id of a step the target names, or the stand-in node drawn where there is none. */
function targetOf(stepId: string, target: unknown, steps: Record<string, unknown>): string | MapNode {
  if (typeof target !== "string" || target === "") return { id: `unset:${stepId}`, type: "unset", stepId };
  if (target === CONTINUE) return { id: "hand-back", type: "hand-back" };
  return hasOwn(steps, target) ? stepNodeId(target) : { id: `missing:${target}`, type: "missing", target };
}

/** One node per top-level step, plus a node for each target that leads nowhere; never throws. */
export function readFlowMap(definition: Record<string, unknown>, problems: readonly Problem[]): FlowMap {
  const steps = isRecord(definition.steps) ? definition.steps : {};
  const start = typeof definition.start === "string" ? definition.start : null;
  const byStep = new Map<string, Problem[]>();
  for (const p of problems) {
    if (p.stepId === null) continue;
    const list = byStep.get(p.stepId);
    if (list) list.push(p);
    else byStep.set(p.stepId, [p]);
  }
  const nodes: MapNode[] = [];
  const extra = new Map<string, MapNode>();
  const edges: MapEdge[] = [];
  for (const [stepId, raw] of Object.entries(steps)) {
    const own = byStep.get(stepId) ?? [];
    const title = isRecord(raw) ? text(raw.title) : null;
    const kindWord = kindWordOf(isRecord(raw) ? raw.kind : undefined);
    nodes.push({ id: stepNodeId(stepId), type: "step", step: { stepId, title, kindWord, status: statusOf(own), problems: own, isStart: stepId === start } });
    exitsOf(raw).forEach(({ label, target }, k) => {
      const to = targetOf(stepId, target, steps);
      if (typeof to !== "string" && !extra.has(to.id)) extra.set(to.id, to);
      const broken = typeof to !== "string" && to.type !== "hand-back";
      edges.push({ id: `${stepNodeId(stepId)}#${k}`, source: stepNodeId(stepId), target: typeof to === "string" ? to : to.id, label, broken });
    });
  }
  return { nodes: [...nodes, ...extra.values()], edges };
}

/** What the layout depends on, and nothing else: titles and problems can change without moving a node. */
export interface LayoutShape {
  nodes: Array<{ id: string; width: number; height: number }>;
  edges: Array<{ id: string; source: string; target: string; labelWidth: number }>;
}

const LABEL_HEIGHT = 32;
const labelWidth = (label: string | null) => (label === null ? 0 : Math.min(220, 24 + 8.5 * label.length));

export function layoutShape(map: FlowMap): LayoutShape {
  return {
    nodes: map.nodes.map((n) => ({ id: n.id, ...nodeSize[n.type] })),
    edges: map.edges.map((e) => ({ id: e.id, source: e.source, target: e.target, labelWidth: labelWidth(e.label) })),
  };
}

/** Lays the shape out from top to bottom; positions are each node's top-left corner. */
export function placeShape(shape: LayoutShape): Placement {
  const g = new dagre.graphlib.Graph({ multigraph: true });
  g.setGraph({ rankdir: "TB", nodesep: 40, ranksep: 56, edgesep: 20, marginx: 24, marginy: 24 });
  for (const n of shape.nodes) g.setNode(n.id, { width: n.width, height: n.height });
  for (const e of shape.edges) {
    const labelled = e.labelWidth > 0;
    g.setEdge(e.source, e.target, { width: e.labelWidth, height: labelled ? LABEL_HEIGHT : 0, labelpos: "c" }, e.id);
  }
  dagre.layout(g);
  const nodes: Placement["nodes"] = {};
  for (const n of shape.nodes) {
    const { x = 0, y = 0 } = g.node(n.id) as { x?: number; y?: number };
    nodes[n.id] = { x: x - n.width / 2, y: y - n.height / 2 };
  }
  const edges: Placement["edges"] = {};
  for (const e of shape.edges) {
    const label = g.edge({ v: e.source, w: e.target, name: e.id }) as { points?: Point[]; x?: number; y?: number } | undefined;
    const hasLabel = e.labelWidth > 0 && typeof label?.x === "number" && typeof label.y === "number";
    edges[e.id] = { points: label?.points ?? [], label: hasLabel ? { x: label.x!, y: label.y! } : null };
  }
  const { width = 0, height = 0 } = g.graph() as { width?: number; height?: number };
  return { nodes, edges, width, height };
}

export interface FlowLayout extends FlowMap {
  placement: Placement;
}

/** The whole map in one call: what the graph draws, and what the unit tests read. */
export function layoutFlow(definition: Record<string, unknown>, problems: readonly Problem[]): FlowLayout {
  const map = readFlowMap(definition, problems);
  return { ...map, placement: placeShape(layoutShape(map)) };
}
