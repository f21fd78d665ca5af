// Benchmark: validate + compile + replay a long session, for flows of 100, 1,000 and 10,000 steps.
import v8 from "node:v8";
import vm from "node:vm";
import { compileFlow } from "../../shared/flow/compile.ts";
import { replay } from "../../shared/flow/replay.ts";
import type { FlowInput } from "../../shared/flow/machine.ts";
import { benchFlow, benchPath, benchSections } from "./flow-generator.ts";

const SIZES = [100, 1000, 10_000] as const;
// A long session. Sessions hold tens of events (a full no-start check is about 40) and do not grow
// with the flow, so the same 100 events, back-steps and readings in two units included, run against
// every size (the 100-step flow reaches its finding sooner). The per-event cost is printed too.
const MAX_EVENTS = 100;
const WARM_UP = 10;
const RUNS = 21;

const input: FlowInput = { profile: { cycle: 2, compressionRelease: "no", displacementCc: 45 }, altitudeM: 350 };

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

// Collecting between sizes (never inside a run) keeps one size's garbage out of another's time.
v8.setFlagsFromString("--expose-gc");
const collect = vm.runInNewContext("gc") as () => void;

interface Run {
  total: number;
  compile: number;
}

function once(definition: unknown, events: unknown[]): Run {
  const t0 = performance.now();
  // A fresh compile each time, so replay builds its machine too: the whole cost of a new version.
  const compiled = compileFlow(definition, benchSections);
  const t1 = performance.now();
  const result = replay(compiled, input, events);
  const t2 = performance.now();
  if (!result.ok) throw new Error(`the benchmark session was refused at event ${result.index}: ${result.reason}`);
  return { total: t2 - t0, compile: t1 - t0 };
}

const cases = SIZES.map((size) => {
  const flow = benchFlow(size);
  // Parsed from JSON text, the way a stored definition arrives.
  const definition: unknown = JSON.parse(JSON.stringify(flow));
  return { size, definition, events: benchPath(flow, MAX_EVENTS), runs: [] as Run[] };
});
// Warm every size up (a server lives long; the JIT settles), then measure one size at a time; a full
// collection can drop compiled code and feedback, so each size warms up again after it.
for (let i = 0; i < WARM_UP; i++) for (const c of cases) once(c.definition, c.events);
for (const c of cases) {
  collect();
  for (let i = 0; i < WARM_UP; i++) once(c.definition, c.events);
  for (let i = 0; i < RUNS; i++) c.runs.push(once(c.definition, c.events));
}

const ms: Record<string, number> = {};
for (const c of cases) {
  ms[c.size] = Number(median(c.runs.map((r) => r.total)).toFixed(2));
  const compileMs = median(c.runs.map((r) => r.compile));
  const replayMs = median(c.runs.map((r) => r.total - r.compile));
  const compiled = compileFlow(c.definition, benchSections);
  const last = replay(compiled, input, c.events);
  const where = last.ok ? `${last.status} at ${last.stepId}` : `refused: ${last.reason}`;
  console.log(
    `${c.size} steps (${Object.keys(compiled.steps).length} compiled, ${c.events.length} events, ${where}): median ${ms[c.size]} ms of ${RUNS} runs` +
      ` [${c.runs.map((r) => r.total.toFixed(1)).join(", ")}]; validate + compile ${compileMs.toFixed(1)} ms,` +
      ` replay ${replayMs.toFixed(1)} ms (${((replayMs / c.events.length) * 1000).toFixed(0)} µs an event)`,
  );
}

const growth = Number((ms[10_000]! / ms[1000]!).toFixed(2));
const targets = { "1000StepsUnder20ms": ms[1000]! < 20, tenTimesStepsAtMostTwelveTimesTime: growth <= 12 };
console.log(JSON.stringify({ benchmark: "flows", ms, growth: { "1000to10000": growth }, targets, met: Object.values(targets).every(Boolean) }));
