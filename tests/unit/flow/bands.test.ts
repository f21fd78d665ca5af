import { describe, expect, it } from "vitest";
import { bandContains, checkBands, describeInterval, formatInterval } from "../../../shared/flow/bands.ts";
import type { Band, Bound } from "../../../shared/flow/schema.ts";
import { validateFlow } from "../../../shared/flow/validate.ts";
import { finding, flow, gapBands, gapReading } from "./fixtures.ts";

const b = (from: [number, boolean] | null, to: [number, boolean] | null, label: string): Band => ({
  from: from && { value: from[0], inclusive: from[1] },
  to: to && { value: to[0], inclusive: to[1] },
  label,
  verdict: "good",
  next: "f",
});
const messages = (bands: Band[]) => checkBands(bands, "mm").map((i) => `${i.code}: ${i.message}`);

describe("checkBands", () => {
  it("accepts bands that meet exactly, whichever side holds the shared edge", () => {
    // Common practice (no published source): an ignition air gap of about 0.25-0.36 mm (0.010-0.014 in).
    expect(checkBands(gapBands("a", "b", "c"), "mm")).toEqual([]);
    expect(checkBands([b(null, [1, true], "A"), b([1, false], null, "B")], "mm")).toEqual([]);
  });

  it("names a gap as an interval with the right brackets", () => {
    const bands = [b(null, [0.25, false], "Close"), b([0.25, true], [0.36, false], "Good"), b([0.4, true], null, "Wide")];
    expect(messages(bands)).toEqual(['band_gap: nothing covers [0.36, 0.4) mm, between band "Good" and band "Wide"']);
  });

  it("names a gap of one point when both bands leave the edge out", () => {
    expect(messages([b(null, [1, false], "A"), b([1, false], null, "B")])).toEqual(['band_gap: nothing covers 1 mm, between band "A" and band "B"']);
  });

  it("names an overlap of one point when both bands hold the edge", () => {
    expect(messages([b(null, [1, true], "A"), b([1, true], null, "B")])).toEqual(['band_overlap: bands "A" and "B" both cover 1 mm']);
  });

  it("names an overlap over a range, and one band inside another", () => {
    expect(messages([b(null, [0.3, true], "A"), b([0.25, true], null, "B")])).toEqual(['band_overlap: bands "A" and "B" both cover [0.25, 0.3] mm']);
    expect(messages([b(null, null, "All"), b([2, true], [3, false], "Inside")])).toEqual(['band_overlap: bands "All" and "Inside" both cover [2, 3) mm']);
  });

  it("needs the lowest band to start at -∞ and the highest to end at +∞", () => {
    expect(messages([b([0, true], null, "Positive")])).toEqual(["band_start_bounded: the lowest band must start at -∞ (from: null): nothing covers (-∞, 0) mm"]);
    expect(messages([b(null, [5, true], "Small")])).toEqual(["band_end_bounded: the highest band must end at +∞ (to: null): nothing covers (5, +∞) mm"]);
  });

  it("finds a band that covers nothing and a list out of order", () => {
    expect(checkBands([b(null, [1, false], "A"), b([3, true], [2, true], "Backwards"), b([1, true], null, "B")], "mm").map((i) => i.code)).toEqual(["band_empty"]);
    expect(checkBands([b([1, true], null, "High"), b(null, [1, false], "Low")], "mm").map((i) => i.code)).toEqual(["band_order"]);
  });

  it("reports every gap and overlap in one list, not only the first", () => {
    const bands = [b(null, [1, false], "A"), b([2, true], [3, true], "B"), b([3, true], [4, false], "C"), b([5, true], null, "D")];
    expect(checkBands(bands, "mm").map((i) => i.code)).toEqual(["band_gap", "band_overlap", "band_gap"]);
  });

  it("reaches validateFlow with the step's unit label in the message", () => {
    const bands = gapBands("f", "f", "f");
    bands[2] = { ...bands[2]!, from: { value: 0.4, inclusive: true } };
    const result = validateFlow(flow({ gap: gapReading(bands), f: finding() }), []);
    expect(result.problems).toEqual([expect.objectContaining({ stepId: "gap", code: "band_gap", message: expect.stringContaining("nothing covers (0.36, 0.4) mm") })]);
  });
});

describe("bandContains and formatInterval", () => {
  const good = gapBands("a", "b", "c")[1]!;

  it("holds an inclusive edge and leaves an exclusive one out", () => {
    expect([0.25, 0.3, 0.36].map((v) => bandContains(good, v))).toEqual([true, true, true]);
    expect([0.2499, 0.3601].map((v) => bandContains(good, v))).toEqual([false, false]);
    expect(bandContains(gapBands("a", "b", "c")[0]!, 0.25)).toBe(false);
  });

  it("writes bounds the way a maths book does", () => {
    const lo: Bound = { value: 0.25, inclusive: true };
    expect(formatInterval(lo, { value: 0.36, inclusive: false }, "mm")).toBe("[0.25, 0.36) mm");
    expect(formatInterval(null, { value: 1, inclusive: true }, "in")).toBe("(-∞, 1] in");
    expect(formatInterval({ value: 1, inclusive: false }, null, "psi")).toBe("(1, +∞) psi");
  });
});

describe("describeInterval", () => {
  it("says each kind of end in words", () => {
    const mm = (value: number, inclusive: boolean) => ({ value, inclusive });
    expect(describeInterval(mm(0.25, true), mm(0.36, false), "mm")).toBe("0.25 to under 0.36 mm");
    expect(describeInterval(mm(0.25, false), mm(0.36, true), "mm")).toBe("over 0.25 to 0.36 mm");
    expect(describeInterval(mm(0.36, false), null, "mm")).toBe("over 0.36 mm");
    expect(describeInterval(mm(0.36, true), null, "mm")).toBe("0.36 mm or more");
    expect(describeInterval(null, mm(1, true), "in")).toBe("up to 1 in");
    expect(describeInterval(null, mm(1, false), "in")).toBe("under 1 in");
    expect(describeInterval(mm(2, true), mm(2, true), "in")).toBe("2 in");
  });
});
