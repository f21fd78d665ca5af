import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { oilForFuel, ratioFromAmounts } from "../../../shared/calc/premix.ts";
import { UnitError, type Unit } from "../../../shared/calc/units.ts";

describe("oilForFuel", () => {
  it("gives the usual oil per US gallon", () => {
    // Source: references.md §5, arithmetic on NIST HB 44 C-12 (128 US fl oz per US gallon) — 128 / 50 = 2.56 fl oz
    expect(oilForFuel({ fuel: 1, fuelUnit: "gal_us", ratio: 50, oilUnit: "fl_oz_us" })).toBeCloseTo(2.56, 10);
    // Source: references.md §5 — 128 / 40 = 3.2 fl oz
    expect(oilForFuel({ fuel: 1, fuelUnit: "gal_us", ratio: 40, oilUnit: "fl_oz_us" })).toBeCloseTo(3.2, 10);
    // Source: references.md §5 — 128 / 32 = 4.0 fl oz
    expect(oilForFuel({ fuel: 1, fuelUnit: "gal_us", ratio: 32, oilUnit: "fl_oz_us" })).toBeCloseTo(4.0, 10);
  });

  it("gives the usual oil per litre", () => {
    // Source: references.md §5 — 1000 mL / 50 = 20 mL, / 40 = 25 mL, / 32 = 31.25 mL
    expect(oilForFuel({ fuel: 1, fuelUnit: "L", ratio: 50, oilUnit: "mL" })).toBeCloseTo(20, 10);
    expect(oilForFuel({ fuel: 1, fuelUnit: "L", ratio: 40, oilUnit: "mL" })).toBeCloseTo(25, 10);
    expect(oilForFuel({ fuel: 1, fuelUnit: "L", ratio: 32, oilUnit: "mL" })).toBeCloseTo(31.25, 10);
  });

  it("mixes units", () => {
    // Arithmetic on NIST SP 811 p. 52 (29.573 529 562 5 mL per US fl oz): 2.56 fl oz = 75.708 mL per US gallon at 50:1
    expect(oilForFuel({ fuel: 1, fuelUnit: "gal_us", ratio: 50, oilUnit: "mL" })).toBeCloseTo(75.70823568, 6);
    // Arithmetic: 5 L at 25:1 is 200 mL, and 200 / 28.413 062 5 = 7.039 imperial fl oz (NIST SP 811 p. 52)
    expect(oilForFuel({ fuel: 5, fuelUnit: "L", ratio: 25, oilUnit: "fl_oz_imp" })).toBeCloseTo(7.0390, 4);
  });

  it("refuses non-positive, non-finite amounts and non-volume units", () => {
    expect(() => oilForFuel({ fuel: 0, fuelUnit: "L", ratio: 50, oilUnit: "mL" })).toThrow(RangeError);
    expect(() => oilForFuel({ fuel: 1, fuelUnit: "L", ratio: -50, oilUnit: "mL" })).toThrow(RangeError);
    expect(() => oilForFuel({ fuel: Infinity, fuelUnit: "L", ratio: 50, oilUnit: "mL" })).toThrow(RangeError);
    expect(() => oilForFuel({ fuel: 1, fuelUnit: "L", ratio: Number.NaN, oilUnit: "mL" })).toThrow(RangeError);
    expect(() => oilForFuel({ fuel: 1, fuelUnit: "kPa", ratio: 50, oilUnit: "mL" })).toThrow(UnitError);
    expect(() => oilForFuel({ fuel: 1, fuelUnit: "L", ratio: 50, oilUnit: "mm" })).toThrow(UnitError);
  });
});

describe("ratioFromAmounts", () => {
  it("recovers the ratio of a known mix", () => {
    // Source: references.md §5 — 2.56 US fl oz in one US gallon is 50:1
    expect(ratioFromAmounts({ fuel: 1, fuelUnit: "gal_us", oil: 2.56, oilUnit: "fl_oz_us" })).toBeCloseTo(50, 10);
    // Source: references.md §5 — 25 mL in one litre is 40:1
    expect(ratioFromAmounts({ fuel: 1000, fuelUnit: "mL", oil: 25, oilUnit: "mL" })).toBeCloseTo(40, 10);
  });

  it("inverts oilForFuel", () => {
    const volume = fc.constantFrom<Unit>("fl_oz_us", "fl_oz_imp", "mL", "L", "gal_us");
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 100, noNaN: true }), volume, volume, fc.double({ min: 10, max: 100, noNaN: true }), (fuel, fuelUnit, oilUnit, ratio) => {
        const oil = oilForFuel({ fuel, fuelUnit, ratio, oilUnit });
        expect(ratioFromAmounts({ fuel, fuelUnit, oil, oilUnit })).toBeCloseTo(ratio, 8);
      }),
    );
  });

  it("refuses zero oil and non-volume units", () => {
    expect(() => ratioFromAmounts({ fuel: 1, fuelUnit: "L", oil: 0, oilUnit: "mL" })).toThrow(RangeError);
    expect(() => ratioFromAmounts({ fuel: 1, fuelUnit: "s", oil: 20, oilUnit: "mL" })).toThrow(UnitError);
  });
});
