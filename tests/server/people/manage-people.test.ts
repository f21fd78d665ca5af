import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { auditLog, users } from "../../../server/db/schema.ts";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildUser } from "../../factories/users.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("the shop lead managing people", () => {
  it("lists everyone with role, standing and last sign-in, and never the password hash", async () => {
    const lead = await signedInAs(t, "shop_lead");
    const res = await lead.agent.get("/api/users");
    expect(res.status).toBe(200);
    const me = (res.body.people as Record<string, unknown>[]).find((p) => p.id === lead.user.id);
    expect(me).toMatchObject({ role: "shop_lead", status: "active", active: true });
    expect(me!.lastSignInAt).not.toBeNull();
    expect(JSON.stringify(res.body)).not.toContain("passwordHash");
    expect(JSON.stringify(res.body)).not.toContain("argon2");
  });

  it("deactivating ends that person's sessions at once; reactivating lets them sign in again", async () => {
    const lead = await signedInAs(t, "shop_lead");
    const tech = await signedInAs(t, "apprentice");
    expect((await tech.agent.get("/api/work-orders")).status).toBe(200);

    const off = await lead.agent.patch(`/api/users/${tech.user.id}`).send({ active: false });
    expect(off.status).toBe(200);
    expect(off.body.person).toMatchObject({ active: false, status: "deactivated" });
    expect((await tech.agent.get("/api/work-orders")).status).toBe(401);
    expect((await t.agent().post("/api/auth/sign-in").send({ email: tech.user.email, password: tech.user.password })).status).toBe(401);

    const on = await lead.agent.patch(`/api/users/${tech.user.id}`).send({ active: true });
    expect(on.body.person.status).toBe("active");
    expect((await t.agent().post("/api/auth/sign-in").send({ email: tech.user.email, password: tech.user.password })).status).toBe(200);
    const actions = (await t.ctx.db.select().from(auditLog).where(eq(auditLog.recordId, tech.user.id))).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(["user.deactivated", "user.reactivated"]));
  });

  it("changes a role, which signs that person out so the new role applies", async () => {
    const lead = await signedInAs(t, "shop_lead");
    const tech = await signedInAs(t, "apprentice");
    const res = await lead.agent.patch(`/api/users/${tech.user.id}`).send({ role: "senior_tech" });
    expect(res.status).toBe(200);
    expect(res.body.person.role).toBe("senior_tech");
    expect((await tech.agent.get("/api/auth/me")).status).toBe(401);
    const again = t.agent();
    const signIn = await again.post("/api/auth/sign-in").send({ email: tech.user.email, password: tech.user.password });
    expect(signIn.body.user.role).toBe("senior_tech");
  });

  it("refuses an unknown role and an empty change beside the field", async () => {
    const lead = await signedInAs(t, "shop_lead");
    const tech = await buildUser(t.ctx.db);
    const bad = await lead.agent.patch(`/api/users/${tech.id}`).send({ role: "owner" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.fieldErrors.role).toEqual(["Choose a role."]);
    const empty = await lead.agent.patch(`/api/users/${tech.id}`).send({});
    expect(empty.status).toBe(400);
    const extra = await lead.agent.patch(`/api/users/${tech.id}`).send({ active: true, passwordHash: "x" });
    expect(extra.status).toBe(400);
  });
});

describe("the last active shop lead", () => {
  it("cannot be demoted or deactivated, by themself or anyone, until there is another", async () => {
    const solo = await createTestApp();
    try {
      const lead = await signedInAs(solo, "shop_lead");
      // A deactivated lead does not count.
      const former = await buildUser(solo.ctx.db, { role: "shop_lead", active: false });
      const demote = await lead.agent.patch(`/api/users/${lead.user.id}`).send({ role: "senior_tech" });
      expect(demote.status).toBe(409);
      expect(demote.body.error).toMatchObject({ id: "last_shop_lead", message: "You are the only active shop lead. Make someone else shop lead first, so the shop is never left without one." });
      const deactivate = await lead.agent.patch(`/api/users/${lead.user.id}`).send({ active: false });
      expect(deactivate.status).toBe(409);
      const [row] = await solo.ctx.db.select().from(users).where(eq(users.id, lead.user.id));
      expect(row).toMatchObject({ role: "shop_lead", active: true });
      expect((await lead.agent.get("/api/auth/me")).status).toBe(200);

      const back = await lead.agent.patch(`/api/users/${former.id}`).send({ active: true });
      expect(back.status).toBe(200);
      const stepDown = await lead.agent.patch(`/api/users/${lead.user.id}`).send({ role: "senior_tech" });
      expect(stepDown.status).toBe(200);
      // A changed role ends the session: the former lead signs in again as a senior tech.
      expect((await lead.agent.get("/api/users")).status).toBe(401);
    } finally {
      await solo.close();
    }
  });
});

describe("each person's own units", () => {
  it("saves the choice for the signed-in person only, and /me shows it", async () => {
    const tech = await signedInAs(t, "apprentice");
    const other = await buildUser(t.ctx.db, { unitSystem: "imperial" });
    const res = await tech.agent.put("/api/auth/me/units").send({ unitSystem: "metric" });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ id: tech.user.id, unitSystem: "metric" });
    expect((await tech.agent.get("/api/auth/me")).body.user.unitSystem).toBe("metric");
    const [untouched] = await t.ctx.db.select().from(users).where(eq(users.id, other.id));
    expect(untouched!.unitSystem).toBe("imperial");
    const bad = await tech.agent.put("/api/auth/me/units").send({ unitSystem: "furlongs" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.fieldErrors.unitSystem).toEqual(["Choose imperial or metric."]);
  });
});
