import { describe, expect, it } from "vitest";
import { checkRange, quickRanges, rangeFromParams } from "../../../src/features/insight/lib/range.ts";

const quick = (id: string, today: string) => quickRanges.find((q) => q.id === id)!.range(today);

describe("quick ranges", () => {
  it("end today and count today in", () => {
    // From memory: 29 days before 1 March 2026 is 31 January (28 days in February 2026), 89 days before is 2 December 2025.
    expect(quick("last-30", "2026-03-01")).toEqual({ from: "2026-01-31", to: "2026-03-01" });
    expect(quick("last-90", "2026-03-01")).toEqual({ from: "2025-12-02", to: "2026-03-01" });
    expect(quick("this-year", "2026-03-01")).toEqual({ from: "2026-01-01", to: "2026-03-01" });
  });

  it("cross a leap day", () => {
    // From memory: 2028 is a leap year, so 29 days before 1 March 2028 is 1 February.
    expect(quick("last-30", "2028-03-01")).toEqual({ from: "2028-02-01", to: "2028-03-01" });
  });
});

describe("rangeFromParams", () => {
  it("reads the address, falling back to the last 90 days for a missing end", () => {
    expect(rangeFromParams(new URLSearchParams("from=2026-01-05&to=2026-02-01"), "2026-05-20")).toEqual({ from: "2026-01-05", to: "2026-02-01" });
    expect(rangeFromParams(new URLSearchParams(""), "2026-05-20")).toEqual({ from: "2026-02-20", to: "2026-05-20" });
    expect(rangeFromParams(new URLSearchParams("from=2026-04-01"), "2026-05-20")).toEqual({ from: "2026-04-01", to: "2026-05-20" });
  });
});

describe("checkRange", () => {
  it("passes a good range, one day included", () => {
    expect(checkRange("2026-03-01", "2026-03-01")).toEqual({ range: { from: "2026-03-01", to: "2026-03-01" }, errors: {} });
  });

  it("puts each problem on the field it is about", () => {
    expect(checkRange("2026-03-31", "2026-03-01").errors).toEqual({ to: "The last day must be on or after the first day." });
    expect(checkRange("", "2026-03-01").errors).toEqual({ from: "Enter the first day as a full date." });
    expect(checkRange("2026-03-01", "31/03/2026").errors).toEqual({ to: "Enter the last day as a full date." });
    expect(checkRange("2020-01-01", "2026-03-01").errors).toEqual({ from: "Choose at most 1098 days (about three years)." });
    expect(checkRange("2026-03-01", "2026-03-31").range).not.toBeNull();
  });
});
