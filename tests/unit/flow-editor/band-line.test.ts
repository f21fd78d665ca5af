import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { checkBands } from "../../../shared/flow/bands.ts";
import type { Band } from "../../../shared/flow/schema.ts";
import { axisTicks, coverageRegions, describeRegion, lineScale, percentAt, rangeWords } from "../../../src/features/flows/components/band-line.ts";
import { gapBands } from "../flow/fixtures.ts";

const b = (from: [number, boolean] | null, to: [number, boolean] | null, label: string): Band => ({
  from: from && { value: from[0], inclusive: from[1] },
  to: to && { value: to[0], inclusive: to[1] },
  label,
  verdict: "good",
  next: "f",
});
const words = (bands: Band[]) => coverageRegions(bands).map((r) => describeRegion(r, bands, "psi"));

describe("coverageRegions", () => {
  it("finds nothing wrong with bands that meet exactly", () => {
    // Common practice (no published source): an ignition air gap of about 0.25-0.36 mm (0.010-0.014 in).
    expect(coverageRegions(gapBands("a", "b", "c"))).toEqual([]);
  });

  it("finds a gap between 80 and 90 psi, with its open ends", () => {
    const bands = [b(null, [80, true], "Low"), b([90, false], null, "Good")];
    expect(coverageRegions(bands)).toEqual([{ kind: "gap", from: { value: 80, inclusive: false }, to: { value: 90, inclusive: true }, bands: [] }]);
    expect(words(bands)).toEqual(["Gap from 80 to 90 psi: no band covers it"]);
  });

  it("finds an overlap from 110 to 120 psi and names both bands", () => {
    const bands = [b(null, [100, false], "Low"), b([100, true], [120, false], "Fair"), b([110, true], [130, false], "Good"), b([130, true], null, "High")];
    expect(coverageRegions(bands)).toEqual([{ kind: "overlap", from: { value: 110, inclusive: true }, to: { value: 120, inclusive: false }, bands: [1, 2] }]);
    expect(words(bands)).toEqual(['Overlap from 110 to 120 psi: "Fair" and "Good" both cover it']);
  });

  it("finds the unbounded gaps when the outer bands stop short, and a one-value gap", () => {
    const bands = [b([60, true], [80, false], "Low"), b([80, false], [200, true], "Good")];
    expect(words(bands)).toEqual(["Gap below 60 psi: no band covers it", "Gap at 80 psi: no band covers it", "Gap above 200 psi: no band covers it"]);
  });

  it("says three bands all cover a stretch they share", () => {
    const bands = [b(null, null, "All"), b([1, true], [5, true], "Mid"), b([2, true], [3, true], "Inner")];
    expect(words(bands)).toEqual([
      'Overlap from 1 to 2 psi: "All" and "Mid" both cover it',
      'Overlap from 2 to 3 psi: "All", "Mid" and "Inner" all cover it',
      'Overlap from 3 to 5 psi: "All" and "Mid" both cover it',
    ]);
  });

  it("agrees with checkBands on whether a list has a gap and whether it has an overlap", () => {
    const bound = fc.option(fc.record({ value: fc.integer({ min: 0, max: 6 }), inclusive: fc.boolean() }), { nil: null });
    const band = fc.record({ from: bound, to: bound, label: fc.constantFrom("A", "B", "C"), verdict: fc.constant("good" as const), next: fc.constant("f") });
    fc.assert(
      fc.property(fc.array(band, { minLength: 1, maxLength: 5 }), (bands) => {
        const issues = checkBands(bands, "psi");
        const codes = new Set(issues.map((i) => i.code));
        const kinds = new Set(coverageRegions(bands).map((r) => r.kind));
        // checkBands stops at "covers nothing" when every band is empty; the line shows all of it as a gap.
        fc.pre(issues.filter((i) => i.code === "band_empty").length < bands.length);
        fc.pre(!codes.has("band_order"));
        expect(kinds.has("gap")).toBe(codes.has("band_gap") || codes.has("band_start_bounded") || codes.has("band_end_bounded"));
        expect(kinds.has("overlap")).toBe(codes.has("band_overlap"));
      }),
    );
  });
});

describe("the scale", () => {
  it("extends a margin beyond the finite edges so unbounded ends have room", () => {
    const scale = lineScale([b(null, [80, true], "Low"), b([80, false], [120, false], "Good"), b([120, true], null, "High")]);
    expect(scale).toEqual({ lo: 74, hi: 126 });
    expect(percentAt(scale, 80)).toBeGreaterThan(6);
    expect(percentAt(scale, 120)).toBeLessThan(94);
  });

  it("keeps a one-edge list and an all-unbounded list drawable", () => {
    expect(lineScale([b(null, [0, false], "Below"), b([0, true], null, "Above")])).toEqual({ lo: -1, hi: 1 });
    expect(lineScale([b(null, null, "All")])).toEqual({ lo: -1, hi: 1 });
    expect(percentAt({ lo: 0, hi: 10 }, -50)).toBe(6);
  });

  it("drops the number of a tick too close to the one before", () => {
    const ticks = axisTicks([b(null, [100, false], "A"), b([100, true], [100.5, false], "B"), b([100.5, true], [200, false], "C"), b([200, true], null, "D")], { lo: 80, hi: 220 });
    expect(ticks.map((t) => [t.value, t.labelled])).toEqual([
      [100, true],
      [100.5, false],
      [200, true],
    ]);
  });
});

describe("rangeWords", () => {
  it("says whether each end value belongs to the band", () => {
    expect(rangeWords({ value: 80, inclusive: true }, { value: 90, inclusive: false }, "psi")).toBe("from 80 psi (included) to 90 psi (not included)");
    expect(rangeWords(null, { value: 80, inclusive: false }, "psi")).toBe("below 80 psi");
    expect(rangeWords(null, { value: 80, inclusive: true }, "psi")).toBe("up to and including 80 psi");
    expect(rangeWords({ value: 90, inclusive: false }, null, "psi")).toBe("above 90 psi");
    expect(rangeWords(null, null, "psi")).toBe("every value");
  });
});
