// Reading bands: which band holds a value, and whether a list covers the number line exactly once.
import type { Band, Bound } from "./schema.ts";

export type BandIssueCode = "band_gap" | "band_overlap" | "band_start_bounded" | "band_end_bounded" | "band_empty" | "band_order";
export interface BandIssue {
  code: BandIssueCode;
  message: string;
}

const num = (n: number) => String(n);

/** Formats an interval the way a maths book does, e.g. "[0.25, 0.36) mm"; null is unbounded. */
export function formatInterval(from: Bound | null, to: Bound | null, unit: string): string {
  if (from && to && from.value === to.value && from.inclusive && to.inclusive) return `${num(from.value)} ${unit}`;
  const lo = from ? `${from.inclusive ? "[" : "("}${num(from.value)}` : "(-∞";
  const hi = to ? `${num(to.value)}${to.inclusive ? "]" : ")"}` : "+∞)";
  return `${lo}, ${hi} ${unit}`;
}

/** The same interval in shop words, e.g. "0.25 to under 0.36 mm", "over 0.36 mm", "up to 1 in". */
export function describeInterval(from: Bound | null, to: Bound | null, unit: string): string {
  if (from && to) {
    if (from.value === to.value && from.inclusive && to.inclusive) return `${num(from.value)} ${unit}`;
    return `${from.inclusive ? "" : "over "}${num(from.value)} to ${to.inclusive ? "" : "under "}${num(to.value)} ${unit}`;
  }
  if (from) return from.inclusive ? `${num(from.value)} ${unit} or more` : `over ${num(from.value)} ${unit}`;
  if (to) return to.inclusive ? `up to ${num(to.value)} ${unit}` : `under ${num(to.value)} ${unit}`;
  return "any value";
}

export function bandContains(band: Band, value: number): boolean {
  const { from, to } = band;
  const aboveFrom = from === null || value > from.value || (from.inclusive && value === from.value);
  const belowTo = to === null || value < to.value || (to.inclusive && value === to.value);
  return aboveFrom && belowTo;
}

/** Negative when lower bound a starts before b; an inclusive bound starts before an exclusive one. */
function compareLower(a: Bound | null, b: Bound | null): number {
  if (a === null || b === null) return (a === null ? 0 : 1) - (b === null ? 0 : 1);
  if (a.value !== b.value) return a.value - b.value;
  return (a.inclusive ? 0 : 1) - (b.inclusive ? 0 : 1);
}

/** Negative when upper bound a ends before b; an inclusive bound ends after an exclusive one. */
function compareUpper(a: Bound | null, b: Bound | null): number {
  if (a === null || b === null) return (a === null ? 1 : 0) - (b === null ? 1 : 0);
  if (a.value !== b.value) return a.value - b.value;
  return (a.inclusive ? 1 : 0) - (b.inclusive ? 1 : 0);
}

const order = (a: Band, b: Band) => compareLower(a.from, b.from) || compareUpper(a.to, b.to);

function isEmpty(band: Band): boolean {
  const { from, to } = band;
  if (from === null || to === null) return false;
  return from.value > to.value || (from.value === to.value && !(from.inclusive && to.inclusive));
}

/** How lower bound `next` sits after coverage that ends at `cover`. */
function relation(cover: Bound | null, next: Bound | null): "overlap" | "adjacent" | "gap" {
  if (cover === null || next === null || next.value < cover.value) return "overlap";
  if (next.value > cover.value) return "gap";
  if (cover.inclusive && next.inclusive) return "overlap";
  return cover.inclusive || next.inclusive ? "adjacent" : "gap";
}

/** Every way a band list fails to cover the number line exactly once, in plain words. */
export function checkBands(bands: Band[], unit: string): BandIssue[] {
  const issues: BandIssue[] = [];
  const live: Band[] = [];
  for (const band of bands) {
    if (isEmpty(band)) {
      issues.push({ code: "band_empty", message: `band "${band.label}" covers nothing: it runs from ${num(band.from?.value ?? 0)} to ${num(band.to?.value ?? 0)} ${unit}` });
    } else live.push(band);
  }
  if (live.length === 0) return issues;
  let sorted = live;
  // Lists are almost always written in order; sort (and say so) only when one is not.
  if (live.some((band, i) => i > 0 && order(live[i - 1]!, band) > 0)) {
    sorted = [...live].sort(order);
    const misplaced = sorted.findIndex((band, i) => band !== live[i]);
    const band = sorted[misplaced]!;
    issues.push({ code: "band_order", message: `list the bands from low to high: band "${band.label}" belongs at position ${misplaced + 1}, not ${live.indexOf(band) + 1}` });
  }
  const first = sorted[0]!;
  if (first.from !== null) {
    const gapTo: Bound = { value: first.from.value, inclusive: !first.from.inclusive };
    issues.push({ code: "band_start_bounded", message: `the lowest band must start at -∞ (from: null): nothing covers ${formatInterval(null, gapTo, unit)}` });
  }
  let cover = first.to;
  let coverBand = first;
  for (let i = 1; i < sorted.length; i++) {
    const band = sorted[i]!;
    const rel = relation(cover, band.from);
    if (rel === "gap" && cover !== null && band.from !== null) {
      const gap = formatInterval({ value: cover.value, inclusive: !cover.inclusive }, { value: band.from.value, inclusive: !band.from.inclusive }, unit);
      issues.push({ code: "band_gap", message: `nothing covers ${gap}, between band "${coverBand.label}" and band "${band.label}"` });
    } else if (rel === "overlap") {
      const end = compareUpper(band.to, cover) <= 0 ? band.to : cover;
      issues.push({ code: "band_overlap", message: `bands "${coverBand.label}" and "${band.label}" both cover ${formatInterval(band.from, end, unit)}` });
    }
    if (compareUpper(band.to, cover) > 0) {
      cover = band.to;
      coverBand = band;
    }
  }
  if (cover !== null) {
    const gapFrom: Bound = { value: cover.value, inclusive: !cover.inclusive };
    issues.push({ code: "band_end_bounded", message: `the highest band must end at +∞ (to: null): nothing covers ${formatInterval(gapFrom, null, unit)}` });
  }
  return issues;
}
