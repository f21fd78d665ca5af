import { describe, it, expect } from "vitest";
import { computeEstimate, repairOrReplace, ROUNDING_RULE, type EstimateInput } from "../../../shared/calc/estimate.ts";

const base: EstimateInput = {
  parts: [],
  labourHours: 0,
  labourRateCents: 0,
  diagnosticFeeCents: 0,
  creditDiagnosticFee: false,
  taxRateBasisPoints: 0,
};

describe("computeEstimate", () => {
  it("totals a repair with a credited diagnostic fee, tax on parts only", () => {
    const e = computeEstimate({
      parts: [
        { description: "Spark plug", quantity: 1, unitPriceCents: 499 },
        { description: "Air filter", quantity: 2, unitPriceCents: 650 },
        { description: "Fuel line (m)", quantity: 1.5, unitPriceCents: 399 },
      ],
      labourHours: 1.25,
      labourRateCents: 6500,
      diagnosticFeeCents: 3500,
      creditDiagnosticFee: true,
      taxRateBasisPoints: 825,
    });
    // Worked by hand: parts 499 + 1300 + 598.5→599 = 2398; labour 1.25 × 6500 = 8125; fee 3500 − credit 3500
    expect(e.lines.map((l) => l.amountCents)).toEqual([499, 1300, 599, 8125, 3500, -3500]);
    expect(e.partsCents).toBe(2398);
    expect(e.labourCents).toBe(8125);
    expect(e.diagnosticFeeCents).toBe(3500);
    expect(e.diagnosticCreditCents).toBe(3500);
    expect(e.subtotalCents).toBe(10523);
    // Worked by hand: 8.25 % of 2398 = 197.835 → 198; total 10523 + 198 = 10721
    expect(e.taxableCents).toBe(2398);
    expect(e.taxCents).toBe(198);
    expect(e.totalCents).toBe(10721);
    expect(e.lines.map((l) => l.kind)).toEqual(["part", "part", "part", "labour", "diagnostic_fee", "diagnostic_credit"]);
  });

  it("taxes labour and an uncredited fee when the shop says so", () => {
    const e = computeEstimate({
      ...base,
      parts: [{ description: "Carburettor kit", quantity: 1, unitPriceCents: 1999 }],
      labourHours: 0.5,
      labourRateCents: 7000,
      diagnosticFeeCents: 2500,
      taxRateBasisPoints: 725,
      taxLabour: true,
    });
    // Worked by hand: 1999 + 3500 + 2500 = 7999; 7.25 % of 7999 = 579.9275 → 580; total 8579
    expect(e.subtotalCents).toBe(7999);
    expect(e.diagnosticCreditCents).toBe(0);
    expect(e.taxCents).toBe(580);
    expect(e.totalCents).toBe(8579);
    expect(e.lines.filter((l) => l.kind === "diagnostic_credit")).toHaveLength(0);
  });

  it("rounds halves away from zero, not to even", () => {
    // Worked by hand: 0.5 × 5 = 2.5 → 3 (banker's rounding would give 2); 0.25 % of 200 = 0.5 → 1
    const e = computeEstimate({ ...base, parts: [{ description: "Washer", quantity: 0.5, unitPriceCents: 5 }, { description: "Pin", quantity: 1, unitPriceCents: 197 }], taxRateBasisPoints: 25 });
    expect(e.lines[0]?.amountCents).toBe(3);
    expect(e.taxCents).toBe(1);
    expect(ROUNDING_RULE).toMatch(/half away from zero/);
  });

  it("rounds exactly where floating point would not", () => {
    // Worked by hand: 1.005 × 100 = 100.5 → 101 (in floating point 1.005 × 100 is 100.4999…)
    const e = computeEstimate({ ...base, parts: [{ description: "Bar oil (L)", quantity: 1.005, unitPriceCents: 100 }] });
    expect(e.partsCents).toBe(101);
  });

  it("refuses negative or fractional cents, bad quantities and bad tax rates", () => {
    const part = (quantity: number, unitPriceCents: number) => ({ ...base, parts: [{ description: "Primer bulb", quantity, unitPriceCents }] });
    expect(() => computeEstimate(part(-1, 300))).toThrow(RangeError);
    expect(() => computeEstimate(part(0, 300))).toThrow(RangeError);
    expect(() => computeEstimate(part(1.0001, 300))).toThrow(/3 decimal places/);
    expect(() => computeEstimate(part(1, -300))).toThrow(RangeError);
    expect(() => computeEstimate(part(1, 2.5))).toThrow(/whole number of cents/);
    expect(() => computeEstimate(part(Number.NaN, 300))).toThrow(RangeError);
    expect(() => computeEstimate({ ...base, labourHours: -1, labourRateCents: 6000 })).toThrow(RangeError);
    expect(() => computeEstimate({ ...base, diagnosticFeeCents: 19.99 })).toThrow(RangeError);
    expect(() => computeEstimate({ ...base, taxRateBasisPoints: 8.25 })).toThrow(/basis points/);
    expect(() => computeEstimate({ ...base, parts: [{ description: " ", quantity: 1, unitPriceCents: 1 }] })).toThrow(/description/);
  });

  it("gives an empty estimate of zero", () => {
    const e = computeEstimate(base);
    expect(e.totalCents).toBe(0);
    expect(e.lines).toEqual([]);
  });
});

describe("repairOrReplace", () => {
  it("recommends considering replacement at exactly 50 %", () => {
    // Common practice (consumer advice, no published source): replace when the repair is 50 % or more of a new unit
    const r = repairOrReplace({ repairCents: 12500, replacementCents: 25000 });
    expect(r.sharePercent).toBe(50);
    expect(r.recommendation).toBe("consider_replacing");
    expect(r.sentence).toBe("The repair (125.00) is 50.0 % of a new unit (250.00): at or above the 50 % line, so consider replacing it.");
  });

  it("recommends the repair just under 50 %", () => {
    // Common practice (consumer advice, no published source): under half the price of a new unit, repair
    const r = repairOrReplace({ repairCents: 12499, replacementCents: 25000 });
    expect(r.recommendation).toBe("repair");
    expect(r.sentence).toContain("49.9 %");
  });

  it("says both amounts in the estimate's currency when it is given", () => {
    // Source: ISO 4217 (via ICU): USD and EUR have two minor digits, JPY none.
    expect(repairOrReplace({ repairCents: 1333, replacementCents: 24900, currency: "USD" }).sentence).toBe("The repair ($13.33) is 5.3 % of a new unit ($249.00): under the 50 % line, so repair it.");
    expect(repairOrReplace({ repairCents: 1333, replacementCents: 24900, currency: "EUR" }).sentence).toContain("(€13.33)");
    expect(repairOrReplace({ repairCents: 13330, replacementCents: 24900, currency: "JPY" }).sentence).toContain("(¥13,330)");
  });

  it("honours a shop's own threshold", () => {
    expect(repairOrReplace({ repairCents: 15000, replacementCents: 25000, thresholdPercent: 75 }).recommendation).toBe("repair");
    expect(() => repairOrReplace({ repairCents: 1, replacementCents: 0 })).toThrow(RangeError);
    expect(() => repairOrReplace({ repairCents: 1, replacementCents: 10, thresholdPercent: 0 })).toThrow(RangeError);
  });
});
