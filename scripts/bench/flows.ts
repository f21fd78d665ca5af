// Benchmark: validate + compile + replay a long session, for flows of 100, 1,000 and 10,000 steps.
import { compileFlow } from "../../shared/flow/compile.ts";
import { replay } from "../../shared/flow/replay.ts";
import type { FlowInput } from "../../shared/flow/machine.ts";
import { benchFlow, benchPath, benchSections } from "./flow-generator.ts";

const SIZES = [100, 1000, 10_000] as const;
// A long session: a full no-start check is some 40 events; this is five times that. Sessions do not
// grow with the flow, so the same 200 events run against every size (the 100-step flow ends sooner).
const MAX_EVENTS = 200;
const WARM_UP = 10;
const RUNS = 15;

const input: FlowInput = { profile: { cycle: 2, compressionRelease: "no", displacementCc: 45 }, altitudeM: 350 };

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

function once(definition: unknown, events: unknown[]): number {
  const t0 = performance.now();
  // A fresh compile each time, so replay builds its machine too: the whole cost of a new version.
  const compiled = compileFlow(definition, benchSections);
  const result = replay(compiled, input, events);
  const ms = performance.now() - t0;
  if (!result.ok) throw new Error(`the benchmark session was refused at event ${result.index}: ${result.reason}`);
  return ms;
}

const cases = SIZES.map((size) => {
  const flow = benchFlow(size);
  // Parsed from JSON text, the way a stored definition arrives.
  const definition: unknown = JSON.parse(JSON.stringify(flow));
  return { size, definition, events: benchPath(flow, MAX_EVENTS), runs: [] as number[] };
});
// Warm every size up first (a server lives long; the JIT settles), then measure one size at a
// time after a few more of its own runs, so one size's garbage is not collected in another's time.
for (let i = 0; i < WARM_UP; i++) for (const c of cases) once(c.definition, c.events);
for (const c of cases) {
  for (let i = 0; i < 3; i++) once(c.definition, c.events);
  for (let i = 0; i < RUNS; i++) c.runs.push(once(c.definition, c.events));
}

const ms: Record<string, number> = {};
for (const c of cases) {
  ms[c.size] = Number(median(c.runs).toFixed(2));
  const compiled = compileFlow(c.definition, benchSections);
  const t0 = performance.now();
  const last = replay(compiled, input, c.events);
  const replayMs = performance.now() - t0;
  const where = last.ok ? `${last.status} at ${last.stepId}` : `refused: ${last.reason}`;
  console.log(
    `${c.size} steps (${Object.keys(compiled.steps).length} compiled, ${c.events.length} events, ${where}): median ${ms[c.size]} ms of ${RUNS} runs` +
      ` [${c.runs.map((r) => r.toFixed(1)).join(", ")}]; replay alone ${replayMs.toFixed(1)} ms, ${((replayMs / c.events.length) * 1000).toFixed(0)} µs an event`,
  );
}

const growth = Number((ms[10_000]! / ms[1000]!).toFixed(2));
const targets = { "1000StepsUnder20ms": ms[1000]! < 20, tenTimesStepsAtMostTwelveTimesTime: growth <= 12 };
console.log(JSON.stringify({ benchmark: "flows", ms, growth: { "1000to10000": growth }, targets, met: Object.values(targets).every(Boolean) }));
