import { describe, expect, it } from "vitest";
import { diffFlows, diffStep, sameValue } from "../../../shared/flow/diff.ts";
import type { FlowStep } from "../../../shared/flow/schema.ts";
import { choice, compressionReading, finding, flow, gapBands, gapReading, instruction } from "./fixtures.ts";

const base = () =>
  flow({
    check: instruction("which"),
    which: choice({ yes: "gap", no: "dead" }),
    gap: gapReading(gapBands("close", "fine", "wide")),
    close: finding("Gap too close"),
    fine: finding("Gap fine"),
    wide: finding("Gap too wide"),
    dead: finding("Dead coil"),
  });

describe("sameValue", () => {
  it("ignores key order and absent keys but not array order", () => {
    expect(sameValue({ a: 1, b: [1, 2] }, { b: [1, 2], a: 1 })).toBe(true);
    expect(sameValue({ a: 1, b: undefined }, { a: 1 })).toBe(true);
    expect(sameValue([1, 2], [2, 1])).toBe(false);
    expect(sameValue({ a: { b: "x" } }, { a: { b: "y" } })).toBe(false);
    expect(sameValue(null, {})).toBe(false);
  });
});

describe("diffFlows", () => {
  it("finds nothing between a flow and a copy of it", () => {
    const diff = diffFlows(base(), structuredClone(base()));
    expect(diff.same).toBe(true);
    expect(diff.changed).toEqual([]);
  });

  it("reports an option's changed next as a branch change, not a field change", () => {
    const after = base();
    (after.steps.which as Extract<FlowStep, { kind: "choice" }>).options[1]!.next = "check";
    const diff = diffFlows(base(), after);
    expect(diff.same).toBe(false);
    expect(diff.changed).toEqual([{ stepId: "which", title: "Which is it?", fields: [], branches: [{ path: "options[no].next", before: "dead", after: "check" }] }]);
  });

  it("lists steps added and removed, and the envelope field by field", () => {
    const after = base();
    delete after.steps.dead;
    after.steps.coil = finding("Coil open");
    after.title = "Test flow, revised";
    after.appliesTo = { equipment: ["chainsaw", "leaf_blower"], cycle: 2 };
    const diff = diffFlows(base(), after);
    expect(diff.added.map((a) => a.stepId)).toEqual(["coil"]);
    expect(diff.removed.map((r) => r.stepId)).toEqual(["dead"]);
    expect(diff.flow).toEqual([
      { path: "title", before: "Test flow", after: "Test flow, revised" },
      { path: "appliesTo.equipment", before: ["chainsaw"], after: ["chainsaw", "leaf_blower"] },
    ]);
  });

  it("names a step whose only change is its id as renamed, and the references that followed it", () => {
    const after = base();
    after.steps["coil-dead"] = after.steps.dead!;
    delete after.steps.dead;
    (after.steps.which as Extract<FlowStep, { kind: "choice" }>).options[1]!.next = "coil-dead";
    const diff = diffFlows(base(), after);
    expect(diff.renamed).toEqual([{ from: "dead", to: "coil-dead" }]);
    expect(diff.added).toEqual([]);
    expect(diff.removed).toEqual([]);
    expect(diff.changed[0]!.branches).toEqual([{ path: "options[no].next", before: "dead", after: "coil-dead" }]);
  });

  it("reports fields by path: a caution's text, a photo added, a repair's labour", () => {
    const before = instruction("b", { cautions: [{ signal: "WARNING", text: "Hot" }] });
    const after = instruction("b", { cautions: [{ signal: "WARNING", text: "Hot muffler" }], photo: { requirement: "required", prompt: "The plug" } });
    expect(diffStep("a", before, after).fields).toEqual([
      { path: "cautions[0].text", before: "Hot", after: "Hot muffler" },
      { path: "photo", before: undefined, after: { requirement: "required", prompt: "The plug" } },
    ]);
    const f1 = finding("Worn");
    const f2 = structuredClone(f1) as Extract<FlowStep, { kind: "finding" }>;
    f2.repairs[0]!.labourHours = 1.5;
    f2.repairs[0]!.parts = ["part", "gasket"];
    expect(diffStep("f", f1, f2).fields).toEqual([
      { path: "repairs[0].labourHours", before: 0.5, after: 1.5 },
      { path: "repairs[0].parts", before: ["part"], after: ["part", "gasket"] },
    ]);
  });

  it("reports bands by position with each bound whole, and bands added", () => {
    const before = gapReading(gapBands("close", "fine", "wide"));
    const bands = gapBands("close", "fine", "wide");
    bands[1]!.to = { value: 0.4, inclusive: true };
    bands[2]!.from = { value: 0.4, inclusive: false };
    bands[2]!.next = "far";
    const after = gapReading(bands);
    expect(diffStep("gap", before, after).branches).toEqual([
      { path: "bands[1].to", before: { value: 0.36, inclusive: true }, after: { value: 0.4, inclusive: true } },
      { path: "bands[2].from", before: { value: 0.36, inclusive: false }, after: { value: 0.4, inclusive: false } },
      { path: "bands[2].next", before: "wide", after: "far" },
    ]);
    const fewer = gapReading(gapBands("close", "fine", "wide").slice(0, 2));
    expect(diffStep("gap", fewer, before).branches).toEqual([{ path: "bands[2]", before: undefined, after: gapBands("close", "fine", "wide")[2] }]);
  });

  it("reports options added, removed and reordered, and a label change, as branches", () => {
    const before = choice({ yes: "a", no: "b" });
    const after = { ...choice({ no: "b", yes: "a", maybe: "c" }) } as Extract<FlowStep, { kind: "choice" }>;
    after.options[0]!.label = "No, never";
    const branches = diffStep("q", before, after).branches;
    expect(branches).toEqual([
      { path: "options[no].label", before: "no", after: "No, never" },
      { path: "options[maybe]", before: undefined, after: { value: "maybe", label: "maybe", next: "c" } },
      { path: "options", before: ["yes", "no"], after: ["no", "yes"] },
    ]);
    expect(diffStep("q", after, before).branches).toContainEqual({ path: "options[maybe]", before: { value: "maybe", label: "maybe", next: "c" }, after: undefined });
  });

  it("reports a switch from bands to a compression evaluation, and an evaluation's targets", () => {
    const bands = gapReading(gapBands("a", "b", "c"));
    const compression = compressionReading({ good: "a", marginal: "b", low: "c", implausible: "d" });
    const branches = diffStep("r", bands, compression).branches;
    expect(branches.map((b) => b.path)).toEqual(["bands[0]", "bands[1]", "bands[2]", "evaluation"]);
    const other = compressionReading({ good: "a", marginal: "b", low: "e", implausible: "d" });
    expect(diffStep("r", compression, other).branches).toEqual([{ path: "evaluation.next.low", before: "c", after: "e" }]);
  });

  it("compares unfinished drafts without throwing", () => {
    const diff = diffFlows({ steps: { a: { kind: "choice", options: "broken" } } }, { steps: { a: { kind: "choice", options: [{ value: 1 }] } }, start: 3 });
    expect(diff.flow).toEqual([{ path: "start", before: undefined, after: 3 }]);
    expect(diff.changed[0]!.branches).toEqual([{ path: "options[#0]", before: undefined, after: { value: 1 } }]);
    expect(diffFlows(null, "nonsense").same).toBe(true);
  });

  it("lists embedded sections added, removed and changed by id", () => {
    const before = { ...base(), sections: { spark: { title: "Spark" }, fuel: { title: "Fuel" } } };
    const after = { ...base(), sections: { spark: { title: "Spark, revised" }, air: { title: "Air" } } };
    expect(diffFlows(before, after).sections).toEqual({ added: ["air"], removed: ["fuel"], changed: ["spark"] });
  });
});
