import { describe, expect, it } from "vitest";
import { FlowInvalidError, compileFlow, resolveSections } from "../../../shared/flow/compile.ts";
import { validateFlow } from "../../../shared/flow/validate.ts";
import { choice, finding, flow, instruction, sampleFlow, sampleSections, section, sectionStep } from "./fixtures.ts";

describe("compileFlow", () => {
  const compiled = compileFlow(sampleFlow, sampleSections);

  it("keeps the flow's id, title and appliesTo", () => {
    expect(compiled).toMatchObject({ id: sampleFlow.id, title: sampleFlow.title, appliesTo: sampleFlow.appliesTo, start: "start" });
  });

  it("inlines sections as caller/step, nesting the prefix, and leaves no section steps", () => {
    expect(Object.keys(compiled.steps)).toEqual(["start", "ask", "gap", "compression", "check/clean", "check/deeper/look", "check/deeper/worn", "close", "wide", "rings", "done"]);
    expect(Object.values(compiled.steps).some((s) => (s.kind as string) === "section")).toBe(false);
    expect(compiled.steps["check/deeper/look"]!.origin).toEqual({ section: "inner", stepId: "look" });
    expect(compiled.steps.ask!.origin).toEqual({ section: null, stepId: "ask" });
  });

  it("points a target at a section step to that section's first step, however deep", () => {
    const gap = compiled.steps.gap!;
    expect(gap.kind === "reading" && gap.bands?.map((b) => b.next)).toEqual(["close", "check/clean", "wide"]);
    const clean = compiled.steps["check/clean"]!;
    expect(clean.kind === "instruction" && clean.next).toBe("check/deeper/look");
  });

  it("rewires @continue to the calling step's next, through every level", () => {
    const look = compiled.steps["check/deeper/look"]!;
    // inner's @continue goes to outer's "deeper" next, which is outer's own @continue: the flow's "done".
    expect(look.kind === "choice" && look.options.map((o) => o.next)).toEqual(["done", "check/deeper/worn"]);
  });

  it("inlines a section once per call, under each caller's id", () => {
    const twice = compileFlow(flow({ first: sectionStep("inner", "second"), second: sectionStep("inner", "end"), end: finding() }), sampleSections);
    expect(Object.keys(twice.steps)).toEqual(["first/look", "first/worn", "second/look", "second/worn", "end"]);
    expect(twice.start).toBe("first/look");
    const first = twice.steps["first/look"]!;
    expect(first.kind === "choice" && first.options[0]!.next).toBe("second/look");
  });

  it("throws FlowInvalidError with every problem when the flow has an error", () => {
    const bad = flow({ a: choice({ yes: "ghost", no: "f" }), f: finding(), lost: instruction("f") });
    let thrown: unknown;
    try {
      compileFlow(bad, []);
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBeInstanceOf(FlowInvalidError);
    expect((thrown as FlowInvalidError).problems.map((p) => p.code).sort()).toEqual(["step_unreachable", "target_unknown"]);
    expect((thrown as Error).message).toContain("2 errors");
  });

  it("refuses a flow whose section includes itself", () => {
    const loop = section("loop", { again: sectionStep("loop", "@continue") });
    expect(() => compileFlow(flow({ a: sectionStep("loop", "f"), f: finding() }), [loop])).toThrow(FlowInvalidError);
  });

  it("compiles despite warnings", () => {
    expect(() => compileFlow(flow({ a: instruction("f"), f: finding("Bare", false) }), [])).not.toThrow();
  });
});

describe("resolveSections", () => {
  it("embeds exactly the sections the flow reaches, so the stored version compiles on its own", () => {
    const unused = section("unused", { x: instruction("@continue") });
    const stored = resolveSections(sampleFlow, [...sampleSections, unused]);
    expect(Object.keys(stored.sections ?? {}).sort()).toEqual(["inner", "outer"]);
    const roundTripped: unknown = JSON.parse(JSON.stringify(stored));
    expect(validateFlow(roundTripped, []).ok).toBe(true);
    expect(compileFlow(roundTripped, [])).toEqual(compileFlow(sampleFlow, sampleSections));
  });

  it("refuses a flow with errors", () => {
    expect(() => resolveSections(flow({ a: sectionStep("absent", "f"), f: finding() }), [])).toThrow(FlowInvalidError);
  });
});
