import { describe, it, expect } from "vitest";
import type { EngineProfile } from "../../../shared/equipment.ts";
import {
  compressionRules,
  evaluateCompression,
  MAX_PLAUSIBLE_GAUGE_KPA,
  theoreticalCrankingPressure,
} from "../../../shared/calc/compression.ts";

// Source: NIST SP 811 (2008), Appendix B.8, p. 53 — psi to kPa
const PSI_KPA = 6.894757293168361;
const kPa = (psi: number) => psi * PSI_KPA;

const twoStroke: EngineProfile = { cycle: 2, compressionRelease: "no", displacementCc: 30 };
const withRelease: EngineProfile = { cycle: 4, compressionRelease: "yes", displacementCc: 160 };
const releaseUnknown: EngineProfile = { cycle: 4, compressionRelease: "unknown", displacementCc: 160 };
const noRelease: EngineProfile = { cycle: 4, compressionRelease: "no", displacementCc: 35 };

const verdict = (psi: number, profile: EngineProfile, altitudeM = 0) =>
  evaluateCompression({ gaugeKPa: kPa(psi), altitudeM, profile }).verdict;

describe("theoreticalCrankingPressure", () => {
  it("reproduces the cold-air Otto example", () => {
    // Source: any thermodynamics text, cold-air Otto cycle — r = 8, P1 = 14.7 psia, gamma 1.4 ⇒ P2 = 270.2 psia
    const r = theoreticalCrankingPressure({ compressionRatio: 8, ambientKPa: kPa(14.7), polytropicN: 1.4 });
    expect(r.absoluteKPa / PSI_KPA).toBeCloseTo(270.2, 1);
    expect(r.gaugeKPa / PSI_KPA).toBeCloseTo(270.2 - 14.7, 1);
  });

  it("defaults to n = 1.3", () => {
    // Arithmetic: 100 × 2^1.3 = 246.229 kPa absolute
    expect(theoreticalCrankingPressure({ compressionRatio: 2, ambientKPa: 100 }).absoluteKPa).toBeCloseTo(246.229, 3);
  });

  it("refuses impossible inputs", () => {
    expect(() => theoreticalCrankingPressure({ compressionRatio: 0.5, ambientKPa: 100 })).toThrow(RangeError);
    expect(() => theoreticalCrankingPressure({ compressionRatio: 8, ambientKPa: 0 })).toThrow(RangeError);
    expect(() => theoreticalCrankingPressure({ compressionRatio: 8, ambientKPa: 100, polytropicN: 0.9 })).toThrow(RangeError);
  });
});

describe("evaluateCompression", () => {
  it("calls 80 psi on a 4-stroke with a compression release marginal, not low", () => {
    // Common practice (no published source): about 80 psi on an engine with a compression release is marginal, not a failure
    expect(verdict(80, withRelease)).toBe("marginal");
  });

  it("reads a 4-stroke with a compression release against its own lower bands", () => {
    // Weak published source (a general engine-testing guide): 60–75 psi ordinary, below about 25 psi something is wrong
    expect(verdict(65, withRelease)).toBe("good");
    expect(verdict(75, withRelease)).toBe("good");
    expect(verdict(40, withRelease)).toBe("marginal");
    expect(verdict(20, withRelease)).toBe("low");
  });

  it("reads a handheld 2-stroke against 90–180 psi", () => {
    // Common practice (no published source): handheld 2-strokes typically 90–180 psi, below about 90 hard or no start
    expect(verdict(120, twoStroke)).toBe("good");
    expect(verdict(90, twoStroke)).toBe("good");
    expect(verdict(85, twoStroke)).toBe("marginal");
    expect(verdict(60, twoStroke)).toBe("low");
  });

  it("brings a reading at altitude to sea level and says both", () => {
    // From memory: U.S. Standard Atmosphere 1976 — 600 m: 94 322 Pa; 86 psi × 101 325 / 94 322 = 92.4 psi
    const r = evaluateCompression({ gaugeKPa: kPa(86), altitudeM: 600, profile: twoStroke });
    expect(r.seaLevelPsi).toBeCloseTo(92.38, 1);
    expect(r.seaLevelKPa).toBeCloseTo(kPa(92.38), 0);
    expect(r.reason).toBe("92 psi at sea level (86 psi read at 600 m): within the usual range for a handheld 2-stroke.");
    expect(r.rule).toEqual({ id: "two_stroke", source: compressionRules.two_stroke.source });
  });

  it("does not condemn an engine for the thin air at altitude", () => {
    // Source: U.S. Standard Atmosphere 1976 — 2000 m: 79 501 Pa; 72 psi × 101 325 / 79 501 = 91.8 psi
    expect(verdict(72, twoStroke, 2000)).toBe("good");
    expect(verdict(72, twoStroke, 0)).toBe("low");
  });

  it("treats an unrecorded release like a fitted one and says so", () => {
    const r = evaluateCompression({ gaugeKPa: kPa(80), altitudeM: 0, profile: releaseUnknown });
    expect(r.verdict).toBe("marginal");
    expect(r.rule.id).toBe("four_stroke_release_unknown");
    expect(r.reason).toMatch(/^80 psi read at sea level: .*a compression release \(assumed, as none was recorded\);.*\.$/);
  });

  it("expects the full stroke without a release", () => {
    // Common practice (no published source): without a release the engine reads like a 2-stroke, 90 psi or more
    expect(verdict(110, noRelease)).toBe("good");
    expect(verdict(65, noRelease)).toBe("low");
  });

  it("lets the maker's range win over the general rule", () => {
    const spec: EngineProfile = { ...twoStroke, specPsi: { min: 70, max: 100 } };
    expect(verdict(85, twoStroke)).toBe("marginal");
    expect(verdict(85, spec)).toBe("good");
    expect(verdict(65, spec)).toBe("marginal");
    expect(verdict(50, spec)).toBe("low");
    expect(verdict(130, spec)).toBe("marginal");
    expect(evaluateCompression({ gaugeKPa: kPa(85), altitudeM: 0, profile: spec }).rule.id).toBe("maker_spec");
    expect(() => verdict(85, { ...twoStroke, specPsi: { min: 100, max: 70 } })).toThrow(RangeError);
  });

  it("calls negative and impossibly high readings implausible", () => {
    // Arithmetic on references.md §3: 101.325 kPa × (12^1.4 − 1) = 3183.9 kPa (461.8 psi) gauge for 12:1 with no losses
    expect(MAX_PLAUSIBLE_GAUGE_KPA).toBeCloseTo(3183.9, 1);
    expect(evaluateCompression({ gaugeKPa: -20, altitudeM: 0, profile: twoStroke }).verdict).toBe("implausible");
    const high = evaluateCompression({ gaugeKPa: kPa(500), altitudeM: 0, profile: twoStroke });
    expect(high.verdict).toBe("implausible");
    expect(high.reason).toContain("about 462 psi");
    expect(verdict(450, twoStroke)).toBe("good");
  });

  it("refuses an altitude outside the model", () => {
    expect(() => evaluateCompression({ gaugeKPa: 600, altitudeM: 20000, profile: twoStroke })).toThrow(RangeError);
  });
});
