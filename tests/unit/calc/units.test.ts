import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  canonicalUnit,
  checkReading,
  convert,
  isUnit,
  preferredUnit,
  quantities,
  quantityOf,
  systemOf,
  unitLabel,
  unitsByQuantity,
  UnitError,
  type Unit,
} from "../../../shared/calc/units.ts";

describe("convert", () => {
  it("matches the NIST SP 811 pressure factors", () => {
    // Source: NIST SP 811 (2008), Appendix B.8, p. 53 — psi to kPa, 6.894 757 (exact 6.894 757 293 168...)
    expect(convert(1, "psi", "kPa")).toBeCloseTo(6.894757293168361, 12);
    // Source: NIST SP 811 (2008), Appendix B.8, p. 45; Table 9, p. 10 — bar to kPa, 100 exactly
    expect(convert(1, "bar", "kPa")).toBe(100);
    // Source: NIST SP 811 (2008), Appendix B.8, p. 45 — standard atmosphere is 101.325 kPa exactly
    expect(convert(101.325, "kPa", "bar")).toBeCloseTo(1.01325, 12);
    // From memory: NIST SP 811 (2008), Appendix B.8 — standard atmosphere to psi, 14.695 95
    expect(convert(101.325, "kPa", "psi")).toBeCloseTo(14.69595, 5);
  });

  it("matches the NIST SP 811 length and volume factors", () => {
    // Source: NIST SP 811 (2008), Appendix B.8, p. 50; NIST HB 44 C-8 — inch to mm, 25.4 exactly
    expect(convert(1, "in", "mm")).toBe(25.4);
    // Source: NIST SP 811 (2008), Appendix B.8, p. 52; NIST HB 44 C-12 — US fl oz to mL, 29.573 529 562 5 exactly
    expect(convert(1, "fl_oz_us", "mL")).toBeCloseTo(29.5735295625, 10);
    // Source: NIST SP 811 (2008), p. 50; NIST HB 44 C-12, C-17 — US gallon to L, 3.785 411 784 exactly
    expect(convert(1, "gal_us", "L")).toBeCloseTo(3.785411784, 12);
    // Source: NIST SP 811 (2008), pp. 50, 52; NIST HB 44 C-7 — imperial fl oz to mL, 28.413 062 5 exactly
    expect(convert(1, "fl_oz_imp", "mL")).toBeCloseTo(28.4130625, 10);
    // Source: NIST HB 44 C-12 — the US gallon is 128 US fluid ounces by definition
    expect(convert(1, "gal_us", "fl_oz_us")).toBeCloseTo(128, 10);
    // From memory: NIST HB 44 Appendix C — 1 litre is 33.814 US fluid ounces
    expect(convert(1, "L", "fl_oz_us")).toBeCloseTo(33.814, 3);
  });

  it("gives about 88.7 mL for an oil capacity of 3 US fl oz", () => {
    // Source: references.md §5, arithmetic on NIST SP 811 p. 52 — 3 × 29.573 529 562 5 = 88.720 588 687 5 mL
    expect(convert(3, "fl_oz_us", "mL")).toBeCloseTo(88.7205886875, 9);
    expect(convert(3, "fl_oz_us", "mL")).toBeCloseTo(88.7, 1);
  });

  it("matches the NIST SP 811 torque factors", () => {
    // Source: NIST SP 811 (2008), Appendix B.8, p. 53 — lbf·in to N·m, 0.112 984 8
    expect(convert(1, "lbf_in", "N_m")).toBeCloseTo(0.1129848, 7);
    // Source: NIST SP 811 (2008), Appendix B.8, p. 53 — lbf·ft to N·m, 1.355 818
    expect(convert(1, "lbf_ft", "N_m")).toBeCloseTo(1.355818, 6);
    // Arithmetic: 1 ft = 12 in, so 1 lbf·ft = 12 lbf·in
    expect(convert(1, "lbf_ft", "lbf_in")).toBeCloseTo(12, 10);
  });

  it("converts °F to °C by (t − 32) / 1.8", () => {
    // Source: NIST SP 811 (2008), Appendix B.8, p. 48; SP 330 (2019) eq. (10) — t/°C = (t/°F − 32) / 1.8
    expect(convert(212, "degF", "degC")).toBeCloseTo(100, 12);
    expect(convert(32, "degF", "degC")).toBeCloseTo(0, 12);
    expect(convert(-40, "degF", "degC")).toBeCloseTo(-40, 12);
    expect(convert(37, "degC", "degF")).toBeCloseTo(98.6, 12);
    // From memory: NIST SP 330 (2019) — absolute zero is −273.15 °C; by (t − 32) / 1.8 that is −459.67 °F
    expect(convert(-273.15, "degC", "degF")).toBeCloseTo(-459.67, 10);
  });

  it("converts the metric prefixes and minutes", () => {
    // From memory: NIST SP 811 (2008), §4.3 — the SI prefix kilo is 10^3
    expect(convert(2.5, "kohm", "ohm")).toBe(2500);
    expect(convert(15, "kV", "V")).toBe(15000);
    expect(convert(1500, "mL", "L")).toBe(1.5);
    // From memory: NIST SP 811 (2008), Table 6 — 1 min = 60 s
    expect(convert(2, "min", "s")).toBe(120);
  });

  it("round-trips every pair of units of one quantity", () => {
    fc.assert(
      fc.property(fc.constantFrom(...quantities), fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.nat(), fc.nat(), (q, v, i, j) => {
        const units = unitsByQuantity[q];
        const a = units[i % units.length] as Unit;
        const b = units[j % units.length] as Unit;
        expect(convert(convert(v, a, b), b, a)).toBeCloseTo(v, 6);
      }),
    );
  });

  it("refuses units of different quantities and unknown units with a UnitError", () => {
    expect(() => convert(1, "psi", "mm")).toThrow(UnitError);
    expect(() => convert(1, "degC", "N_m")).toThrow(/pressure|temperature/);
    expect(() => convert(1, "psig" as Unit, "kPa")).toThrow(UnitError);
  });
});

describe("unit metadata", () => {
  it("lists the canonical units", () => {
    expect(canonicalUnit).toEqual({
      pressure: "kPa", resistance: "ohm", length: "mm", voltage: "V", speed: "rpm",
      volume: "mL", time: "s", temperature: "degC", torque: "N_m",
    });
  });

  it("labels units for people", () => {
    expect(unitLabel("fl_oz_us")).toBe("US fl oz");
    expect(unitLabel("fl_oz_imp")).toBe("imp fl oz");
    expect(unitLabel("gal_us")).toBe("US gal");
    expect(unitLabel("degF")).toBe("°F");
    expect(unitLabel("lbf_ft")).toBe("lbf·ft");
    expect(unitLabel("N_m")).toBe("N·m");
    expect(unitLabel("kohm")).toBe("kΩ");
  });

  it("knows each unit's quantity and which strings are units", () => {
    for (const q of quantities) for (const u of unitsByQuantity[q]) expect(quantityOf(u)).toBe(q);
    expect(isUnit("psi")).toBe(true);
    expect(isUnit("PSI")).toBe(false);
    expect(isUnit("toString")).toBe(false);
  });

  it("picks the preferred unit per system", () => {
    expect(preferredUnit("pressure", "imperial")).toBe("psi");
    expect(preferredUnit("pressure", "metric")).toBe("kPa");
    expect(preferredUnit("volume", "imperial")).toBe("fl_oz_us");
    expect(preferredUnit("torque", "imperial")).toBe("lbf_ft");
    expect(preferredUnit("temperature", "imperial")).toBe("degF");
    expect(preferredUnit("speed", "imperial")).toBe("rpm");
    expect(preferredUnit("length", "metric")).toBe("mm");
  });

  it("tells which system a unit belongs to, and none for the units both share", () => {
    // From memory: psi, inches, fluid ounces, gallons, °F and pound-force torque are US customary/imperial; kPa, bar, mm, mL, L, °C and N·m metric.
    const imperial: Unit[] = ["psi", "in", "fl_oz_us", "fl_oz_imp", "gal_us", "degF", "lbf_in", "lbf_ft"];
    const metric: Unit[] = ["kPa", "bar", "mm", "mL", "L", "degC", "N_m"];
    const shared: Unit[] = ["ohm", "kohm", "V", "kV", "rpm", "s", "min"];
    expect([...imperial.map(systemOf), ...metric.map(systemOf), ...shared.map(systemOf)]).toEqual([...imperial.map(() => "imperial"), ...metric.map(() => "metric"), ...shared.map(() => null)]);
    expect(new Set([...imperial, ...metric, ...shared])).toEqual(new Set(quantities.flatMap((q) => unitsByQuantity[q])));
  });
});

describe("checkReading", () => {
  it("accepts a reading and gives its canonical value", () => {
    const r = checkReading({ quantity: "pressure", value: 100, unit: "psi" });
    // Source: NIST SP 811 (2008), Appendix B.8, p. 53 — 100 psi = 689.4757 kPa
    expect(r).toEqual({ ok: true, value: 100, unit: "psi", canonical: expect.closeTo(689.4757, 4) });
  });

  it("accepts a vacuum reading down to one atmosphere", () => {
    expect(checkReading({ quantity: "pressure", value: -14, unit: "psi" }).ok).toBe(true);
    expect(checkReading({ quantity: "pressure", value: -101.325, unit: "kPa" }).ok).toBe(true);
  });

  it("refuses non-numbers", () => {
    for (const value of [Number.NaN, Infinity, "12", null, undefined]) {
      const r = checkReading({ quantity: "pressure", value, unit: "psi" });
      expect(r).toMatchObject({ ok: false, code: "not_a_number" });
    }
  });

  it("refuses unknown units and units of another quantity", () => {
    expect(checkReading({ quantity: "pressure", value: 90, unit: "psig" })).toMatchObject({ ok: false, code: "unknown_unit" });
    const wrong = checkReading({ quantity: "pressure", value: 90, unit: "mm" });
    expect(wrong).toMatchObject({ ok: false, code: "wrong_quantity" });
    expect(wrong.ok ? "" : wrong.reason).toBe("mm measures length, not pressure.");
  });

  it("refuses a gauge pressure that means a negative absolute pressure", () => {
    // Source: NIST SP 811 (2008), B.8, p. 45 — one standard atmosphere is 101.325 kPa (14.696 psi)
    const r = checkReading({ quantity: "pressure", value: -15, unit: "psi" });
    expect(r).toMatchObject({ ok: false, code: "out_of_range" });
    expect(r.ok ? "" : r.reason).toMatch(/^-15 psi is below -14\.6959 psi: .*negative absolute pressure\.$/);
    expect(checkReading({ quantity: "pressure", value: -102, unit: "kPa" })).toMatchObject({ code: "out_of_range" });
    expect(checkReading({ quantity: "pressure", value: 8000, unit: "kPa" })).toMatchObject({ code: "out_of_range" });
  });

  it("refuses temperatures below absolute zero and negative lengths, resistances and speeds", () => {
    // From memory: NIST SP 330 (2019) — absolute zero is −273.15 °C (−459.67 °F)
    expect(checkReading({ quantity: "temperature", value: -460, unit: "degF" })).toMatchObject({ code: "out_of_range" });
    expect(checkReading({ quantity: "temperature", value: -459, unit: "degF" }).ok).toBe(true);
    expect(checkReading({ quantity: "resistance", value: -1, unit: "kohm" })).toMatchObject({ code: "out_of_range" });
    expect(checkReading({ quantity: "length", value: -0.01, unit: "in" })).toMatchObject({ code: "out_of_range" });
    expect(checkReading({ quantity: "speed", value: -300, unit: "rpm" })).toMatchObject({ code: "out_of_range" });
    expect(checkReading({ quantity: "volume", value: -1, unit: "mL" })).toMatchObject({ code: "out_of_range" });
  });
});
