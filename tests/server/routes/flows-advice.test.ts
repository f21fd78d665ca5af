import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildCompletedSession, buildFlow, flowDefinition } from "../../factories/flows.ts";
import { buildSession, HANDHELD_2_STROKE } from "../../factories/sessions.ts";
import { installBuiltInFlows, publishedFlows } from "../../../server/services/flows.ts";
import { adviceResponseSchema } from "../../../shared/schemas/flows.ts";

let t: TestApp;
let apprentice: Awaited<ReturnType<typeof signedInAs>>;
let senior: Awaited<ReturnType<typeof signedInAs>>;
let versionId: string;
beforeAll(async () => {
  t = await createTestApp();
  await installBuiltInFlows(t.ctx.db);
  [apprentice, senior] = [await signedInAs(t, "apprentice"), await signedInAs(t, "senior_tech")];
  versionId = (await publishedFlows(t.ctx.db, HANDHELD_2_STROKE))[0]!.versionId;
});
afterAll(() => t.close());

// Source: references.md §6 worked example — spark (p 0.25, c 5 min), air (0.10, 2.5), fuel (0.45, 12),
// compression (0.20, 15); the handheld flow's fuel check is "prime". Sessions run today's order.
const today = ["spark", "air", "compression", "prime"] as const;
const minutes = { spark: 5, air: 2.5, compression: 15, prime: 12 };
const finding = { spark: "spark/coil-failed", air: "air/filter-clogged", compression: "compression/worn", prime: "prime/starts-when-primed" };
const plan: (keyof typeof minutes)[] = [...Array(5).fill("spark"), ...Array(2).fill("air"), ...Array(9).fill("prime"), ...Array(4).fill("compression")];

async function sessionEndingIn(check: keyof typeof minutes) {
  const start = Date.UTC(2026, 2, 2, 9, 0, 0);
  const at = (m: number) => new Date(start + m * 60_000);
  const events: [string, Date][] = [["prepare/protect", at(0)]];
  let now = 0;
  for (const c of today) {
    events.push([`${c}/first`, at(now + minutes[c] / 2)], [`${c}/last`, at(now + minutes[c])]);
    now += minutes[c];
    if (c === check) break;
  }
  await buildCompletedSession(t.ctx.db, versionId, finding[check], events);
}

describe("GET /api/flows/:id/advice", () => {
  it("withholds the suggestion below 20 completed sessions, and ignores open ones", async () => {
    for (const check of plan.slice(0, 19)) await sessionEndingIn(check);
    await buildSession(t.ctx.db, { flowVersionId: versionId });
    const res = await apprentice.agent.get(`/api/flows/${HANDHELD_2_STROKE}/advice`);
    expect(res.status).toBe(200);
    const advice = adviceResponseSchema.parse(res.body);
    expect(advice).toMatchObject({ sessionCount: 19, minimumSessions: 20, enough: false, suggestion: null });
    expect(advice.findings.find((f) => f.stepId === "spark/coil-failed")).toMatchObject({ title: "Ignition module failed", count: 5 });
  });

  it("at 20 sessions suggests the p/c order with the expected minutes of both orders", async () => {
    await sessionEndingIn(plan[19]!);
    const advice = adviceResponseSchema.parse((await senior.agent.get(`/api/flows/${HANDHELD_2_STROKE}/advice`)).body);
    expect(advice).toMatchObject({ sessionCount: 20, enough: true });
    expect(advice.checks.map((c) => [c.stepId, c.medianMinutes])).toEqual([
      ["prepare", 0],
      ["spark", 5],
      ["air", 2.5],
      ["compression", 15],
      ["prime", 12],
    ]);
    const s = advice.suggestion!;
    expect(s.current).toEqual(today);
    // Source: references.md §6 — spark, air, fuel, compression; expected cost 17.675
    expect(s.suggested).toEqual(["spark", "air", "prime", "compression"]);
    expect(s.expectedMinutesSuggested).toBeCloseTo(17.675, 9);
    // Worked by hand: 5 + 0.75·2.5 + 0.65·15 + 0.45·12 = 22.025
    expect(s.expectedMinutesNow).toBeCloseTo(22.025, 9);
  });

  it("answers for a flow without sessions, and 404 for an unknown flow", async () => {
    await buildFlow(t.ctx.db, { id: "quiet-flow", versions: [flowDefinition("quiet-flow")] });
    const res = await senior.agent.get("/api/flows/quiet-flow/advice");
    expect(res.body).toEqual({ sessionCount: 0, minimumSessions: 20, enough: false, findings: [], checks: [], suggestion: null });
    expect((await senior.agent.get("/api/flows/no-such-flow/advice")).status).toBe(404);
  });
});
