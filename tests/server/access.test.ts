import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "./helpers/test-app.ts";
import { signedInAs } from "./helpers/sign-in.ts";
import { accessMatrix, type Who } from "./access-matrix.ts";
import { apiResources, listRoutes } from "../../server/routes/index.ts";
import { roles } from "../../shared/schemas/users.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

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
      if (!agents.has(who)) agents.set(who, (await signedInAs(t, who)).agent);
      return agents.get(who)!;
    };
    const mismatches: string[] = [];
    for (const row of accessMatrix) {
      for (const who of ["anonymous", ...roles] as Who[]) {
        const agent = await agentFor(who);
        const path = row.path ?? row.route;
        const method = row.method.toLowerCase() as "get" | "post" | "put" | "patch" | "delete";
        const res = await agent[method](path).send(row.body as object);
        if (res.status !== row.expect[who]) mismatches.push(`${row.method} ${path} as ${who}: expected ${row.expect[who]}, got ${res.status}`);
        if (row.endsSession) agents.delete(who);
      }
    }
    expect(mismatches).toEqual([]);
  });
});
