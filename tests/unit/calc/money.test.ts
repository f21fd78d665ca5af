import { describe, expect, it } from "vitest";
import { formatMoney, formatQuantity, formatRate } from "../../../shared/calc/money.ts";
import { safetyNotesFor } from "../../../shared/report/safety.ts";

describe("the report's money and figures", () => {
  it("formats minor units in the currency's own decimals", () => {
    expect(formatMoney(33807, "USD")).toBe("$338.07");
    expect(formatMoney(-4500, "USD")).toBe("-$45.00");
    expect(formatMoney(123456789, "USD")).toBe("$1,234,567.89");
    // Source: ISO 4217, the yen has no minor unit, so its amounts are stored whole.
    expect(formatMoney(1500, "JPY")).toBe("¥1,500");
  });

  it("writes quantities and tax rates without trailing zeros", () => {
    expect(formatQuantity(0.5)).toBe("0.5");
    expect(formatQuantity(1.25)).toBe("1.25");
    expect(formatQuantity(2)).toBe("2");
    expect(formatRate(725)).toBe("7.25 %");
    expect(formatRate(800)).toBe("8 %");
  });
});

describe("the report's safety notes", () => {
  it("gives every kind the fuel WARNING and puts the most severe panel first", () => {
    // Source: ANSI Z535.4 signal words, DANGER above WARNING above CAUTION.
    expect(safetyNotesFor("chainsaw").map((n) => n.signal)).toEqual(["WARNING", "CAUTION"]);
    expect(safetyNotesFor("leaf_blower").map((n) => n.signal)).toEqual(["WARNING", "CAUTION"]);
    expect(safetyNotesFor("generator").map((n) => n.signal)).toEqual(["DANGER", "WARNING"]);
    for (const note of safetyNotesFor("walk_behind_mower")) expect(note.text).toMatch(/Follow the manufacturer's manual/);
  });
});
