import { describe, expect, it } from "vitest";
import {
  flowDefinitionSchema,
  flowEventSchema,
  flowStepSchema,
  sectionDefinitionSchema,
  targetSchema,
} from "../../../shared/flow/schema.ts";
import { finding, flow, gapBands, gapReading, instruction, sampleFlow, sampleSections } from "./fixtures.ts";

describe("flow and section schemas", () => {
  it("parse the sample flow and its sections", () => {
    expect(flowDefinitionSchema.safeParse(sampleFlow).success).toBe(true);
    for (const s of sampleSections) expect(sectionDefinitionSchema.safeParse(s).success).toBe(true);
  });

  it("pin formatVersion to 1", () => {
    expect(flowDefinitionSchema.safeParse({ ...sampleFlow, formatVersion: 2 }).success).toBe(false);
  });

  it("need appliesTo on a flow, with known equipment kinds, and refuse it on a section", () => {
    const { appliesTo: _a, ...bare } = sampleFlow;
    expect(flowDefinitionSchema.safeParse(bare).success).toBe(false);
    expect(flowDefinitionSchema.safeParse({ ...sampleFlow, appliesTo: { equipment: ["jet_ski"], cycle: 2 } }).success).toBe(false);
    expect(flowDefinitionSchema.safeParse({ ...sampleFlow, appliesTo: { equipment: [], cycle: "any" } }).success).toBe(false);
    expect(sectionDefinitionSchema.safeParse({ ...sampleSections[0], appliesTo: sampleFlow.appliesTo }).success).toBe(false);
  });

  it("refuse unknown keys, so a typo is caught", () => {
    expect(flowStepSchema.safeParse({ kind: "instruction", title: "Do it", nxt: "a" }).success).toBe(false);
    expect(flowStepSchema.safeParse({ ...instruction("a"), colour: "red" }).success).toBe(false);
  });

  it("tell steps apart by kind", () => {
    const parsed = flowStepSchema.parse(gapReading(gapBands("a", "b", "c")));
    expect(parsed.kind === "reading" && parsed.bands?.length).toBe(3);
    expect(flowStepSchema.safeParse({ ...finding(), kind: "verdict" }).success).toBe(false);
  });

  it("keep slugs for ids and accept @continue only as a target", () => {
    expect(targetSchema.safeParse("@continue").success).toBe(true);
    expect(targetSchema.safeParse("spark-test").success).toBe(true);
    for (const bad of ["Spark", "spark_test", "-spark", "spark--test", "", "a".repeat(81)]) expect(targetSchema.safeParse(bad).success).toBe(false);
    expect(flowDefinitionSchema.safeParse(flow({ f: finding() }, "@continue")).success).toBe(false);
  });

  it("want band bounds as a value and a side, or null", () => {
    const bands = gapBands("a", "b", "c");
    expect(flowStepSchema.safeParse(gapReading([{ ...bands[0]!, to: { value: 0.25 } as never }])).success).toBe(false);
    expect(flowStepSchema.safeParse(gapReading([{ ...bands[0]!, to: { value: Infinity, inclusive: true } }])).success).toBe(false);
  });

  it("check a reading's quantity against the known quantities", () => {
    expect(flowStepSchema.safeParse({ ...gapReading(gapBands("a", "b", "c")), quantity: "loudness" }).success).toBe(false);
  });
});

describe("flowEventSchema", () => {
  it("parses the four events and strips an event's stored id and seq", () => {
    const stored = { id: "0190-uuid", seq: 4, type: "step.answer", stepId: "spark/flash", value: "every" };
    expect(flowEventSchema.parse(stored)).toEqual({ type: "step.answer", stepId: "spark/flash", value: "every" });
    expect(flowEventSchema.parse({ type: "step.record", stepId: "gap", value: 0.3, unit: "mm" }).type).toBe("step.record");
    expect(flowEventSchema.parse({ type: "step.back" })).toEqual({ type: "step.back" });
    expect(flowEventSchema.parse({ type: "session.restart" })).toEqual({ type: "session.restart" });
  });

  it("refuses unknown types, missing fields and readings that are not finite numbers", () => {
    for (const bad of [
      { type: "step.skip", stepId: "a" },
      { type: "step.answer", stepId: "a" },
      { type: "step.record", stepId: "a", value: "0.3", unit: "mm" },
      { type: "step.record", stepId: "a", value: Number.NaN, unit: "mm" },
      { type: "step.record", stepId: "a", value: Number.POSITIVE_INFINITY, unit: "mm" },
      null,
      "step.back",
    ]) {
      expect(flowEventSchema.safeParse(bad).success).toBe(false);
    }
  });
});
