import { describe, expect, it } from "vitest";
import { stepOrder } from "../../../src/features/flows/lib/step-order.ts";

describe("stepOrder", () => {
  it("lists steps as the bench meets them from the start, then the ones it never reaches", () => {
    const steps = {
      zz: { kind: "finding", title: "Worn" },
      a: { kind: "choice", title: "Spark?", options: [{ value: "yes", label: "Yes", next: "m" }, { value: "no", label: "No", next: "zz" }] },
      m: { kind: "instruction", title: "Look", next: "zz" },
      orphan: { kind: "instruction", title: "Never reached", next: "a" },
      start: { kind: "instruction", title: "Begin", next: "a" },
    };
    expect(stepOrder(steps, "start")).toEqual(["start", "a", "m", "zz", "orphan"]);
  });

  it("keeps the stored order when the start is missing or unknown", () => {
    expect(stepOrder({ b: { kind: "finding" }, a: { kind: "finding" } }, "nowhere")).toEqual(["b", "a"]);
  });
});
