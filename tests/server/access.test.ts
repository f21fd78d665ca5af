import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { createTestApp, type TestApp } from "./helpers/test-app.ts";
import { accessMatrix, type AccessFixtures, type Who } from "./access-matrix.ts";
import { buildUser } from "../factories/users.ts";
import { buildSession } from "../factories/sessions.ts";
import { buildWorkOrder } from "../factories/work-orders.ts";
import { buildFlow, flowDefinition } from "../factories/flows.ts";
import { installBuiltInFlows } from "../../server/services/flows.ts";
import { savePhoto } from "../../server/services/attachments.ts";
import { makeImage } from "../factories/images.ts";
import type { Role } from "../../shared/schemas/users.ts";
import { apiResources, listRoutes } from "../../server/routes/index.ts";
import { roles } from "../../shared/schemas/users.ts";

let t: TestApp;
let uploads: string;
let fixtures: AccessFixtures;
const users = new Map<Role, Awaited<ReturnType<typeof buildUser>>>();
beforeAll(async () => {
  uploads = mkdtempSync(path.join(tmpdir(), "bp-access-"));
  t = await createTestApp({ UPLOADS_DIR: uploads });
  await installBuiltInFlows(t.ctx.db);
  for (const role of roles) users.set(role, await buildUser(t.ctx.db, { role }));
  const workOrderId = (await buildWorkOrder(t.ctx.db)).id;
  const ownSessionId = {} as Record<Role, string>;
  for (const role of roles) ownSessionId[role] = (await buildSession(t.ctx.db, { techId: users.get(role)!.id })).id;
  const foreign = await buildSession(t.ctx.db);
  const lead = { ...users.get("shop_lead")!, role: "shop_lead" as const };
  const png = await makeImage("png");
  const workOrderPhotoId = (await savePhoto(t.ctx, lead, { type: "work_order", id: workOrderId, stepId: null }, png)).id;
  const foreignPhotoId = (await savePhoto(t.ctx, lead, { type: "session", id: foreign.id, stepId: "prepare/as-received" }, png)).id;
  const draftOnlyFlowId = (await buildFlow(t.ctx.db, { draft: flowDefinition("matrix-draft-only") as unknown as Record<string, unknown>, id: "matrix-draft-only" })).id;
  fixtures = { workOrderId, ownSessionId, foreignSessionId: foreign.id, workOrderPhotoId, foreignPhotoId, draftOnlyFlowId };
});
afterAll(async () => {
  await t.close();
  rmSync(uploads, { recursive: true, force: true });
});

describe("access matrix", () => {
  it("lists every route the app registers, and nothing it does not", () => {
    const registered = listRoutes(apiResources(t.ctx)).map((r) => `${r.method} ${r.path}`).sort();
    const listed = [...new Set(accessMatrix.map((r) => `${r.method} ${r.route}`))].sort();
    expect(listed).toEqual(registered);
  });

  it("gives each kind of caller the expected status on every route (deny by default)", async () => {
    const agents = new Map<Who, ReturnType<TestApp["agent"]>>();
    const agentFor = async (who: Who) => {
      if (who === "anonymous") return t.agent();
      if (!agents.has(who)) {
        const user = users.get(who)!;
        const agent = t.agent();
        const res = await agent.post("/api/auth/sign-in").send({ email: user.email, password: user.password });
        if (res.status !== 200) throw new Error(`sign-in as ${who} failed: ${res.status}`);
        agents.set(who, agent);
      }
      return agents.get(who)!;
    };
    const mismatches: string[] = [];
    for (const row of accessMatrix) {
      for (const who of ["anonymous", ...roles] as Who[]) {
        const agent = await agentFor(who);
        const path = typeof row.path === "function" ? row.path(fixtures, who) : (row.path ?? row.route);
        const method = row.method.toLowerCase() as "get" | "post" | "put" | "patch" | "delete";
        const res = await agent[method](path).send(row.body as object);
        if (res.status !== row.expect[who]) mismatches.push(`${row.method} ${path} as ${who}: expected ${row.expect[who]}, got ${res.status}`);
        if (row.endsSession) agents.delete(who);
      }
    }
    expect(mismatches).toEqual([]);
  });
});
