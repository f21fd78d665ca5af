// Order of checks for a single fault among candidate causes, by the "p over c" rule.
//
// "check-every-reached": every check reached is paid for, including the last one. Decreasing p/c
// is optimal for this convention (Gluss 1959; Kadane & Simon 1977).
// "assume-last": when one cause is left it is concluded without checking. Here p/c can be
// suboptimal (it may leave a cheap check for last); bestOrderByBruteForce is the truth.

export interface Cause {
  id: string;
  /** Probability that the single fault is this cause; normalised if the set does not sum to 1. */
  probability: number;
  /** Cost of checking this cause, in any one unit (minutes, cents). */
  cost: number;
}

export type OrderConvention = "check-every-reached" | "assume-last";

export const MAX_BRUTE_FORCE_CAUSES = 8;

function validate(causes: readonly Cause[]): void {
  const seen = new Set<string>();
  for (const c of causes) {
    if (seen.has(c.id)) throw new RangeError(`Cause "${c.id}" appears twice.`);
    seen.add(c.id);
    if (!Number.isFinite(c.probability) || c.probability < 0) throw new RangeError(`Cause "${c.id}" needs a probability of zero or more.`);
    if (!Number.isFinite(c.cost) || c.cost < 0) throw new RangeError(`Cause "${c.id}" needs a cost of zero or more.`);
  }
}

/** The probabilities scaled to sum to 1, and whether they had to be. */
export function normaliseProbabilities(causes: readonly Cause[]): { causes: Cause[]; normalised: boolean; originalSum: number } {
  validate(causes);
  const originalSum = causes.reduce((sum, c) => sum + c.probability, 0);
  if (causes.length > 0 && originalSum === 0) throw new RangeError("At least one cause needs a probability above zero.");
  const normalised = causes.length > 0 && Math.abs(originalSum - 1) > 1e-9;
  return { causes: normalised ? causes.map((c) => ({ ...c, probability: c.probability / originalSum })) : [...causes], normalised, originalSum };
}

/** Decreasing p/c; a zero-cost check comes first; ties by id so the order is stable. */
export function orderByRatio(causes: readonly Cause[]): Cause[] {
  validate(causes);
  // Cross-multiplied so a zero cost needs no division.
  return [...causes].sort((a, b) => b.probability * a.cost - a.probability * b.cost || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

/** Expected cost of checking in this order until the fault is found; probabilities are normalised first. */
export function expectedCost(order: readonly Cause[], convention: OrderConvention): number {
  const { causes } = normaliseProbabilities(order);
  const paid = convention === "assume-last" ? causes.slice(0, -1) : causes;
  let notYetFound = 1;
  let total = 0;
  for (const c of paid) {
    total += Math.max(notYetFound, 0) * c.cost;
    notYetFound -= c.probability;
  }
  return total;
}

function costOfIndices(idx: readonly number[], p: readonly number[], c: readonly number[], convention: OrderConvention): number {
  const paid = convention === "assume-last" ? idx.length - 1 : idx.length;
  let notYetFound = 1;
  let total = 0;
  for (let k = 0; k < paid; k++) {
    const i = idx[k] as number;
    total += Math.max(notYetFound, 0) * (c[i] as number);
    notYetFound -= p[i] as number;
  }
  return total;
}

/** Tries every order (up to 8 causes, 40 320 orders, by Heap's algorithm); the p/c order wins ties. */
export function bestOrderByBruteForce(causes: readonly Cause[], convention: OrderConvention): { order: Cause[]; cost: number } {
  if (causes.length > MAX_BRUTE_FORCE_CAUSES) {
    throw new RangeError(`Brute force handles at most ${MAX_BRUTE_FORCE_CAUSES} causes; got ${causes.length}.`);
  }
  const start = orderByRatio(causes);
  if (start.length === 0) return { order: [], cost: 0 };
  const p = normaliseProbabilities(start).causes.map((c) => c.probability);
  const c = start.map((x) => x.cost);
  const idx = start.map((_, i) => i);
  let bestIdx = [...idx];
  let bestCost = costOfIndices(idx, p, c, convention);
  const counters = idx.map(() => 0);
  for (let i = 1; i < idx.length; ) {
    if ((counters[i] as number) < i) {
      const j = i % 2 === 0 ? 0 : (counters[i] as number);
      [idx[j], idx[i]] = [idx[i] as number, idx[j] as number];
      const cost = costOfIndices(idx, p, c, convention);
      // A relative tolerance keeps the p/c order when another order ties but for rounding noise.
      if (cost < bestCost - 1e-12 * Math.max(1, bestCost)) {
        bestCost = cost;
        bestIdx = [...idx];
      }
      counters[i] = (counters[i] as number) + 1;
      i = 1;
    } else {
      counters[i] = 0;
      i++;
    }
  }
  return { order: bestIdx.map((i) => start[i] as Cause), cost: bestCost };
}
