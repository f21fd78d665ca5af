// The order a reader expects a flow's steps in: as the bench meets them from the start, not as stored.
import type { RawStep } from "./draft-edits.ts";
import { exitsOf } from "./flow-layout.ts";

/** Step ids breadth-first from the start along every way out, then any the start never reaches. */
export function stepOrder(steps: Record<string, RawStep>, start: unknown): string[] {
  const seen = new Set<string>();
  const queue = typeof start === "string" && start in steps ? [start] : [];
  for (let i = 0; i < queue.length; i++) {
    const id = queue[i]!;
    if (seen.has(id)) continue;
    seen.add(id);
    for (const { target } of exitsOf(steps[id])) {
      if (typeof target === "string" && Object.prototype.hasOwnProperty.call(steps, target) && !seen.has(target)) queue.push(target);
    }
  }
  return [...seen, ...Object.keys(steps).filter((id) => !seen.has(id))];
}
