import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { count } from "drizzle-orm";
import { createTestApp, type TestApp } from "./helpers/test-app.ts";
import { demoUsers, isEmpty, resetDemo, seedDemo } from "../../server/db/seed/demo.ts";
import { historyTechs } from "../../server/db/seed/history-cast.ts";
import { diagnosticSessions, shopSettings, users } from "../../server/db/schema.ts";
import { buildUser } from "../factories/users.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("the demo shop", () => {
  it("seeds one user per role who can sign in, and a reset puts it back as it was, with its history", async () => {
    expect(await isEmpty(t.ctx.db)).toBe(true);
    await seedDemo(t.ctx.db);
    const [justDemo] = await t.ctx.db.select({ n: count() }).from(users);
    expect(justDemo!.n).toBe(demoUsers.length);
    await buildUser(t.ctx.db);
    await resetDemo(t.ctx.db);
    const [n] = await t.ctx.db.select({ n: count() }).from(users);
    expect(n!.n).toBe(demoUsers.length + historyTechs.length);
    const [sessions] = await t.ctx.db.select({ n: count() }).from(diagnosticSessions);
    expect(sessions!.n).toBeGreaterThan(300);
    const [settings] = await t.ctx.db.select().from(shopSettings);
    expect(settings!.altitudeM).toBeGreaterThan(0);
    for (const demo of demoUsers) {
      const res = await t.agent().post("/api/auth/sign-in").send({ email: demo.email, password: demo.password });
      expect(res.status).toBe(200);
      expect(res.body.user.role).toBe(demo.role);
      expect(res.body.shop.name).toBe(settings!.name);
    }
  });
});
