import { describe, expect, it } from "vitest";
import { inEveryUnit } from "../../../shared/calc/units.ts";
import { conversions, parseAmount, premixOil, rounded } from "../../../src/features/calculators/lib/calculators.ts";

describe("the bench calculators", () => {
  it("gives a value in every unit of its quantity, the entered one first", () => {
    // Source: NIST SP 811 (2008), B.8: 1 US gallon = 3.785 411 784 L = 128 US fluid ounces.
    const gallon = inEveryUnit(1, "gal_us");
    expect(gallon[0]).toEqual({ unit: "gal_us", value: 1 });
    expect(gallon.find((c) => c.unit === "mL")!.value).toBeCloseTo(3785.411784, 6);
    expect(gallon.find((c) => c.unit === "fl_oz_us")!.value).toBeCloseTo(128, 9);
    expect(conversions(1, "gal_us").map((c) => c.unit)).not.toContain("gal_us");
  });

  it("mixes 2.56 US fl oz of oil into a US gallon at 50:1, and 3.2 at 40:1", () => {
    // Source: arithmetic on NIST SP 811's 128 US fl oz per US gallon: 128 / 50 = 2.56, 128 / 40 = 3.2.
    // Common practice (no published source): premix charts give "2.6 oz per gallon" for 50:1.
    const fifty = premixOil(1, "gal_us", 50);
    expect(fifty.find((o) => o.unit === "fl_oz_us")!.value).toBeCloseTo(2.56, 9);
    expect(fifty.find((o) => o.unit === "mL")!.value).toBeCloseTo(3785.411784 / 50, 6);
    expect(premixOil(1, "gal_us", 40).find((o) => o.unit === "fl_oz_us")!.value).toBeCloseTo(3.2, 9);
    // 5 L at 25:1 is 200 mL of oil.
    expect(premixOil(5, "L", 25).find((o) => o.unit === "mL")!.value).toBeCloseTo(200, 9);
  });

  it("reads each unit to the bench's precision", () => {
    // Source: NIST SP 811, B.8: 1 in = 25.4 mm exactly; 0.030 in = 0.762 mm, 0.010 in = 0.254 mm.
    expect(rounded(0.03 * 25.4, "mm")).toBe("0.76");
    expect(rounded(0.254 / 25.4, "in")).toBe("0.010");
    expect(rounded(75.708, "mL")).toBe("76");
    expect(rounded(2.56, "fl_oz_us")).toBe("2.56");
  });

  it("says what is wrong with an amount", () => {
    expect(parseAmount("", "gap")).toEqual({ ok: false, reason: "Enter the gap." });
    expect(parseAmount("-", "gap")).toEqual({ ok: false, reason: "The gap is not a number." });
    expect(parseAmount("-2", "ratio")).toEqual({ ok: false, reason: "The ratio must be more than zero." });
    expect(parseAmount("0.025", "gap")).toEqual({ ok: true, value: 0.025 });
  });
});
