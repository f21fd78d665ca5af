import { describe, it, expect } from "vitest";
import { geopotentialHeightM, seaLevelEquivalentGauge, standardPressurePa } from "../../../shared/calc/atmosphere.ts";

const within = (actual: number, expected: number, fraction: number) =>
  expect(Math.abs(actual - expected) / expected).toBeLessThanOrEqual(fraction);

describe("standardPressurePa", () => {
  it("matches the 1976 standard atmosphere at 0, 1000 and 2000 m within 0.05 %", () => {
    // Source: U.S. Standard Atmosphere, 1976 — sea-level pressure 101 325 Pa (exact by definition)
    expect(standardPressurePa(0)).toBe(101325);
    // Source: U.S. Standard Atmosphere, 1976, geometric-altitude table — 1000 m: 89 876 Pa
    within(standardPressurePa(1000), 89876, 0.0005);
    // Source: U.S. Standard Atmosphere, 1976, geometric-altitude table — 2000 m: 79 501 Pa
    within(standardPressurePa(2000), 79501, 0.0005);
  });

  it("gives about 12.23 psia at 5000 ft", () => {
    // Source: engineering tables of the 1976 standard atmosphere — 5000 ft: 12.23 psia; 1 ft = 0.3048 m, 1 psi = 6894.757 Pa (NIST SP 811, B.8)
    const psia = standardPressurePa(5000 * 0.3048) / 6894.757293168361;
    expect(psia).toBeCloseTo(12.23, 2);
  });

  it("matches the 1976 table at 600 m and 10 km", () => {
    // From memory: U.S. Standard Atmosphere, 1976, geometric-altitude table — 600 m: 94 322 Pa
    within(standardPressurePa(600), 94322, 0.0005);
    // From memory: U.S. Standard Atmosphere, 1976, geometric-altitude table — 10 000 m: 2.6500E+04 Pa
    within(standardPressurePa(10000), 26500, 0.0005);
  });

  it("is higher below sea level", () => {
    expect(standardPressurePa(-400)).toBeGreaterThan(101325);
  });

  it("uses geopotential height", () => {
    // Source: U.S. Standard Atmosphere, 1976 — H = r0·Z/(r0 + Z), r0 = 6 356 766 m: 11 km geometric is 10 981 m geopotential
    expect(geopotentialHeightM(11000)).toBeCloseTo(10981, 0);
  });

  it("refuses altitudes outside the troposphere layer", () => {
    expect(() => standardPressurePa(-600)).toThrow(RangeError);
    expect(() => standardPressurePa(12000)).toThrow(RangeError);
    expect(() => standardPressurePa(Number.NaN)).toThrow(RangeError);
  });
});

describe("seaLevelEquivalentGauge", () => {
  it("scales a gauge reading by P0 / P(altitude)", () => {
    // Source: references.md §2 table — 2000 m: 79 501 Pa; §3: the gauge reading scales with ambient pressure
    expect(seaLevelEquivalentGauge(500, 2000)).toBeCloseTo((500 * 101325) / 79501, 0);
    expect(seaLevelEquivalentGauge(500, 0)).toBe(500);
  });

  it("refuses a non-finite reading", () => {
    expect(() => seaLevelEquivalentGauge(Number.NaN, 0)).toThrow(RangeError);
  });
});
