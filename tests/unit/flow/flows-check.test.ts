import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { checkFlowsFolder, formatReport } from "../../../server/tools/flows-check.ts";
import { choice, finding, flow, instruction, sectionStep, section } from "./fixtures.ts";

function folder(files: Record<string, unknown>): string {
  const dir = mkdtempSync(join(tmpdir(), "flows-check-"));
  mkdirSync(join(dir, "sections"));
  for (const [name, content] of Object.entries(files)) writeFileSync(join(dir, name), typeof content === "string" ? content : JSON.stringify(content));
  return dir;
}

const safety = section("safety", { look: choice({ ok: "@continue", unsafe: "stop" }), stop: finding("Unsafe to test") });

describe("flows:check", () => {
  it("passes a folder that holds only sections so far", () => {
    const { lines, failed } = formatReport(checkFlowsFolder(folder({ "sections/safety.json": safety })));
    expect(failed).toBe(false);
    expect(lines).toEqual(["flows:check: 0 flows and 1 section checked; all pass"]);
  });

  it("passes with warnings printed, and fails on an error with file, step, code and message", () => {
    const dir = folder({
      "sections/safety.json": safety,
      "good.json": flow({ a: sectionStep("safety", "f"), f: finding("Bare", false) }, "a", "good"),
      "bad.json": flow({ a: instruction("ghost"), f: finding() }, "a", "bad"),
    });
    const report = checkFlowsFolder(dir);
    expect(report.problems.map((p) => [p.file, p.stepId, p.code, p.severity])).toEqual([
      ["bad.json", "a", "target_unknown", "error"],
      ["bad.json", "a", "no_finding_reachable", "error"],
      ["bad.json", "f", "step_unreachable", "error"],
      ["good.json", "f", "finding_without_repairs", "warning"],
    ]);
    const { lines, failed } = formatReport(report);
    expect(failed).toBe(true);
    expect(lines[0]).toBe('ERROR    bad.json  a  target_unknown  next goes to "ghost", which is not a step');
    expect(lines.at(-1)).toBe("flows:check: 2 flows and 1 section checked; 3 failing, 1 warning");
  });

  it("reports a file that is not JSON, a duplicate section id, and a section filed under another name", () => {
    const dir = folder({ "sections/safety.json": safety, "sections/other.json": safety, "broken.json": "{ not json" });
    const problems = checkFlowsFolder(dir).problems.map((p) => [p.file, p.severity, p.message.replace(/:.*/, "")]);
    expect(problems).toEqual([
      ["sections/other.json", "warning", "the file of section \"safety\" should be named safety.json"],
      ["sections/safety.json", "error", 'section id "safety" is already used by sections/other.json'],
      ["broken.json", "error", "not valid JSON"],
    ]);
  });

  it("passes the repository's own flows", () => {
    const { failed } = formatReport(checkFlowsFolder(join(import.meta.dirname, "../../../flows")));
    expect(failed).toBe(false);
  });
});
