import { describe, expect, it } from "vitest";
import { MAX_STEPS, type FlowStep } from "../../../shared/flow/schema.ts";
import { validateFlow, validateSection, type Problem } from "../../../shared/flow/validate.ts";
import {
  choice,
  compressionReading,
  finding,
  flow,
  gapBands,
  gapReading,
  instruction,
  sampleFlow,
  sampleSections,
  section,
  sectionStep,
} from "./fixtures.ts";

const codes = (problems: Problem[]) => [...new Set(problems.map((p) => p.code))].sort();
const only = (problems: Problem[], code: string) => problems.filter((p) => p.code === code);

describe("validateFlow on a sound flow", () => {
  it("accepts the sample flow with its sections and returns the parsed definition and sections", () => {
    const result = validateFlow(sampleFlow, sampleSections);
    expect(result.problems).toEqual([]);
    expect(result.ok).toBe(true);
    expect(result.definition?.steps.start).toEqual(sampleFlow.steps.start);
    expect(Object.keys(result.sections ?? {}).sort()).toEqual(["inner", "outer"]);
  });

  it("takes sections as a record keyed by id as well as a list", () => {
    expect(validateFlow(sampleFlow, { inner: sampleSections[0]!, outer: sampleSections[1]! }).ok).toBe(true);
  });

  it("walks a 20,000-step chain without running out of stack", () => {
    const steps: Record<string, FlowStep> = {};
    for (let i = 0; i < MAX_STEPS - 1; i++) steps[`s${i}`] = instruction(i + 1 < MAX_STEPS - 1 ? `s${i + 1}` : "end");
    steps.end = finding();
    expect(validateFlow(flow(steps, "s0"), []).ok).toBe(true);
  });
});

describe("each problem, from a flow that has just that one", () => {
  const cases: Array<[string, unknown, Problem["severity"], string | null]> = [
    ["schema_invalid", flow({ a: { kind: "instruction", next: "f" } as unknown as FlowStep, f: finding() }), "error", "a"],
    ["start_missing", flow({ f: finding() }, "nowhere"), "error", null],
    ["target_unknown", flow({ a: choice({ yes: "f", no: "ghost" }), f: finding() }), "error", "a"],
    ["continue_in_flow", flow({ a: choice({ yes: "f", no: "@continue" }), f: finding() }), "error", "a"],
    ["step_unreachable", flow({ a: instruction("f"), f: finding(), lost: finding("Never shown") }), "error", "lost"],
    ["option_duplicate", flow({ a: { kind: "choice", title: "Q", options: [{ value: "yes", label: "Yes", next: "f" }, { value: "yes", label: "Also yes", next: "f" }] }, f: finding() }), "error", "a"],
    ["caution_text_missing", flow({ a: instruction("f", { cautions: [{ signal: "DANGER" }] }), f: finding() }), "error", "a"],
    ["finding_without_repairs", flow({ a: instruction("f"), f: finding("Bare", false) }), "warning", "f"],
    ["unit_unknown", flow({ a: gapReading(gapBands("f", "f", "f"), "furlong"), f: finding() }), "error", "a"],
    ["unit_quantity_mismatch", flow({ a: gapReading(gapBands("f", "f", "f"), "psi"), f: finding() }), "error", "a"],
    ["reading_outcome_conflict", flow({ a: { ...compressionReading({ good: "f", marginal: "f", low: "f", implausible: "f" }), bands: [{ from: null, to: null, label: "Any", verdict: "good", next: "f" }] } as FlowStep, f: finding() }), "error", "a"],
    ["evaluation_quantity_mismatch", flow({ a: { ...compressionReading({ good: "f", marginal: "f", low: "f", implausible: "f" }), quantity: "length", unit: "mm" } as FlowStep, f: finding() }), "error", "a"],
    ["section_missing", flow({ a: sectionStep("absent", "f"), f: finding() }), "error", "a"],
    ["section_never_continues", flow({ a: sectionStep("dead-end", "f"), f: finding() }), "warning", "a"],
  ];
  const library = [section("dead-end", { look: instruction("stop"), stop: finding() })];

  it.each(cases)("%s", (code, input, severity, stepId) => {
    const result = validateFlow(input, library);
    expect(codes(result.problems)).toEqual(code === "section_never_continues" ? [code, "step_unreachable"] : [code]);
    const problem = only(result.problems, code)[0]!;
    expect(problem.severity).toBe(severity);
    expect(problem.stepId).toBe(stepId);
    expect(problem.message.length).toBeGreaterThan(10);
    expect(result.ok).toBe(severity === "warning" && code !== "section_never_continues");
  });

  it("step_id_invalid, and every target naming it fails the schema too", () => {
    const result = validateFlow(flow({ a: instruction("Bad_Id"), Bad_Id: instruction("f"), f: finding() }), []);
    expect(result.problems.map((p) => [p.code, p.stepId])).toEqual([
      ["schema_invalid", "a"],
      ["step_id_invalid", "Bad_Id"],
    ]);
  });

  it("no_finding_reachable: a loop with no way out, on every step of it", () => {
    const result = validateFlow(flow({ a: instruction("b"), b: choice({ again: "a", still: "b" }) }), []);
    expect(codes(result.problems)).toEqual(["no_finding_reachable"]);
    expect(result.problems.map((p) => p.stepId).sort()).toEqual(["a", "b"]);
  });

  it("allows a loop that has a way out", () => {
    expect(validateFlow(flow({ a: instruction("b"), b: choice({ again: "a", out: "f" }), f: finding() }), []).ok).toBe(true);
  });

  it("reading_outcome_missing, and the reading then leads nowhere", () => {
    const result = validateFlow(flow({ a: { kind: "reading", title: "Read", quantity: "length", unit: "mm" }, f: finding() }), []);
    expect(codes(result.problems)).toEqual(["no_finding_reachable", "reading_outcome_missing", "step_unreachable"]);
  });

  it("too_many_steps, before inlining", () => {
    const steps: Record<string, FlowStep> = { f: finding() };
    for (let i = 0; i < MAX_STEPS; i++) steps[`s${i}`] = instruction("f");
    expect(codes(validateFlow(flow(steps, "s0"), []).problems)).toEqual(["too_many_steps"]);
  });

  it("too_many_steps, once sections are inlined", () => {
    const inner: Record<string, FlowStep> = {};
    for (let i = 0; i < 200; i++) inner[`i${i}`] = instruction(i < 199 ? `i${i + 1}` : "@continue");
    const steps: Record<string, FlowStep> = {};
    for (let i = 0; i <= MAX_STEPS / 200; i++) steps[`c${i}`] = sectionStep("wide", i < MAX_STEPS / 200 ? `c${i + 1}` : "f");
    steps.f = finding();
    const result = validateFlow(flow(steps, "c0"), [section("wide", inner)]);
    expect(codes(result.problems)).toEqual(["too_many_steps"]);
  });
});

describe("cautions", () => {
  it("a WARNING with blank text is an error; a NOTICE without text only a warning", () => {
    const result = validateFlow(flow({ a: instruction("f", { cautions: [{ signal: "WARNING", text: "  " }, { signal: "NOTICE" }] }), f: finding() }), []);
    expect(result.problems.map((p) => [p.code, p.severity])).toEqual([
      ["caution_text_missing", "error"],
      ["caution_text_missing", "warning"],
    ]);
  });
});

describe("sections", () => {
  it("reports a problem inside a section on the flow step that calls it", () => {
    const broken = section("broken", { look: instruction("@continue", { cautions: [{ signal: "DANGER" }] }) });
    const result = validateFlow(flow({ check: sectionStep("broken", "f"), f: finding() }), [broken]);
    expect(result.problems).toEqual([expect.objectContaining({ stepId: "check", code: "caution_text_missing" })]);
    expect(result.problems[0]!.message).toContain('section "broken", step "look"');
  });

  it("finds a section that includes itself directly", () => {
    const loop = section("loop", { again: sectionStep("loop", "@continue") });
    const result = validateSection(loop, [loop]);
    expect(codes(result.problems)).toEqual(["section_cycle"]);
    expect(result.problems[0]!.message).toContain('"loop" → "loop"');
  });

  it("finds a section that includes itself through others, from the flow too", () => {
    const a = section("a", { go: sectionStep("b", "@continue") });
    const b = section("b", { go: sectionStep("c", "@continue") });
    const c = section("c", { go: sectionStep("a", "@continue") });
    const own = validateSection(a, [a, b, c]);
    expect(codes(own.problems)).toEqual(["section_cycle"]);
    expect(own.problems[0]!.message).toContain('"a" → "b" → "c" → "a"');
    const fromFlow = validateFlow(flow({ start: sectionStep("a", "f"), f: finding() }), [a, b, c]);
    expect(codes(fromFlow.problems)).toEqual(["section_cycle"]);
    expect(fromFlow.problems[0]!.stepId).toBe("start");
  });

  it("lets a section use @continue but needs a way out of every step", () => {
    expect(validateSection(section("fine", { a: choice({ ok: "@continue", bad: "f" }), f: finding() }), []).ok).toBe(true);
    const stuck = validateSection(section("stuck", { a: choice({ ok: "@continue", spin: "b" }), b: instruction("b") }), []);
    expect(stuck.problems).toEqual([expect.objectContaining({ code: "no_finding_reachable", stepId: "b" })]);
    expect(stuck.problems[0]!.message).toContain("@continue");
  });

  it("prefers sections embedded in a stored flow over the library", () => {
    const embedded = { ...flow({ a: sectionStep("s", "f"), f: finding() }), sections: { s: section("s", { x: instruction("@continue") }) } };
    const brokenLibraryCopy = section("s", { x: instruction("nowhere") });
    expect(validateFlow(embedded, [brokenLibraryCopy]).ok).toBe(true);
  });
});

describe("every problem at once", () => {
  it("reports each of several problems, not just the first", () => {
    const input = flow({
      a: choice({ yes: "ghost", no: "b" }),
      b: gapReading(gapBands("f", "f", "f").slice(1), "furlong"),
      f: finding("Bare", false),
      lost: instruction("f"),
    });
    expect(codes(validateFlow(input, []).problems)).toEqual(["band_start_bounded", "finding_without_repairs", "step_unreachable", "target_unknown", "unit_unknown"]);
  });

  it("still checks the graph around a step that fails its schema", () => {
    const input = flow({ a: instruction("b"), b: { kind: "instruction", title: 7, next: "c" } as unknown as FlowStep, c: finding(), lost: finding() });
    expect(codes(validateFlow(input, []).problems)).toEqual(["schema_invalid", "step_unreachable"]);
  });
});

describe("garbage in", () => {
  it.each([null, undefined, 3, "flow", [], [1, 2], { steps: [] }, { formatVersion: 2 }])("reports %j without throwing", (input) => {
    const result = validateFlow(input, []);
    expect(result.ok).toBe(false);
    expect(result.problems.length).toBeGreaterThan(0);
    expect(validateSection(input, []).ok).toBe(false);
  });

  it("treats a library that is not a list or record as empty", () => {
    expect(codes(validateFlow(flow({ a: sectionStep("s", "f"), f: finding() }), 42 as never).problems)).toEqual(["section_missing"]);
  });
});
