import { describe, expect, it } from "vitest";
import { formatMinutes, formatRange, formatShare, roundMinutes, sharePercent } from "../../../src/features/insight/lib/format.ts";

describe("formatMinutes", () => {
  it.each([
    [18, "18 min"],
    [18.4, "18 min"],
    [59.4, "59 min"],
    [59.6, "1 h 00 min"],
    [65, "1 h 05 min"],
    [125.2, "2 h 05 min"],
    [0, "0 min"],
    [0.3, "under 1 min"],
  ])("writes %d minutes as %s", (minutes, text) => {
    expect(formatMinutes(minutes)).toBe(text);
  });
});

describe("formatShare", () => {
  it.each<[number | null, string]>([
    [0.225, "23%"],
    [3 / 22, "14%"],
    [0, "0%"],
    [1, "100%"],
    [0.001, "under 1%"],
    [0.998, "over 99%"],
    [null, "none reviewed"],
  ])("writes %s as %s", (share, text) => {
    expect(formatShare(share)).toBe(text);
  });

  it("gives the CSV the same whole percentage", () => {
    expect(sharePercent(3 / 22)).toBe(14);
    expect(sharePercent(null)).toBeNull();
    expect(roundMinutes(18.25)).toBe(18.3);
  });
});

describe("formatRange", () => {
  it("writes whole days, one day once", () => {
    expect(formatRange({ from: "2026-03-01", to: "2026-03-31" })).toBe("1 Mar 2026 to 31 Mar 2026");
    expect(formatRange({ from: "2026-03-01", to: "2026-03-01" })).toBe("1 Mar 2026");
  });
});
