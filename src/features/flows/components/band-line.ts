// The band line's arithmetic: where each value sits on the drawing, and which stretches no band or two bands cover.
import { bandContains } from "../../../../shared/flow/bands.ts";
import type { Band, Bound } from "../../../../shared/flow/schema.ts";

export interface CoverageRegion {
  kind: "gap" | "overlap";
  /** Null is unbounded; otherwise whether the region holds the value itself. */
  from: Bound | null;
  to: Bound | null;
  /** Indices of the bands that cover it: none for a gap, two or more for an overlap. */
  bands: number[];
}

const finite = (b: Bound | null): b is Bound => b !== null && Number.isFinite(b.value);

/** Every finite band edge, once, from low to high. */
export function edgeValues(bands: readonly Band[]): number[] {
  const values = new Set<number>();
  for (const band of bands) {
    if (finite(band.from)) values.add(band.from.value);
    if (finite(band.to)) values.add(band.to.value);
  }
  return [...values].sort((a, b) => a - b);
}

interface Piece {
  from: Bound | null;
  to: Bound | null;
  sample: number;
}

/** The line cut at every edge: open stretches between edges, and each edge value on its own. */
function pieces(edges: number[]): Piece[] {
  if (edges.length === 0) return [{ from: null, to: null, sample: 0 }];
  const out: Piece[] = [{ from: null, to: { value: edges[0]!, inclusive: false }, sample: edges[0]! - 1 }];
  edges.forEach((v, i) => {
    out.push({ from: { value: v, inclusive: true }, to: { value: v, inclusive: true }, sample: v });
    const next = edges[i + 1];
    const to = next === undefined ? null : { value: next, inclusive: false };
    out.push({ from: { value: v, inclusive: false }, to, sample: next === undefined ? v + 1 : v + (next - v) / 2 });
  });
  return out;
}

const sameSet = (a: number[], b: number[]) => a.length === b.length && a.every((x, i) => x === b[i]);

/**
 * Stretches of the line covered by no band (gaps) or by more than one (overlaps), each as exact bounds.
 * Every piece between two edges is covered by the same bands throughout, so one value per piece decides it.
 */
export function coverageRegions(bands: readonly Band[]): CoverageRegion[] {
  if (bands.length === 0) return [];
  const regions: CoverageRegion[] = [];
  for (const piece of pieces(edgeValues(bands))) {
    const covering = bands.flatMap((band, i) => (bandContains(band, piece.sample) ? [i] : []));
    if (covering.length === 1) continue;
    const kind = covering.length === 0 ? "gap" : "overlap";
    const last = regions[regions.length - 1];
    const touches = last && last.to !== null && piece.from !== null && last.to.value === piece.from.value && last.to.inclusive !== piece.from.inclusive;
    if (last && touches && last.kind === kind && sameSet(last.bands, covering)) last.to = piece.to;
    else regions.push({ kind, from: piece.from, to: piece.to, bands: covering });
  }
  return regions;
}

export interface LineScale {
  lo: number;
  hi: number;
}

/** The stretch of numbers drawn: every finite edge, with room either side for the unbounded ends. */
export function lineScale(bands: readonly Band[]): LineScale {
  const edges = edgeValues(bands);
  if (edges.length === 0) return { lo: -1, hi: 1 };
  const min = edges[0]!;
  const max = edges[edges.length - 1]!;
  const margin = min === max ? Math.max(Math.abs(min) * 0.2, 1) : (max - min) * 0.15;
  return { lo: min - margin, hi: max + margin };
}

/** Where a value sits across the drawing, in percent of its width, leaving the outer edges for arrows. */
export function percentAt(scale: LineScale, value: number, inset = 6): number {
  const t = (value - scale.lo) / (scale.hi - scale.lo);
  return inset + Math.min(1, Math.max(0, t)) * (100 - 2 * inset);
}

/** A tick at every edge; edges too close to read apart keep the tick and drop the number (the lanes say it). */
export function axisTicks(bands: readonly Band[], scale: LineScale, minGap = 6): Array<{ value: number; x: number; labelled: boolean }> {
  let last = -Infinity;
  return edgeValues(bands).map((value) => {
    const x = percentAt(scale, value);
    const labelled = x - last >= minGap;
    if (labelled) last = x;
    return { value, x, labelled };
  });
}

const quote = (bands: readonly Band[], indices: number[]) => {
  const names = indices.map((i) => `"${bands[i]?.label ?? `band ${i + 1}`}"`);
  return names.length <= 2 ? names.join(" and ") : `${names.slice(0, -1).join(", ")} and ${names[names.length - 1]}`;
};

/** A region in plain words, e.g. "Gap from 80 to 90 psi: no band covers it". */
export function describeRegion(region: CoverageRegion, bands: readonly Band[], unit: string): string {
  const { from, to } = region;
  let where: string;
  if (from === null && to === null) where = "everywhere";
  else if (from === null) where = `below ${to!.value} ${unit}`;
  else if (to === null) where = `above ${from.value} ${unit}`;
  else if (from.value === to.value) where = `at ${from.value} ${unit}`;
  else where = `from ${from.value} to ${to.value} ${unit}`;
  if (region.kind === "gap") return `Gap ${where}: no band covers it`;
  return `Overlap ${where}: ${quote(bands, region.bands)} ${region.bands.length > 2 ? "all" : "both"} cover it`;
}

/** A band's stretch in words, saying whether each end value belongs to it. */
export function rangeWords(from: Bound | null, to: Bound | null, unit: string): string {
  if (from === null && to === null) return "every value";
  if (from === null) return to!.inclusive ? `up to and including ${to!.value} ${unit}` : `below ${to!.value} ${unit}`;
  if (to === null) return from.inclusive ? `${from.value} ${unit} and above` : `above ${from.value} ${unit}`;
  const end = (b: Bound) => `${b.value} ${unit} (${b.inclusive ? "included" : "not included"})`;
  return `from ${end(from)} to ${end(to)}`;
}
