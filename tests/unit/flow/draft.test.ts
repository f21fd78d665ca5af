import { describe, expect, it } from "vitest";
import { draftProblems, errorCount, starterDefinition } from "../../../shared/flow/draft.ts";
import { compileFlow } from "../../../shared/flow/compile.ts";
import { flow, finding } from "./fixtures.ts";

describe("starterDefinition", () => {
  it("is a flow that compiles, with only the warning that its finding lists no repairs", () => {
    const d = starterDefinition("pull-cord-stuck", "Pull cord will not pull");
    expect(d).toMatchObject({ formatVersion: 1, id: "pull-cord-stuck", title: "Pull cord will not pull", start: "finding" });
    expect(draftProblems("pull-cord-stuck", d, []).map((p) => [p.code, p.severity])).toEqual([["finding_without_repairs", "warning"]]);
    expect(() => compileFlow(d)).not.toThrow();
  });
});

describe("draftProblems", () => {
  it("adds an error when the definition names another flow, or none", () => {
    const other = flow({ end: finding() }, "end", "another-flow");
    const problems = draftProblems("my-flow", other, []);
    expect(problems[0]).toMatchObject({ stepId: null, code: "flow_id_mismatch", severity: "error" });
    expect(problems[0]!.message).toContain('"another-flow"');
    expect(errorCount(problems)).toBe(1);
    expect(draftProblems("my-flow", {}, []).map((p) => p.code)).toContain("flow_id_mismatch");
    expect(draftProblems("another-flow", other, [])).toEqual([]);
  });

  it("reports the validator's problems on an unfinished draft without throwing", () => {
    const problems = draftProblems("my-flow", { id: "my-flow", steps: "nope" }, []);
    expect(problems.every((p) => p.code !== "flow_id_mismatch")).toBe(true);
    expect(errorCount(problems)).toBeGreaterThan(0);
  });
});
