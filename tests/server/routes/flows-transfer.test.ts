import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildFlow, flowDefinition } from "../../factories/flows.ts";
import { HANDHELD_2_STROKE } from "../../factories/sessions.ts";
import { auditLog, flowDrafts, flowVersions, flows } from "../../../server/db/schema.ts";
import { installBuiltInFlows } from "../../../server/services/flows.ts";
import { importResponseSchema, MAX_IMPORT_BYTES } from "../../../shared/schemas/flows.ts";

let t: TestApp;
let apprentice: Awaited<ReturnType<typeof signedInAs>>;
let senior: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  t = await createTestApp();
  await installBuiltInFlows(t.ctx.db);
  [apprentice, senior] = [await signedInAs(t, "apprentice"), await signedInAs(t, "senior_tech")];
});
afterAll(() => t.close());

/** supertest gives a JSON download as text only when told to buffer it. */
async function download(agent: typeof senior.agent, path: string) {
  const res = await agent.get(path).buffer(true).parse((r, done) => {
    let text = "";
    r.setEncoding("utf8");
    r.on("data", (chunk: string) => (text += chunk));
    r.on("end", () => done(null, text));
  });
  return { res, text: res.body as string };
}

const importFile = (text: string, type = "application/json") => senior.agent.post("/api/flows/import").set("Content-Type", type).send(text);

describe("GET /api/flows/:id/export", () => {
  it("sends a version as an attachment named <id>-v<N>.json, with formatVersion first", async () => {
    const { res, text } = await download(apprentice.agent, `/api/flows/${HANDHELD_2_STROKE}/export?version=1`);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("application/json; charset=utf-8");
    expect(res.headers["content-disposition"]).toBe(`attachment; filename="${HANDHELD_2_STROKE}-v1.json"`);
    const file = JSON.parse(text) as Record<string, unknown>;
    expect(Object.keys(file)[0]).toBe("formatVersion");
    const [stored] = await t.ctx.db.select().from(flowVersions).where(eq(flowVersions.flowId, HANDHELD_2_STROKE));
    expect(file).toEqual(stored!.definition);
    // Without a version: the latest.
    expect((await download(apprentice.agent, `/api/flows/${HANDHELD_2_STROKE}/export`)).res.headers["content-disposition"]).toContain("-v1.json");
    expect((await senior.agent.get(`/api/flows/${HANDHELD_2_STROKE}/export?version=9`)).status).toBe(404);
    expect((await senior.agent.get(`/api/flows/${HANDHELD_2_STROKE}/export?version=latest`)).status).toBe(400);
  });

  it("sends the draft to editors as <id>-draft.json, adding formatVersion when the draft lacks it", async () => {
    const { formatVersion: _f, ...draft } = flowDefinition("export-draft");
    await buildFlow(t.ctx.db, { id: "export-draft", versions: [flowDefinition("export-draft")], draft });
    const { res, text } = await download(senior.agent, "/api/flows/export-draft/export?version=draft");
    expect(res.status).toBe(200);
    expect(res.headers["content-disposition"]).toBe('attachment; filename="export-draft-draft.json"');
    expect(JSON.parse(text)).toEqual({ formatVersion: 1, ...draft });
    expect((await apprentice.agent.get("/api/flows/export-draft/export?version=draft")).status).toBe(403);
  });
});

describe("export then import", () => {
  it("round-trips a version: the file comes back as a draft equal to it, and publishes as an identical version", async () => {
    const { text } = await download(senior.agent, `/api/flows/${HANDHELD_2_STROKE}/export?version=1`);
    const res = await importFile(text);
    expect(res.status).toBe(201);
    expect(importResponseSchema.parse(res.body)).toEqual({ flowId: HANDHELD_2_STROKE, created: false, revision: 1, problems: [] });
    const detail = await senior.agent.get(`/api/flows/${HANDHELD_2_STROKE}`);
    expect(detail.body.draft).toMatchObject({ revision: 1, basedOnVersion: null, problems: [] });
    expect(detail.body.draft.definition).toEqual(JSON.parse(text));

    const published = await senior.agent.post(`/api/flows/${HANDHELD_2_STROKE}/publish`).send({ revision: 1, note: "Re-imported" });
    expect(published.status).toBe(201);
    expect(published.body.number).toBe(2);
    const v2 = await senior.agent.get(`/api/flows/${HANDHELD_2_STROKE}/versions/2`);
    const v1 = await senior.agent.get(`/api/flows/${HANDHELD_2_STROKE}/versions/1`);
    expect(v2.body.definition).toEqual(v1.body.definition);
  });

  it("creates a new flow from a file with a new id, titled from the file", async () => {
    const { text } = await download(senior.agent, `/api/flows/${HANDHELD_2_STROKE}/export?version=1`);
    const file = { ...JSON.parse(text), id: "shop-copy", title: "Our own handheld check" };
    const res = await importFile(JSON.stringify(file));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ flowId: "shop-copy", created: true, revision: 1, problems: [] });
    const [row] = await t.ctx.db.select().from(flows).where(eq(flows.id, "shop-copy"));
    expect(row).toMatchObject({ title: "Our own handheld check", retired: false });
    expect((await t.ctx.db.select().from(flowVersions).where(eq(flowVersions.flowId, "shop-copy"))).length).toBe(0);
    const audit = await t.ctx.db.select().from(auditLog).where(eq(auditLog.recordId, "shop-copy"));
    expect(audit.map((a) => [a.action, a.details])).toEqual([["flow.imported", { created: true, errorCount: 0 }]]);
  });
});

describe("POST /api/flows/import", () => {
  it("answers 400 malformed_json for a file that is not JSON, or is empty", async () => {
    const res = await importFile('{"id": "broken", "title": ');
    expect(res.status).toBe(400);
    expect(res.body.error.id).toBe("malformed_json");
    expect(res.body.error.message).toMatch(/not valid JSON/);
    expect((await importFile("")).body.error.id).toBe("malformed_json");
    // Invalid UTF-8 is not JSON text either.
    const bad = await senior.agent.post("/api/flows/import").set("Content-Type", "application/json").send(Buffer.from([0x7b, 0xff, 0x7d]));
    expect(bad.status).toBe(400);
  });

  it("answers 413 with a clear message above MAX_IMPORT_BYTES, and takes a file just under it", async () => {
    const padding = (n: number) => JSON.stringify({ ...flowDefinition("big-import"), notes: "x".repeat(n) });
    const base = padding(0).length;
    const over = await importFile(padding(MAX_IMPORT_BYTES - base + 1));
    expect(over.status).toBe(413);
    expect(over.body.error).toMatchObject({ id: "payload_too_large" });
    expect(over.body.error.message).toBe("The file is larger than 1 MiB (1,048,576 bytes), the most a flow file may be.");
    const under = await importFile(padding(MAX_IMPORT_BYTES - base));
    expect(under.status).toBe(201);
    expect(under.body.problems.map((p: { code: string }) => p.code)).toEqual(["schema_invalid"]);
  });

  it("answers 400 for a body that is not an object with a valid flow id", async () => {
    for (const body of ["[]", '"a flow"', "42", "null", '{"title": "No id"}', '{"id": "Not A Slug"}', '{"id": 7}']) {
      const res = await importFile(body);
      expect(res.status, body).toBe(400);
      expect(res.body.error.id, body).toBe("invalid_flow_file");
    }
  });

  it("takes an invalid flow as a draft and answers its problems, whatever the content type", async () => {
    const res = await importFile(JSON.stringify({ formatVersion: 1, id: "half-written", title: "Half written", start: "look", steps: { look: { kind: "choice", title: "Which?", options: [] } } }), "text/plain");
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ flowId: "half-written", created: true, revision: 1 });
    expect(res.body.problems.length).toBeGreaterThan(0);
    expect(res.body.problems.every((p: { severity: string }) => ["error", "warning"].includes(p.severity))).toBe(true);
    const detail = await senior.agent.get("/api/flows/half-written");
    expect(detail.body.draft.problems).toEqual(res.body.problems);
    expect((await senior.agent.post("/api/flows/half-written/publish").send({ revision: 1, note: "Not yet" })).status).toBe(422);
  });

  it("refuses a file for a flow that already has a draft with 409 draft_exists, touching neither the draft nor the versions", async () => {
    const draft = flowDefinition("busy-flow", { firstTitle: "Work in progress" });
    await buildFlow(t.ctx.db, { id: "busy-flow", versions: [flowDefinition("busy-flow")], draft, draftRevision: 4 });
    const res = await importFile(JSON.stringify(flowDefinition("busy-flow", { firstTitle: "From a file" })));
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ id: "draft_exists", details: { revision: 4 } });
    const [row] = await t.ctx.db.select().from(flowDrafts).where(eq(flowDrafts.flowId, "busy-flow"));
    expect(row).toMatchObject({ revision: 4, definition: draft });
    const versions = await t.ctx.db.select().from(flowVersions).where(eq(flowVersions.flowId, "busy-flow"));
    expect(versions.map((v) => v.definition)).toEqual([flowDefinition("busy-flow")]);
  });

  it("is refused to an apprentice before the file is read", async () => {
    const res = await apprentice.agent.post("/api/flows/import").set("Content-Type", "application/json").send("not even json");
    expect(res.status).toBe(403);
  });
});
