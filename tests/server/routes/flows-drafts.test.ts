import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildFlow, flowDefinition } from "../../factories/flows.ts";
import { buildWorkOrder } from "../../factories/work-orders.ts";
import { auditLog, flowDrafts, flowVersions } from "../../../server/db/schema.ts";
import { flowDetailSchema, publishResponseSchema, saveDraftResponseSchema, staleDraftDetailsSchema } from "../../../shared/schemas/flows.ts";
import type { FlowDefinition } from "../../../shared/flow/schema.ts";

let t: TestApp;
let tech: Awaited<ReturnType<typeof signedInAs>>;
let senior: Awaited<ReturnType<typeof signedInAs>>;
let lead: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  t = await createTestApp();
  [tech, senior, lead] = [await signedInAs(t, "apprentice"), await signedInAs(t, "senior_tech"), await signedInAs(t, "shop_lead")];
});
afterAll(() => t.close());

/** Version 2 of the test flow: a third answer leading to a new finding. */
function withCarburettor(id: string): FlowDefinition {
  const d = flowDefinition(id, { firstTitle: "What does the spark tester show?" });
  const look = d.steps.look as Extract<FlowDefinition["steps"][string], { kind: "choice" }>;
  look.options.push({ value: "weak", label: "A weak spark", next: "carb" });
  d.steps.carb = { kind: "finding", title: "Varnished carburettor", certainty: "likely", explanation: "Weak spark and fuel smell.", repairs: [{ title: "Clean the carburettor", labourHours: 1, parts: [] }] };
  return d;
}

const answer = (seq: number, value: string) => ({ id: uuidv7(), seq, recordedAt: new Date().toISOString(), event: { type: "step.answer", stepId: "look", value } });

async function startSession(flowId: string) {
  const wo = await buildWorkOrder(t.ctx.db);
  const res = await tech.agent.post(`/api/work-orders/${wo.id}/sessions`).send({ flowId });
  expect(res.status).toBe(201);
  return res.body as { id: string; flow: { version: number } };
}

describe("versioning", () => {
  it("publishes the draft as v2 while v1 stays as it was; a session started before keeps replaying on v1, a new one pins v2", async () => {
    const v1 = flowDefinition("versioned");
    await buildFlow(t.ctx.db, { id: "versioned", versions: [v1] });
    const before = await startSession("versioned");
    expect(before.flow.version).toBe(1);

    const started = await senior.agent.post("/api/flows/versioned/draft").send({});
    expect(started.status).toBe(201);
    const draft = flowDetailSchema.parse(started.body).draft!;
    expect(draft).toMatchObject({ revision: 1, basedOnVersion: 1, problems: [] });
    expect(draft.definition).toEqual(v1);
    expect((await lead.agent.post("/api/flows/versioned/draft").send({})).body.error.id).toBe("draft_exists");

    const saved = await senior.agent.put("/api/flows/versioned/draft").send({ revision: 1, definition: withCarburettor("versioned") });
    expect(saved.status).toBe(200);
    expect(saveDraftResponseSchema.parse(saved.body)).toMatchObject({ revision: 2, problems: [] });

    const published = await lead.agent.post("/api/flows/versioned/publish").send({ revision: 2, note: "Weak spark leads to the carburettor" });
    expect(published.status).toBe(201);
    expect(publishResponseSchema.parse(published.body)).toMatchObject({ number: 2, note: "Weak spark leads to the carburettor", createdBy: { id: lead.user.id }, sessionCount: 0 });

    const detail = flowDetailSchema.parse((await senior.agent.get("/api/flows/versioned")).body);
    expect(detail.draft).toBeNull();
    expect(detail.versions.map((v) => [v.number, v.sessionCount])).toEqual([
      [2, 0],
      [1, 1],
    ]);
    const stored = await t.ctx.db.select().from(flowVersions).where(eq(flowVersions.flowId, "versioned"));
    expect(stored.find((v) => v.number === 1)!.definition).toEqual(v1);
    expect(stored.find((v) => v.number === 2)!.definition).toEqual({ ...withCarburettor("versioned"), sections: {} });
    expect((await senior.agent.get("/api/flows/versioned/versions/1")).body.definition).toEqual(v1);

    // The old session replays on v1: v2's new answer is refused, v1's answers still work.
    expect((await tech.agent.post(`/api/sessions/${before.id}/events`).send(answer(1, "weak"))).status).toBe(422);
    const ok = await tech.agent.post(`/api/sessions/${before.id}/events`).send(answer(1, "no"));
    expect(ok.status).toBe(201);
    expect(ok.body.findingStepId).toBe("coil");
    const reread = await tech.agent.get(`/api/sessions/${before.id}`);
    expect(reread.body.flow.version).toBe(1);
    expect(reread.body.definition.steps.look.title).toBe(v1.steps.look!.title);

    const after = await startSession("versioned");
    expect(after.flow.version).toBe(2);
    const weak = await tech.agent.post(`/api/sessions/${after.id}/events`).send(answer(1, "weak"));
    expect(weak.status).toBe(201);
    expect(weak.body.findingStepId).toBe("carb");

    const audit = await t.ctx.db.select().from(auditLog).where(eq(auditLog.recordId, "versioned"));
    expect(audit.map((a) => a.action)).toEqual(["flow.draft_started", "flow.published"]);
    expect(audit[1]!.details).toMatchObject({ version: 2, revision: 2, basedOnVersion: 1 });
  });

  it("embeds the library sections the draft reaches in the published version", async () => {
    const d = flowDefinition("with-section");
    d.start = "spark";
    d.steps.spark = { kind: "section", title: "Check for spark", section: "spark-check", next: "look" };
    await buildFlow(t.ctx.db, { id: "with-section", draft: d });
    const res = await senior.agent.post("/api/flows/with-section/publish").send({ revision: 1, note: "First version" });
    expect(res.status).toBe(201);
    expect(res.body.number).toBe(1);
    const [stored] = await t.ctx.db.select().from(flowVersions).where(eq(flowVersions.flowId, "with-section"));
    expect(Object.keys(stored!.definition.sections ?? {})).toEqual(["spark-check"]);
    // Now published, it is offered for a 2-stroke string trimmer.
    expect((await startSession("with-section")).flow.version).toBe(1);
  });

  it("starts a draft from an older version when asked, and 404 for a version that does not exist", async () => {
    await buildFlow(t.ctx.db, { id: "from-old", versions: [flowDefinition("from-old", { firstTitle: "Old" }), flowDefinition("from-old", { firstTitle: "New" })] });
    expect((await senior.agent.post("/api/flows/from-old/draft").send({ fromVersion: 3 })).status).toBe(404);
    const res = await senior.agent.post("/api/flows/from-old/draft").send({ fromVersion: 1 });
    expect(res.status).toBe(201);
    expect(res.body.draft).toMatchObject({ basedOnVersion: 1, definition: { steps: { look: { title: "Old" } } } });
    expect((await senior.agent.post("/api/flows/no-such-flow/draft").send({})).status).toBe(404);
  });
});

describe("PUT /api/flows/:id/draft", () => {
  it("refuses the second of two saves from the same revision with 409 draft_stale, and overwrites nothing", async () => {
    const original = flowDefinition("contested");
    await buildFlow(t.ctx.db, { id: "contested", versions: [original], draft: original });
    const mine = flowDefinition("contested", { firstTitle: "Senior's wording" });
    const theirs = flowDefinition("contested", { firstTitle: "Lead's wording" });

    const first = await senior.agent.put("/api/flows/contested/draft").send({ revision: 1, definition: mine });
    expect(first.status).toBe(200);
    expect(first.body.revision).toBe(2);
    const second = await lead.agent.put("/api/flows/contested/draft").send({ revision: 1, definition: theirs });
    expect(second.status).toBe(409);
    expect(second.body.error.id).toBe("draft_stale");
    const details = staleDraftDetailsSchema.parse(second.body.error.details);
    expect(details).toEqual({ revision: 2, definition: mine, updatedBy: { id: senior.user.id, name: senior.user.name }, updatedAt: first.body.updatedAt });

    const [row] = await t.ctx.db.select().from(flowDrafts).where(eq(flowDrafts.flowId, "contested"));
    expect(row).toMatchObject({ revision: 2, definition: mine, updatedBy: senior.user.id });
    // A publish from the stale revision is refused the same way.
    const stalePublish = await lead.agent.post("/api/flows/contested/publish").send({ revision: 1, note: "Mine" });
    expect(stalePublish.status).toBe(409);
    expect(stalePublish.body.error.id).toBe("draft_stale");
    expect((await t.ctx.db.select().from(flowVersions).where(eq(flowVersions.flowId, "contested"))).length).toBe(1);
  });

  it("lets exactly one of two saves sent at once through", async () => {
    await buildFlow(t.ctx.db, { id: "racing", draft: flowDefinition("racing") });
    const results = await Promise.all([
      senior.agent.put("/api/flows/racing/draft").send({ revision: 1, definition: flowDefinition("racing", { firstTitle: "A" }) }),
      lead.agent.put("/api/flows/racing/draft").send({ revision: 1, definition: flowDefinition("racing", { firstTitle: "B" }) }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    const winner = results.find((r) => r.status === 200)!;
    const [row] = await t.ctx.db.select().from(flowDrafts).where(eq(flowDrafts.flowId, "racing"));
    expect(row!.revision).toBe(2);
    expect((row!.definition as FlowDefinition).steps.look!.title).toBe(winner === results[0] ? "A" : "B");
  });

  it("saves an invalid draft and answers its problems, and a draft larger than the API's usual 100 kB", async () => {
    await buildFlow(t.ctx.db, { id: "unfinished", draft: flowDefinition("unfinished") });
    const broken = { ...flowDefinition("unfinished"), start: "missing-step", id: "other-id" };
    const res = await senior.agent.put("/api/flows/unfinished/draft").send({ revision: 1, definition: broken });
    expect(res.status).toBe(200);
    expect(res.body.revision).toBe(2);
    expect(res.body.problems.map((p: { code: string }) => p.code)).toEqual(["flow_id_mismatch", "start_missing"]);
    const big = { ...flowDefinition("unfinished"), summary: "x".repeat(500), notes: "y".repeat(300_000) };
    const large = await senior.agent.put("/api/flows/unfinished/draft").send({ revision: 2, definition: big });
    expect(large.status).toBe(200);
    expect(large.body.problems.map((p: { code: string }) => p.code)).toEqual(["schema_invalid"]);
    const tooBig = await senior.agent.put("/api/flows/unfinished/draft").send({ revision: 3, definition: { ...big, notes: "y".repeat(1024 * 1024) } });
    expect(tooBig.status).toBe(413);
    expect(tooBig.body.error.message).toContain("1 MiB");
  });

  it("answers 404 when there is no draft, and 400 for a definition that is not an object", async () => {
    await buildFlow(t.ctx.db, { id: "no-draft", versions: [flowDefinition("no-draft")] });
    expect((await senior.agent.put("/api/flows/no-draft/draft").send({ revision: 1, definition: flowDefinition("no-draft") })).status).toBe(404);
    expect((await senior.agent.put("/api/flows/no-draft/draft").send({ revision: 1, definition: [] })).status).toBe(400);
  });
});

describe("POST /api/flows/:id/publish", () => {
  it("refuses a draft with errors with 422 and its problems, and keeps the draft", async () => {
    const broken = flowDefinition("has-errors");
    (broken.steps.look as { options: { next: string }[] }).options[0]!.next = "nowhere";
    await buildFlow(t.ctx.db, { id: "has-errors", versions: [flowDefinition("has-errors")], draft: broken });
    const res = await senior.agent.post("/api/flows/has-errors/publish").send({ revision: 1, note: "Try it" });
    expect(res.status).toBe(422);
    expect(res.body.error.id).toBe("draft_has_errors");
    expect(res.body.error.details.problems).toContainEqual(expect.objectContaining({ stepId: "look", code: "target_unknown", severity: "error" }));
    expect((await t.ctx.db.select().from(flowVersions).where(eq(flowVersions.flowId, "has-errors"))).length).toBe(1);
    expect((await t.ctx.db.select().from(flowDrafts).where(eq(flowDrafts.flowId, "has-errors"))).length).toBe(1);
  });

  it("refuses a definition whose id is not the flow's", async () => {
    await buildFlow(t.ctx.db, { id: "id-kept", draft: flowDefinition("id-changed") });
    const res = await senior.agent.post("/api/flows/id-kept/publish").send({ revision: 1, note: "Rename" });
    expect(res.status).toBe(422);
    expect(res.body.error.details.problems.map((p: { code: string }) => p.code)).toEqual(["flow_id_mismatch"]);
  });

  it("publishes with warnings, asks for a note, and answers 404 without a draft", async () => {
    const created = await senior.agent.post("/api/flows").send({ id: "just-a-finding", title: "Just a finding" });
    expect(created.body.draft.problems.map((p: { severity: string }) => p.severity)).toEqual(["warning"]);
    expect((await senior.agent.post("/api/flows/just-a-finding/publish").send({ revision: 1, note: " " })).status).toBe(400);
    expect((await senior.agent.post("/api/flows/just-a-finding/publish").send({ revision: 1, note: "First" })).status).toBe(201);
    expect((await senior.agent.post("/api/flows/just-a-finding/publish").send({ revision: 1, note: "Again" })).status).toBe(404);
  });
});

describe("DELETE /api/flows/:id/draft", () => {
  it("discards the draft, leaving the versions; a flow never published then starts again from one finding", async () => {
    await buildFlow(t.ctx.db, { id: "discard-me", versions: [flowDefinition("discard-me")], draft: withCarburettor("discard-me") });
    expect((await senior.agent.delete("/api/flows/discard-me/draft")).status).toBe(204);
    expect((await senior.agent.delete("/api/flows/discard-me/draft")).status).toBe(404);
    const detail = flowDetailSchema.parse((await senior.agent.get("/api/flows/discard-me")).body);
    expect(detail.draft).toBeNull();
    expect(detail.versions).toHaveLength(1);

    await senior.agent.post("/api/flows").send({ id: "never-published", title: "Never published" });
    expect((await senior.agent.delete("/api/flows/never-published/draft")).status).toBe(204);
    const again = await senior.agent.post("/api/flows/never-published/draft").send({});
    expect(again.status).toBe(201);
    expect(again.body.draft).toMatchObject({ basedOnVersion: null, definition: { id: "never-published", start: "finding" } });
  });
});
