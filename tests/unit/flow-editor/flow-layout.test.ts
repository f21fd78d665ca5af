import { describe, expect, it } from "vitest";
import type { Problem } from "../../../shared/flow/problems.ts";
import { validateFlow } from "../../../shared/flow/validate.ts";
import { exitsOf, layoutFlow, readFlowMap, type MapEdge, type MapNode } from "../../../src/features/flows/lib/flow-layout.ts";
import { compressionReading, finding, flow, gapBands, gapReading, instruction } from "../flow/fixtures.ts";

const edgesFrom = (edges: MapEdge[], stepId: string) => edges.filter((e) => e.source === `step:${stepId}`).map((e) => [e.label, e.target]);
const stepOf = (nodes: MapNode[], stepId: string) => {
  const node = nodes.find((n) => n.type === "step" && n.step.stepId === stepId);
  if (node?.type !== "step") throw new Error(`no node for step ${stepId}`);
  return node.step;
};

// A no-spark branch with every kind of step; "plug-gap" sends its high band to a step nobody wrote yet.
const draft = flow(
  {
    "check-spark": {
      kind: "choice",
      title: "Is there a spark at the plug?",
      options: [
        { value: "yes", label: "Strong blue spark", next: "compression" },
        { value: "no", label: "No spark", next: "plug-gap" },
      ],
    },
    compression: compressionReading({ good: "fuel", marginal: "fuel", low: "worn-rings", implausible: "compression" }),
    "plug-gap": gapReading(gapBands("coil", "coil", "regap-plug")),
    coil: { kind: "section", title: "Test the coil", section: "coil-test", next: "worn-rings" },
    fuel: instruction("worn-rings"),
    "worn-rings": finding("Worn rings"),
  },
  "check-spark",
);

describe("readFlowMap", () => {
  it("draws one node per step and one stand-in for each target that names no step", () => {
    const { nodes } = readFlowMap(draft, []);
    expect(nodes.filter((n) => n.type === "step").map((n) => n.id)).toEqual(["step:check-spark", "step:compression", "step:plug-gap", "step:coil", "step:fuel", "step:worn-rings"]);
    expect(nodes.filter((n) => n.type !== "step")).toEqual([{ id: "missing:regap-plug", type: "missing", target: "regap-plug" }]);
  });

  it("names each kind in words and marks the start step", () => {
    const { nodes } = readFlowMap(draft, []);
    expect(["check-spark", "compression", "coil", "fuel", "worn-rings"].map((id) => stepOf(nodes, id).kindWord)).toEqual(["Choice", "Reading", "Section", "Instruction", "Finding"]);
    expect(stepOf(nodes, "check-spark").isStart).toBe(true);
    expect(stepOf(nodes, "fuel").isStart).toBe(false);
  });

  it("labels choice edges with their option labels", () => {
    expect(edgesFrom(readFlowMap(draft, []).edges, "check-spark")).toEqual([
      ["Strong blue spark", "step:compression"],
      ["No spark", "step:plug-gap"],
    ]);
  });

  it("labels band edges with the band labels, and sends a dangling target to its missing-step node", () => {
    const { edges } = readFlowMap(draft, []);
    expect(edgesFrom(edges, "plug-gap")).toEqual([
      ["Too close", "step:coil"],
      ["Within range", "step:coil"],
      ["Too wide", "missing:regap-plug"],
    ]);
    expect(edges.filter((e) => e.broken).map((e) => e.id)).toEqual(["step:plug-gap#2"]);
  });

  it("labels compression edges with the four outcomes, a loop back to itself included", () => {
    expect(edgesFrom(readFlowMap(draft, []).edges, "compression")).toEqual([
      ["Good", "step:fuel"],
      ["Marginal", "step:fuel"],
      ["Low", "step:worn-rings"],
      ["Not believable", "step:compression"],
    ]);
  });

  it("leaves instruction edges unlabelled, marks a section's, and gives a finding none", () => {
    const { edges } = readFlowMap(draft, []);
    expect(edgesFrom(edges, "fuel")).toEqual([[null, "step:worn-rings"]]);
    expect(edgesFrom(edges, "coil")).toEqual([["After the section", "step:worn-rings"]]);
    expect(edgesFrom(edges, "worn-rings")).toEqual([]);
  });

  it("gives each step the validator's problems for it, worst first in its status", () => {
    const { problems } = validateFlow(draft, []);
    const { nodes } = readFlowMap(draft, problems);
    const gap = stepOf(nodes, "plug-gap");
    expect(gap.status).toBe("error");
    expect(gap.problems.map((p) => p.code)).toEqual(["target_unknown"]);
    expect(stepOf(nodes, "fuel").status).toBe("fine");
    const warned: Problem[] = [{ stepId: "fuel", code: "finding_without_repairs", message: "a warning", severity: "warning" }];
    expect(stepOf(readFlowMap(draft, warned).nodes, "fuel").status).toBe("warning");
  });

  it("does not crash on half-written drafts", () => {
    expect(readFlowMap({}, [])).toEqual({ nodes: [], edges: [] });
    expect(readFlowMap({ steps: "oops" }, [])).toEqual({ nodes: [], edges: [] });
    const { nodes, edges } = readFlowMap(
      { start: 7, steps: { a: { title: "No kind yet", next: 42 }, b: null, c: { kind: "choice", options: [null, { label: "Yes" }] }, d: { kind: "reading", evaluation: { next: { good: "a", godo: "zz" } } } } },
      [],
    );
    expect(nodes.map((n) => n.id)).toEqual(["step:a", "step:b", "step:c", "step:d", "unset:a", "unset:c", "unset:d", "missing:zz"]);
    expect(stepOf(nodes, "a").kindWord).toBe("No kind yet");
    expect(stepOf(nodes, "b").title).toBeNull();
    expect(edgesFrom(edges, "c")).toEqual([
      ["Option 1", "unset:c"],
      ["Yes", "unset:c"],
    ]);
    expect(edgesFrom(edges, "d")).toEqual([
      ["Good", "step:a"],
      ["Marginal", "unset:d"],
      ["Low", "unset:d"],
      ["Not believable", "unset:d"],
      ["godo", "missing:zz"],
    ]);
  });

  it("draws a section's hand-back once, however many steps use it", () => {
    const { nodes, edges } = readFlowMap({ steps: { a: instruction("@continue"), b: instruction("@continue") } }, []);
    expect(nodes.filter((n) => n.type === "hand-back")).toHaveLength(1);
    expect(edges.map((e) => [e.target, e.broken])).toEqual([
      ["hand-back", false],
      ["hand-back", false],
    ]);
  });

  it("reads a band without a label by its interval", () => {
    expect(exitsOf({ kind: "reading", unit: "psi", bands: [{ from: { value: 80, inclusive: true }, to: null, next: "x" }] })).toEqual([{ label: "[80, +∞) psi", target: "x" }]);
  });
});

describe("layoutFlow", () => {
  it("places every node and lays the flow out from top to bottom", () => {
    const { nodes, placement } = layoutFlow(draft, []);
    expect(Object.keys(placement.nodes).sort()).toEqual(nodes.map((n) => n.id).sort());
    const y = (id: string) => placement.nodes[id]!.y;
    expect(y("step:check-spark")).toBeLessThan(y("step:plug-gap"));
    expect(y("step:plug-gap")).toBeLessThan(y("step:coil"));
    expect(y("step:coil")).toBeLessThan(y("step:worn-rings"));
    expect(placement.width).toBeGreaterThan(0);
    expect(placement.height).toBeGreaterThan(y("step:worn-rings"));
  });

  it("gives every labelled edge a place for its label and every edge its bends", () => {
    const { edges, placement } = layoutFlow(draft, []);
    for (const e of edges) {
      const laid = placement.edges[e.id]!;
      expect(laid.points.length).toBeGreaterThanOrEqual(2);
      expect(laid.label === null).toBe(e.label === null);
    }
  });
});
