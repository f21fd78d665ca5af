import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildSession } from "../../factories/sessions.ts";
import { buildFlow, flowDefinition } from "../../factories/flows.ts";
import { buildCustomer, buildWorkOrder } from "../../factories/work-orders.ts";
import { users } from "../../../server/db/schema.ts";
import { installBuiltInFlows } from "../../../server/services/flows.ts";

let t: TestApp;
let lead: Awaited<ReturnType<typeof signedInAs>>;
let ash: Awaited<ReturnType<typeof signedInAs>>;
let bea: Awaited<ReturnType<typeof signedInAs>>;
let idle: Awaited<ReturnType<typeof signedInAs>>;
let flowId: string;

beforeAll(async () => {
  t = await createTestApp();
  await installBuiltInFlows(t.ctx.db);
  lead = await signedInAs(t, "shop_lead");
  [ash, bea, idle] = [await signedInAs(t, "apprentice"), await signedInAs(t, "senior_tech"), await signedInAs(t, "apprentice")];
  for (const [who, name] of [[ash, "Ash Penrose"], [bea, "Bea Thornquist"], [idle, "Idris Vale"]] as const) await t.ctx.db.update(users).set({ name }).where(eq(users.id, who.user.id));
  // Two versions of one flow: version 2 renames a finding and adds one.
  const v1 = flowDefinition("options-trimmer", { title: "Options trimmer" });
  const v2 = flowDefinition("options-trimmer", { title: "Options trimmer" });
  v2.steps = {
    ...v2.steps,
    look: { kind: "choice", title: "Does the plug spark?", options: [{ value: "yes", label: "Yes", next: "fuel" }, { value: "no", label: "No", next: "coil" }, { value: "weak", label: "Weak", next: "plug" }] },
    fuel: { kind: "finding", title: "Old fuel in the tank", certainty: "likely", explanation: "Spark is there, so fuel is next.", repairs: [] },
    plug: { kind: "finding", title: "Fouled plug", certainty: "likely", explanation: "A weak spark.", repairs: [] },
  };
  const flow = await buildFlow(t.ctx.db, { title: "Options trimmer", versions: [v1, v2] });
  flowId = flow.id;
  const wo = await buildWorkOrder(t.ctx.db, { customerId: (await buildCustomer(t.ctx.db)).id, state: "diagnosing" });
  await buildSession(t.ctx.db, { techId: ash.user.id, flowVersionId: flow.versionIds[0]!, workOrderId: wo.id });
  await buildSession(t.ctx.db, { techId: bea.user.id, flowVersionId: flow.versionIds[1]! });
  await buildSession(t.ctx.db, { techId: bea.user.id });
});
afterAll(() => t.close());

describe("GET /api/review/options", () => {
  it("gives the shop lead every tech with a session and every flow sessions ran on, with the findings of those versions", async () => {
    const res = await lead.agent.get("/api/review/options");
    expect(res.status).toBe(200);
    expect(res.body.techs).toEqual([
      { id: ash.user.id, name: "Ash Penrose" },
      { id: bea.user.id, name: "Bea Thornquist" },
    ]);
    const trimmer = res.body.flows.find((f: { flowId: string }) => f.flowId === flowId);
    // Both versions' findings once each, by title; "fuel" under the title version 2 gave it.
    expect(trimmer).toEqual({
      flowId,
      title: "Options trimmer",
      findings: [
        { stepId: "coil", title: "Failed ignition coil" },
        { stepId: "plug", title: "Fouled plug" },
        { stepId: "fuel", title: "Old fuel in the tank" },
      ],
    });
    const builtIn = res.body.flows.find((f: { flowId: string }) => f.flowId === "handheld-2-stroke-no-start");
    expect(builtIn.findings.length).toBeGreaterThan(1);
    expect(res.body.flows.map((f: { title: string }) => f.title)).toEqual([...res.body.flows.map((f: { title: string }) => f.title)].sort());
  });

  it("holds a tech to their own sessions", async () => {
    const res = await ash.agent.get("/api/review/options");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      techs: [{ id: ash.user.id, name: "Ash Penrose" }],
      flows: [{ flowId, title: "Options trimmer", findings: [{ stepId: "coil", title: "Failed ignition coil" }, { stepId: "fuel", title: "Stale fuel" }] }],
    });
  });

  it("gives a tech with no sessions empty lists", async () => {
    const res = await idle.agent.get("/api/review/options");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ techs: [], flows: [] });
  });

  it("refuses parameters it does not take, naming them", async () => {
    const res = await lead.agent.get("/api/review/options?techId=someone");
    expect(res.status).toBe(400);
    expect(res.body.error.id).toBe("invalid_input");
    expect(res.body.error.details.formErrors.join(" ")).toContain("techId");
  });
});
