import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildFlow, flowDefinition } from "../../factories/flows.ts";
import { buildSession } from "../../factories/sessions.ts";
import { buildWorkOrder } from "../../factories/work-orders.ts";
import { auditLog, flowDrafts } from "../../../server/db/schema.ts";
import { flowListResponseSchema, flowDetailSchema, flowVersionSchema, type FlowListItem } from "../../../shared/schemas/flows.ts";

let t: TestApp;
let apprentice: Awaited<ReturnType<typeof signedInAs>>;
let senior: Awaited<ReturnType<typeof signedInAs>>;
let lead: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  t = await createTestApp();
  [apprentice, senior, lead] = [await signedInAs(t, "apprentice"), await signedInAs(t, "senior_tech"), await signedInAs(t, "shop_lead")];
});
afterAll(() => t.close());

const rowOf = (body: unknown, id: string): FlowListItem | undefined => flowListResponseSchema.parse(body).flows.find((f) => f.id === id);

describe("POST /api/flows", () => {
  it("creates the flow with a draft of one finding step and publishes nothing; the same id again is 409", async () => {
    const res = await senior.agent.post("/api/flows").send({ id: "pull-cord-stuck", title: "Pull cord will not pull" });
    expect(res.status).toBe(201);
    const detail = flowDetailSchema.parse(res.body);
    expect(detail).toMatchObject({ id: "pull-cord-stuck", title: "Pull cord will not pull", retired: false, versions: [] });
    expect(detail.draft).toMatchObject({ revision: 1, basedOnVersion: null, updatedBy: { id: senior.user.id, name: senior.user.name } });
    expect(detail.draft!.definition).toMatchObject({ formatVersion: 1, id: "pull-cord-stuck", title: "Pull cord will not pull", start: "finding" });
    expect(detail.draft!.problems.map((p) => [p.code, p.severity])).toEqual([["finding_without_repairs", "warning"]]);
    const again = await lead.agent.post("/api/flows").send({ id: "pull-cord-stuck", title: "Another" });
    expect(again.status).toBe(409);
    expect(again.body.error.id).toBe("flow_exists");
    const audit = await t.ctx.db.select().from(auditLog).where(eq(auditLog.recordId, "pull-cord-stuck"));
    expect(audit.map((a) => a.action)).toEqual(["flow.created"]);
  });

  it("checks the id and the title beside their fields", async () => {
    const res = await senior.agent.post("/api/flows").send({ id: "Not A Slug", title: " " });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.details.fieldErrors).sort()).toEqual(["id", "title"]);
  });

  it("is refused to an apprentice", async () => {
    const res = await apprentice.agent.post("/api/flows").send({ id: "apprentice-flow", title: "Mine" });
    expect(res.status).toBe(403);
  });
});

describe("GET /api/flows", () => {
  it("lists the published version, the draft with its error count, who edited last and the sessions on every version", async () => {
    const published = await buildFlow(t.ctx.db, { versions: [flowDefinition("list-published"), flowDefinition("list-published")], id: "list-published", createdBy: lead.user.id, title: "A listed flow" });
    await buildSession(t.ctx.db, { flowVersionId: published.versionIds[0]! });
    await buildSession(t.ctx.db, { flowVersionId: published.versionIds[1]! });
    const broken = { ...flowDefinition("list-drafted"), start: "nowhere" };
    await buildFlow(t.ctx.db, { id: "list-drafted", versions: [flowDefinition("list-drafted")], draft: broken, createdBy: senior.user.id });

    const res = await senior.agent.get("/api/flows");
    expect(res.status).toBe(200);
    expect(rowOf(res.body, "list-published")).toEqual({
      id: "list-published",
      title: "A listed flow",
      appliesTo: { equipment: ["string_trimmer"], cycle: 2 },
      retired: false,
      published: { number: 2, createdAt: expect.any(String), createdBy: { id: lead.user.id, name: lead.user.name } },
      draft: null,
      lastEditedBy: { id: lead.user.id, name: lead.user.name },
      sessionCount: 2,
    });
    const drafted = rowOf(res.body, "list-drafted")!;
    expect(drafted.draft).toMatchObject({ revision: 1, errorCount: 1, updatedBy: { id: senior.user.id } });
    expect(drafted.lastEditedBy).toEqual({ id: senior.user.id, name: senior.user.name });
    // The built-in flows (installed by the session factory) have no author.
    expect(rowOf(res.body, "handheld-2-stroke-no-start")).toMatchObject({ published: { number: 1, createdBy: null }, lastEditedBy: null });
  });

  it("shows an apprentice only published, unretired flows and never a draft", async () => {
    await buildFlow(t.ctx.db, { id: "hidden-draft-only", draft: flowDefinition("hidden-draft-only") });
    await buildFlow(t.ctx.db, { id: "hidden-retired", versions: [flowDefinition("hidden-retired")], retired: true });
    await buildFlow(t.ctx.db, { id: "shown-with-draft", versions: [flowDefinition("shown-with-draft")], draft: flowDefinition("shown-with-draft"), createdBy: lead.user.id, draftBy: senior.user.id });
    const res = await apprentice.agent.get("/api/flows");
    expect(res.status).toBe(200);
    const ids = flowListResponseSchema.parse(res.body).flows.map((f) => f.id);
    expect(ids).toContain("shown-with-draft");
    expect(ids).not.toContain("hidden-draft-only");
    expect(ids).not.toContain("hidden-retired");
    expect(flowListResponseSchema.parse(res.body).flows.every((f) => f.draft === null)).toBe(true);
    // The version's author: the draft's editor is not shown to an apprentice.
    expect(rowOf(res.body, "shown-with-draft")!.lastEditedBy).toEqual({ id: lead.user.id, name: lead.user.name });
    const editors = await lead.agent.get("/api/flows");
    expect(rowOf(editors.body, "hidden-retired")!.retired).toBe(true);
    expect(rowOf(editors.body, "hidden-draft-only")!.published).toBeNull();
    expect(rowOf(editors.body, "shown-with-draft")!.lastEditedBy).toEqual({ id: senior.user.id, name: senior.user.name });
  });
});

describe("GET /api/flows/:id and its versions", () => {
  it("gives versions newest first and, to editors, the draft with the validator's problems", async () => {
    const draft = { ...flowDefinition("detail-flow"), id: "renamed-flow" };
    await buildFlow(t.ctx.db, { id: "detail-flow", versions: [flowDefinition("detail-flow", { firstTitle: "First" }), flowDefinition("detail-flow", { firstTitle: "Second" })], draft, createdBy: lead.user.id });
    const res = await senior.agent.get("/api/flows/detail-flow");
    expect(res.status).toBe(200);
    const detail = flowDetailSchema.parse(res.body);
    expect(detail.versions.map((v) => [v.number, v.note, v.sessionCount])).toEqual([
      [2, "Version 2", 0],
      [1, "Version 1", 0],
    ]);
    expect(detail.draft!.problems.map((p) => p.code)).toEqual(["flow_id_mismatch"]);
    expect(detail.draft!.basedOnVersion).toBe(2);

    const asApprentice = await apprentice.agent.get("/api/flows/detail-flow");
    expect(asApprentice.status).toBe(200);
    expect(asApprentice.body.draft).toBeNull();

    const v1 = await apprentice.agent.get("/api/flows/detail-flow/versions/1");
    expect(v1.status).toBe(200);
    const version = flowVersionSchema.parse(v1.body);
    expect(version).toMatchObject({ flowId: "detail-flow", number: 1, note: "Version 1", createdBy: { id: lead.user.id } });
    expect((version.definition.steps as { look: { title: string } }).look.title).toBe("First");
    expect((await senior.agent.get("/api/flows/detail-flow/versions/3")).status).toBe(404);
    expect((await senior.agent.get("/api/flows/detail-flow/versions/zero")).status).toBe(400);
    expect((await senior.agent.get("/api/flows/no-such-flow")).status).toBe(404);
  });

  it("hides unpublished and retired flows from an apprentice with 404", async () => {
    await buildFlow(t.ctx.db, { id: "apprentice-unpublished", draft: flowDefinition("apprentice-unpublished") });
    await buildFlow(t.ctx.db, { id: "apprentice-retired", versions: [flowDefinition("apprentice-retired")], retired: true });
    for (const path of ["/api/flows/apprentice-unpublished", "/api/flows/apprentice-retired", "/api/flows/apprentice-retired/versions/1", "/api/flows/apprentice-retired/advice"]) {
      expect((await apprentice.agent.get(path)).status, path).toBe(404);
    }
    expect((await senior.agent.get("/api/flows/apprentice-retired/versions/1")).status).toBe(200);
  });

  it("refuses an apprentice every change with 403 and leaves the draft as it was", async () => {
    await buildFlow(t.ctx.db, { id: "apprentice-edit", versions: [flowDefinition("apprentice-edit")], draft: flowDefinition("apprentice-edit") });
    const changes: [string, PromiseLike<{ status: number }>][] = [
      ["PUT draft", apprentice.agent.put("/api/flows/apprentice-edit/draft").send({ revision: 1, definition: { id: "apprentice-edit" } })],
      ["publish", apprentice.agent.post("/api/flows/apprentice-edit/publish").send({ revision: 1, note: "Mine now" })],
      ["DELETE draft", apprentice.agent.delete("/api/flows/apprentice-edit/draft")],
      ["POST draft", apprentice.agent.post("/api/flows/apprentice-edit/draft").send({})],
      ["retire", apprentice.agent.patch("/api/flows/apprentice-edit").send({ retired: true })],
      ["import", apprentice.agent.post("/api/flows/import").send(flowDefinition("apprentice-import"))],
      ["export draft", apprentice.agent.get("/api/flows/apprentice-edit/export?version=draft")],
    ];
    for (const [what, request] of changes) expect((await request).status, what).toBe(403);
    const [draft] = await t.ctx.db.select().from(flowDrafts).where(eq(flowDrafts.flowId, "apprentice-edit"));
    expect(draft!.revision).toBe(1);
    expect(draft!.definition).toEqual(flowDefinition("apprentice-edit"));
  });
});

describe("PATCH /api/flows/:id (retire)", () => {
  it("offers a retired flow to no new session, while a running session goes on replaying on its version", async () => {
    const flow = await buildFlow(t.ctx.db, { id: "retire-me", title: "Retire me", versions: [flowDefinition("retire-me")] });
    const wo = await buildWorkOrder(t.ctx.db);
    const started = await apprentice.agent.post(`/api/work-orders/${wo.id}/sessions`).send({ flowId: "retire-me" });
    expect(started.status).toBe(201);

    const retired = await lead.agent.patch("/api/flows/retire-me").send({ retired: true });
    expect(retired.status).toBe(200);
    expect(flowDetailSchema.parse(retired.body).retired).toBe(true);

    const other = await buildWorkOrder(t.ctx.db);
    const detail = await apprentice.agent.get(`/api/work-orders/${other.id}`);
    expect(detail.body.applicableFlows.map((f: { flowId: string }) => f.flowId)).not.toContain("retire-me");
    const refused = await senior.agent.post(`/api/work-orders/${other.id}/sessions`).send({ flowId: "retire-me" });
    expect(refused.status).toBe(422);
    expect(refused.body.error.id).toBe("flow_retired");

    const event = { id: "0190f0c0-0000-7000-8000-00000000a001", seq: 1, recordedAt: new Date().toISOString(), event: { type: "step.answer", stepId: "look", value: "no" } };
    const answered = await apprentice.agent.post(`/api/sessions/${started.body.id}/events`).send(event);
    expect(answered.status).toBe(201);
    expect(answered.body.findingStepId).toBe("coil");
    const reread = await apprentice.agent.get(`/api/sessions/${started.body.id}`);
    expect(reread.body.flow).toMatchObject({ flowId: "retire-me", versionId: flow.versionIds[0], version: 1 });
    expect((await apprentice.agent.post(`/api/sessions/${started.body.id}/complete`)).status).toBe(200);

    const back = await senior.agent.patch("/api/flows/retire-me").send({ retired: false });
    expect(back.body.retired).toBe(false);
    expect((await senior.agent.post(`/api/work-orders/${other.id}/sessions`).send({ flowId: "retire-me" })).status).toBe(201);
    const audit = await t.ctx.db.select().from(auditLog).where(eq(auditLog.recordId, "retire-me"));
    expect(audit.map((a) => a.action)).toEqual(["flow.retired", "flow.restored"]);
  });

  it("answers 404 for an unknown flow and 400 without a boolean", async () => {
    expect((await lead.agent.patch("/api/flows/no-such-flow").send({ retired: true })).status).toBe(404);
    expect((await lead.agent.patch("/api/flows/retire-me").send({ retired: "yes" })).status).toBe(400);
  });
});
