import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { bestOrderByBruteForce, expectedCost, normaliseProbabilities, orderByRatio, type Cause } from "../../../shared/calc/sequencing.ts";

// Source: references.md §6 worked example (p/c rule; Gluss 1959, Kadane & Simon 1977 — citations from memory)
const worked: Cause[] = [
  { id: "compression", probability: 0.2, cost: 15 },
  { id: "fuel", probability: 0.45, cost: 12 },
  { id: "air", probability: 0.1, cost: 2.5 },
  { id: "spark", probability: 0.25, cost: 5 },
];

const ids = (order: readonly Cause[]) => order.map((c) => c.id);

const causesArb = (minLength: number, maxLength: number) =>
  fc.uniqueArray(
    fc.record({
      id: fc.string({ minLength: 1, maxLength: 4 }),
      probability: fc.double({ min: 0.001, max: 1, noNaN: true }),
      cost: fc.double({ min: 0.01, max: 100, noNaN: true }),
    }),
    { minLength, maxLength, selector: (c) => c.id },
  );

describe("orderByRatio and expectedCost", () => {
  it("reproduces the worked example", () => {
    // Source: references.md §6 — order spark, air, fuel, compression; 5 + 0.75·2.5 + 0.65·12 + 0.20·15 = 17.675
    const order = orderByRatio(worked);
    expect(ids(order)).toEqual(["spark", "air", "fuel", "compression"]);
    expect(expectedCost(order, "check-every-reached")).toBe(17.675);
  });

  it("agrees with brute force over all 24 orders of the worked example", () => {
    // Source: references.md §6 — brute force over all 24 orders agrees with the p/c order, cost 17.675
    const best = bestOrderByBruteForce(worked, "check-every-reached");
    expect(ids(best.order)).toEqual(["spark", "air", "fuel", "compression"]);
    expect(best.cost).toBeCloseTo(17.675, 12);
  });

  it("normalises probabilities that do not sum to 1, and says so", () => {
    const percent = worked.map((c) => ({ ...c, probability: c.probability * 100 }));
    // Source: references.md §6 — the same example in percent has the same expected cost
    expect(expectedCost(orderByRatio(percent), "check-every-reached")).toBeCloseTo(17.675, 12);
    const n = normaliseProbabilities(percent);
    expect(n.normalised).toBe(true);
    expect(n.originalSum).toBeCloseTo(100, 12);
    expect(normaliseProbabilities(worked).normalised).toBe(false);
  });

  it("puts a free check first and breaks ties by id", () => {
    const order = orderByRatio([
      { id: "b", probability: 0.2, cost: 2 },
      { id: "a", probability: 0.4, cost: 4 },
      { id: "free", probability: 0.01, cost: 0 },
      { id: "c", probability: 0.39, cost: 1 },
    ]);
    expect(ids(order)).toEqual(["free", "c", "a", "b"]);
  });

  it("does not pay for the last cause when it is assumed", () => {
    // Worked by hand: A, B, C with costs 5, 3, 2 and p 0.6, 0.3, 0.1: 5 + 0.4·3 = 6.2 (C assumed)
    const order = [
      { id: "A", probability: 0.6, cost: 5 },
      { id: "B", probability: 0.3, cost: 3 },
      { id: "C", probability: 0.1, cost: 2 },
    ];
    expect(expectedCost(order, "assume-last")).toBeCloseTo(6.2, 12);
    // Worked by hand: 5 + 0.4·3 + 0.1·2 = 6.4 when the last check is paid for too
    expect(expectedCost(order, "check-every-reached")).toBeCloseTo(6.4, 12);
    expect(expectedCost([{ id: "only", probability: 1, cost: 9 }], "assume-last")).toBe(0);
  });

  it("refuses bad causes", () => {
    expect(() => orderByRatio([{ id: "x", probability: -0.1, cost: 1 }])).toThrow(RangeError);
    expect(() => orderByRatio([{ id: "x", probability: 0.1, cost: Number.NaN }])).toThrow(RangeError);
    expect(() => orderByRatio([{ id: "x", probability: 0.5, cost: 1 }, { id: "x", probability: 0.5, cost: 2 }])).toThrow(/twice/);
    expect(() => expectedCost([{ id: "x", probability: 0, cost: 1 }], "check-every-reached")).toThrow(RangeError);
  });
});

describe("bestOrderByBruteForce", () => {
  it("finds a better order than p/c when the last cause is assumed", () => {
    // Worked by hand: p/c order A, B, C costs 6.2; B, C, A costs 3 + 0.7·2 = 4.4, the best of the six orders
    const causes = [
      { id: "A", probability: 0.6, cost: 5 },
      { id: "B", probability: 0.3, cost: 3 },
      { id: "C", probability: 0.1, cost: 2 },
    ];
    expect(ids(orderByRatio(causes))).toEqual(["A", "B", "C"]);
    const best = bestOrderByBruteForce(causes, "assume-last");
    expect(ids(best.order)).toEqual(["B", "C", "A"]);
    expect(best.cost).toBeCloseTo(4.4, 12);
  });

  it("matches the p/c order's cost for random cases when every check reached is paid", () => {
    // Source: Kadane & Simon, Annals of Statistics 5(2), 1977 (from memory) — p/c is optimal for this convention
    fc.assert(
      fc.property(causesArb(1, 8), (causes) => {
        const ratioCost = expectedCost(orderByRatio(causes), "check-every-reached");
        const best = bestOrderByBruteForce(causes, "check-every-reached");
        expect(Math.abs(ratioCost - best.cost)).toBeLessThanOrEqual(1e-9 * Math.max(1, best.cost));
      }),
    );
  });

  it("matches the p/c order's cost for random cases of exactly 8 causes", () => {
    // Source: Kadane & Simon, Annals of Statistics 5(2), 1977 (from memory) — p/c is optimal for this convention
    fc.assert(
      fc.property(causesArb(8, 8), (causes) => {
        const ratioCost = expectedCost(orderByRatio(causes), "check-every-reached");
        const best = bestOrderByBruteForce(causes, "check-every-reached");
        expect(Math.abs(ratioCost - best.cost)).toBeLessThanOrEqual(1e-9 * Math.max(1, best.cost));
      }),
      { numRuns: 25 },
    );
  });

  it("is never worse than the p/c order when the last cause is assumed", () => {
    fc.assert(
      fc.property(causesArb(1, 6), (causes) => {
        const best = bestOrderByBruteForce(causes, "assume-last");
        expect(best.cost).toBeLessThanOrEqual(expectedCost(orderByRatio(causes), "assume-last") + 1e-12);
      }),
    );
  });

  it("refuses more than 8 causes and handles none", () => {
    const nine = Array.from({ length: 9 }, (_, i) => ({ id: `c${i}`, probability: 1 / 9, cost: 1 }));
    expect(() => bestOrderByBruteForce(nine, "check-every-reached")).toThrow(RangeError);
    expect(bestOrderByBruteForce([], "assume-last")).toEqual({ order: [], cost: 0 });
  });
});
