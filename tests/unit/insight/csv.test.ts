import { describe, expect, it } from "vitest";
import { csvFileName, toCsv } from "../../../src/features/insight/lib/csv.ts";

describe("toCsv", () => {
  it("writes plain fields as they are, each record ending in CRLF", () => {
    // Source: RFC 4180, section 2, rules 1-3: records separated by CRLF, an optional header line of the same format.
    expect(toCsv(["Tech", "Sessions"], [["Ines Calloway", 30], ["Oren Blakely", 0]])).toBe("Tech,Sessions\r\nInes Calloway,30\r\nOren Blakely,0\r\n");
  });

  it("quotes fields holding a comma, a double quote or a line break, and doubles inner quotes", () => {
    // Source: RFC 4180, section 2, rules 6 and 7.
    expect(toCsv(["Finding"], [["Needle worn, float stuck"], ['The "quick" fix'], ["Line one\nline two"], ["Ends in CR\r"]])).toBe(
      'Finding\r\n"Needle worn, float stuck"\r\n"The ""quick"" fix"\r\n"Line one\nline two"\r\n"Ends in CR\r"\r\n',
    );
  });

  it("leaves other characters unquoted, spaces and accents included", () => {
    // Source: RFC 4180, section 2, rule 4: spaces are part of a field and shall not be ignored.
    expect(toCsv(["Name"], [["  Tomás Reyes "], ["semi;colon"], ["it's"]])).toBe("Name\r\n  Tomás Reyes \r\nsemi;colon\r\nit's\r\n");
  });

  it("writes a missing figure as an empty field and keeps every row as wide as the header", () => {
    expect(toCsv(["Tech", "Rate", "Flags"], [["Pia Nakamura", null, 0]])).toBe("Tech,Rate,Flags\r\nPia Nakamura,,0\r\n");
  });

  it("quotes a header the same way as the data", () => {
    expect(toCsv(['Rate, "sent back"'], [])).toBe('"Rate, ""sent back"""\r\n');
  });
});

describe("csvFileName", () => {
  it("names the table and the range", () => {
    expect(csvFileName("Sent back and flagged, per tech", { from: "2026-01-01", to: "2026-03-31" })).toBe("benchpath-sent-back-and-flagged-per-tech-2026-01-01-to-2026-03-31.csv");
  });
});
