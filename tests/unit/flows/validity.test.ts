// The built-in flows are valid documents, and every finding in them is reachable through the real machine.
import { spawnSync } from "node:child_process";
import { describe, expect, it } from "vitest";
import type { CompiledFlow, CompiledStep } from "../../../shared/flow/compile.ts";
import type { Band } from "../../../shared/flow/schema.ts";
import { evaluateReading, type FlowInput } from "../../../shared/flow/step-rules.ts";
import { validateFlow, validateSection } from "../../../shared/flow/validate.ts";
import { atSeaLevel, compiled, flowFiles, loadFlow, loadSections, profiles, repoRoot, run, sectionFiles, type Move } from "./flow-fixtures.ts";

const inputs: Record<string, FlowInput> = {
  "handheld-2-stroke-no-start.json": atSeaLevel(profiles.handheld2),
  "handheld-4-stroke-no-start.json": atSeaLevel(profiles.handheld4),
  "walk-behind-mower-no-start.json": atSeaLevel(profiles.mower),
  "generator-no-start.json": atSeaLevel(profiles.generator),
};

function sampleIn(band: Band): number {
  const { from, to } = band;
  if (from && to) return (from.value + to.value) / 2;
  if (to) return to.value - 1;
  if (from) return from.value + 1;
  return 0;
}

// Cranking readings wide enough to meet every compression verdict for any of the profiles above.
const psiCandidates = [-5, 10, 20, 40, 65, 70, 80, 85, 100, 130, 900];

function ways(step: CompiledStep): Move[] {
  switch (step.kind) {
    case "instruction":
      return [[step.id, "done"]];
    case "choice":
      return step.options.map((o): Move => [step.id, o.value]);
    case "reading":
      if (step.bands) return step.bands.map((b): Move => [step.id, { value: sampleIn(b), unit: step.unit }]);
      return psiCandidates.map((value): Move => [step.id, { value, unit: step.unit }]);
    case "finding":
      return [];
  }
}

function nextOf(flow: CompiledFlow, [stepId, answer]: Move, input: FlowInput): string | null {
  const step = flow.steps[stepId]!;
  if (typeof answer !== "string") {
    const r = evaluateReading(step, answer.value, answer.unit, input);
    return r.ok ? r.next : null;
  }
  if (step.kind === "instruction") return step.next;
  if (step.kind === "choice") return step.options.find((o) => o.value === answer)?.next ?? null;
  return null;
}

/** Breadth-first: the shortest scripted visit to every step the flow can reach. */
function shortestVisits(flow: CompiledFlow, input: FlowInput): Map<string, Move[]> {
  const visits = new Map<string, Move[]>([[flow.start, []]]);
  const queue = [flow.start];
  for (let head = 0; head < queue.length; head++) {
    const id = queue[head]!;
    for (const move of ways(flow.steps[id]!)) {
      const next = nextOf(flow, move, input);
      if (next === null || visits.has(next)) continue;
      visits.set(next, [...visits.get(id)!, move]);
      queue.push(next);
    }
  }
  return visits;
}

describe("the built-in flow documents", () => {
  it("ship the four flows and six sections this release promises", () => {
    expect(flowFiles).toEqual(Object.keys(inputs).sort());
    expect(sectionFiles).toEqual(
      ["air-and-exhaust", "compression-check", "fuel-delivery", "prime-and-spray", "safety-and-reproduce", "spark-check"].map((s) => `${s}.json`),
    );
  });

  it.each(sectionFiles)("section %s validates with no problems at all", (file) => {
    const sections = loadSections();
    const section = sections[sectionFiles.indexOf(file)];
    const result = validateSection(section, sections);
    expect(result.problems).toEqual([]);
    expect(result.ok).toBe(true);
    expect(`${(section as { id: string }).id}.json`).toBe(file);
  });

  it.each(flowFiles)("flow %s validates with no problems at all", (file) => {
    const result = validateFlow(loadFlow(file), loadSections());
    expect(result.problems).toEqual([]);
    expect(result.ok).toBe(true);
    expect(`${result.definition?.id}.json`).toBe(file);
  });

  it.each(flowFiles)("every step of %s is reachable, and every finding is reached by replaying events through its machine", (file) => {
    const flow = compiled(file);
    const input = inputs[file]!;
    const visits = shortestVisits(flow, input);
    expect([...visits.keys()].sort()).toEqual(Object.keys(flow.steps).sort());
    const findings = Object.values(flow.steps).filter((s) => s.kind === "finding");
    expect(findings.length).toBeGreaterThanOrEqual(20);
    for (const finding of findings) {
      const end = run(flow, input, visits.get(finding.id)!);
      expect(end.status, finding.id).toBe("finding");
      expect(end.findingStepId).toBe(finding.id);
    }
  });

  it("covers each kind of equipment the brief names, with the right engine cycle", () => {
    const applies = flowFiles.map((f) => compiled(f).appliesTo);
    const covers = (kind: string, cycle: 2 | 4) => applies.some((a) => a.equipment.includes(kind as never) && a.cycle === cycle);
    for (const kind of ["string_trimmer", "chainsaw", "leaf_blower", "hedge_trimmer"]) {
      expect(covers(kind, 2), kind).toBe(true);
      expect(covers(kind, 4), kind).toBe(true);
    }
    expect(covers("walk_behind_mower", 4)).toBe(true);
    expect(covers("generator", 4)).toBe(true);
  });

  it("passes npm run flows:check", () => {
    const result = spawnSync("npm", ["run", "--silent", "flows:check"], { cwd: repoRoot, encoding: "utf8" });
    expect(result.stdout).toMatch(/^flows:check: 4 flows and 6 sections checked; all pass$/m);
    expect(result.stdout).not.toMatch(/warning|ERROR/);
    expect(result.status).toBe(0);
  }, 60_000);
});
