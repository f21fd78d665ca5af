// How the built-in flows read at the bench: plain trade words, findings a customer can be told, photos and time.
import { describe, expect, it } from "vitest";
import type { CompiledStep } from "../../../shared/flow/compile.ts";
import { actionSteps, compiled, flowFiles, stepText } from "./flow-fixtures.ts";

const flows = flowFiles.map((file) => [file, compiled(file)] as const);
const findingsOf = (steps: Record<string, CompiledStep>) =>
  Object.values(steps).filter((s): s is Extract<CompiledStep, { kind: "finding" }> => s.kind === "finding");

// Words a question or a statement starts with; an instruction starts with a verb instead.
const NOT_IMPERATIVE = /^(the|a|an|this|it|is|are|does|do|was|were|what|which|how|why|when|where|you|we)\b/i;

describe.each(flows)("wording of %s", (_file, flow) => {
  it("gives instructions in the imperative and choices as questions", () => {
    // Source: design.md point 10 — instructions in the imperative, choices as questions.
    for (const step of actionSteps(flow)) {
      if (step.kind === "choice") expect(step.title, step.id).toMatch(/\?$/);
      if (step.kind === "instruction" || step.kind === "reading") {
        expect(step.title, step.id).not.toMatch(/[?.]$/);
        expect(step.title, step.id).not.toMatch(NOT_IMPERATIVE);
      }
    }
  });

  it("states each finding as sentences a customer could be told, with repairs and follow-up checks", () => {
    // Source: design.md point 10 — findings as a sentence a customer could be told.
    const findings = findingsOf(flow.steps);
    for (const f of findings) {
      expect(f.title, f.id).not.toMatch(/\?$/);
      expect(f.explanation, f.id).toMatch(/^[A-Z].*\.$/s);
      expect(f.explanation, f.id).not.toMatch(/\b(step|tap|Benchpath|the app)\b/i);
      expect(f.repairs.length, f.id).toBeGreaterThan(0);
      for (const r of f.repairs) expect(r.labourHours, `${f.id}: ${r.title}`).toBeGreaterThan(0);
      expect(f.followUp?.length ?? 0, f.id).toBeGreaterThan(0);
    }
  });

  it("asks for the photos a shop reviews: the unit as received, the gauge, the fuel lines before removal", () => {
    // Common practice (no published source; trade.md): a photo of the unit as received, and photos before disassembly
    // of linkage holes and fuel-line routing.
    const photo = (id: string) => flow.steps[id]?.photo;
    expect(photo("prepare/as-received")?.requirement).toBe("required");
    expect(photo("compression/reading")?.requirement).toBe("required");
    expect(photo("compression/reading-after-bolts")?.requirement).toBe("required");
    expect(photo("prime/fuel/photos")?.requirement).toBe("required");
    expect(photo("prime/fuel/photos")?.prompt).toMatch(/fuel-line routing.*before removal/i);
    expect(photo("spark/plug-remove")?.prompt).toMatch(/firing end/i);
    const order = Object.keys(flow.steps);
    expect(order.indexOf("prime/fuel/photos")).toBeLessThan(order.indexOf("prime/fuel/carb"));
  });

  it("says where a test misleads", () => {
    // Common practice (no published source): an inline tester flashes with a fouled plug; a compression release reads low;
    // gauge hose volume reads tiny engines low; readings fall with altitude (trade.md, references.md section 5).
    expect(flow.steps["spark/flash"]?.misleads).toMatch(/fouled/i);
    const gauge = flow.steps["compression/reading"]?.misleads ?? "";
    expect(gauge).toMatch(/compression release/i);
    expect(gauge).toMatch(/hose/i);
    expect(gauge).toMatch(/altitude/i);
    expect(flow.steps["spark/air-gap"]?.misleads).toMatch(/non-magnetic/i);
    expect(flow.steps["prime/result"]?.misleads).toBeTruthy();
  });

  it("puts a plausible minimum time on the steps that take real time", () => {
    // Common practice (no published source): draining a tank, taking off a carburettor or a flywheel, setting valves or
    // a module gap, and pressure-testing a crankcase each take minutes, not seconds.
    const slow = /\b(drain|remove the carburettor|remove the flywheel|valve clearances|pressure- and vacuum-test|set the air gap|tip the mower)\b/i;
    const timed = actionSteps(flow).filter((s) => s.kind === "instruction" && slow.test(s.title));
    expect(timed.length).toBeGreaterThan(4);
    for (const step of timed) expect(step.kind === "instruction" && (step.minSeconds ?? 0), step.id).toBeGreaterThanOrEqual(60);
  });

  it("keeps the air-gap bands on the common 0.25-0.36 mm range", () => {
    // Common practice (no published source, references.md section 5): ignition module air gap about 0.010-0.014 in
    // (0.25-0.36 mm).
    const gap = flow.steps["spark/air-gap"];
    expect(gap?.kind).toBe("reading");
    if (gap?.kind !== "reading") return;
    expect(gap.unit).toBe("mm");
    const good = gap.bands?.filter((b) => b.verdict === "good") ?? [];
    expect(good.map((b) => [b.from?.value, b.to?.value])).toEqual([[0.25, 0.36]]);
    expect(stepText(gap)).toMatch(/0\.010-0\.014 in/);
    expect(stepText(gap)).toMatch(/manual/i);
  });
});
