import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { createHash } from "node:crypto";
import { createTestApp, HOST, type TestApp } from "../helpers/test-app.ts";
import { buildUser } from "../../factories/users.ts";
import { authSessions, auditLog } from "../../../server/db/schema.ts";
import { changeRole, setActive } from "../../../server/services/users.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const cookieOf = (res: { headers: Record<string, unknown> }) => ([] as string[]).concat((res.headers["set-cookie"] as string[] | undefined) ?? []).join("\n");

describe("POST /api/auth/sign-in", () => {
  it("opens a session with an HttpOnly, SameSite=Lax cookie and stores only the token's SHA-256", async () => {
    const user = await buildUser(t.ctx.db);
    const res = await t.agent().post("/api/auth/sign-in").send({ email: user.email.toUpperCase(), password: user.password });
    expect(res.status).toBe(200);
    expect(res.body.user).toEqual({ id: user.id, email: user.email, name: user.name, role: "apprentice", unitSystem: "imperial" });
    const cookie = cookieOf(res);
    expect(cookie).toMatch(/bp_session=[^;]+; Path=\/; Expires=[^;]+; HttpOnly; SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/);
    const token = /bp_session=([^;]+)/.exec(cookie)![1]!;
    // Source: OWASP ASVS 5.0 7.2.x / security.md — at least 128 bits of randomness, hash-only storage
    expect(Buffer.from(token, "base64url").length).toBeGreaterThanOrEqual(16);
    const rows = await t.ctx.db.select().from(authSessions).where(eq(authSessions.userId, user.id));
    expect(rows.map((r) => r.id)).toEqual([createHash("sha256").update(token).digest("hex")]);
  });

  it("opens a new session at every sign-in", async () => {
    const user = await buildUser(t.ctx.db);
    const first = await t.agent().post("/api/auth/sign-in").send({ email: user.email, password: user.password });
    const second = await t.agent().post("/api/auth/sign-in").send({ email: user.email, password: user.password });
    expect(cookieOf(first)).not.toEqual(cookieOf(second));
    expect(await t.ctx.db.select().from(authSessions).where(eq(authSessions.userId, user.id))).toHaveLength(2);
  });

  it("answers 401 with the same message for a wrong password and an unknown e-mail", async () => {
    const user = await buildUser(t.ctx.db);
    const wrong = await t.agent().post("/api/auth/sign-in").send({ email: user.email, password: "not-the-password" });
    const unknown = await t.agent().post("/api/auth/sign-in").send({ email: "nobody@bench.test", password: "not-the-password" });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.id).toBe("invalid_credentials");
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
    expect(wrong.body.error.message).not.toMatch(/password is|e-mail is|no account/i);
    const failures = await t.ctx.db.select().from(auditLog).where(eq(auditLog.recordId, user.id));
    expect(failures.map((f) => f.action)).toContain("auth.sign_in_failed");
  });

  it("refuses a deactivated user", async () => {
    const user = await buildUser(t.ctx.db, { active: false });
    const res = await t.agent().post("/api/auth/sign-in").send({ email: user.email, password: user.password });
    expect(res.status).toBe(401);
  });

  it("answers 400 naming the fields that are wrong", async () => {
    const res = await t.agent().post("/api/auth/sign-in").send({ email: "not-an-email", password: "" });
    expect(res.status).toBe(400);
    expect(res.body.error.id).toBe("invalid_input");
    expect(Object.keys(res.body.error.details.fieldErrors).sort()).toEqual(["email", "password"]);
  });

  it("blocks an account for 10 minutes after 10 failures, with 429 and Retry-After, even for the right password", async () => {
    const user = await buildUser(t.ctx.db);
    for (let i = 0; i < 10; i++) {
      const res = await t.agent().post("/api/auth/sign-in").send({ email: user.email, password: `wrong-${i}` });
      expect(res.status).toBe(401);
    }
    const blocked = await t.agent().post("/api/auth/sign-in").send({ email: user.email, password: user.password });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.id).toBe("too_many_attempts");
    const retryAfter = Number(blocked.headers["retry-after"]);
    expect(retryAfter).toBeGreaterThan(500);
    expect(retryAfter).toBeLessThanOrEqual(600);
    const other = await buildUser(t.ctx.db);
    expect((await t.agent().post("/api/auth/sign-in").send({ email: other.email, password: other.password })).status).toBe(200);
  });
});

describe("GET /api/auth/me and sign-out", () => {
  it("answers 401 without a session and the user with one; sign-out ends it", async () => {
    expect((await t.agent().get("/api/auth/me")).status).toBe(401);
    const user = await buildUser(t.ctx.db, { role: "shop_lead" });
    const agent = t.agent();
    await agent.post("/api/auth/sign-in").send({ email: user.email, password: user.password });
    const me = await agent.get("/api/auth/me");
    expect(me.status).toBe(200);
    expect(me.body.user.role).toBe("shop_lead");
    expect((await agent.post("/api/auth/sign-out")).status).toBe(204);
    expect((await agent.get("/api/auth/me")).status).toBe(401);
  });
});

describe("ending sessions", () => {
  async function twoSessions() {
    const user = await buildUser(t.ctx.db);
    const a = t.agent();
    const b = t.agent();
    for (const agent of [a, b]) await agent.post("/api/auth/sign-in").send({ email: user.email, password: user.password });
    return { user, a, b };
  }

  it("a password change ends every session of the user", async () => {
    const { user, a, b } = await twoSessions();
    const res = await a.post("/api/auth/password").send({ currentPassword: user.password, newPassword: "a-brand-new-passphrase" });
    expect(res.status).toBe(204);
    expect((await a.get("/api/auth/me")).status).toBe(401);
    expect((await b.get("/api/auth/me")).status).toBe(401);
    const again = await t.agent().post("/api/auth/sign-in").send({ email: user.email, password: "a-brand-new-passphrase" });
    expect(again.status).toBe(200);
  });

  it("refuses a password change with the wrong current password or a short new one", async () => {
    const { user, a } = await twoSessions();
    expect((await a.post("/api/auth/password").send({ currentPassword: "nope", newPassword: "a-brand-new-passphrase" })).status).toBe(401);
    const short = await a.post("/api/auth/password").send({ currentPassword: user.password, newPassword: "short" });
    expect(short.status).toBe(400);
    expect(short.body.error.details.fieldErrors.newPassword).toBeDefined();
  });

  it("a role change ends every session of the user", async () => {
    const { user, a, b } = await twoSessions();
    await changeRole(t.ctx, user.id, "senior_tech", user.id);
    expect((await a.get("/api/auth/me")).status).toBe(401);
    expect((await b.get("/api/auth/me")).status).toBe(401);
  });

  it("deactivation ends every session of the user", async () => {
    const { user, a } = await twoSessions();
    await setActive(t.ctx, user.id, false, user.id);
    expect((await a.get("/api/auth/me")).status).toBe(401);
  });

  it("a session older than the absolute limit is refused", async () => {
    const { user, a } = await twoSessions();
    await t.ctx.db.update(authSessions).set({ createdAt: new Date(Date.now() - 31 * 24 * 3600 * 1000) }).where(eq(authSessions.userId, user.id));
    expect((await a.get("/api/auth/me")).status).toBe(401);
  });
});

describe("cookies over HTTPS", () => {
  it("are Secure and __Host- prefixed when the request came over HTTPS through a trusted proxy", async () => {
    const secure = await createTestApp({ TRUST_PROXY: "1" });
    try {
      const user = await buildUser(secure.ctx.db);
      const res = await secure
        .agent()
        .set("X-Forwarded-Proto", "https")
        .set("Origin", `https://${HOST}`)
        .post("/api/auth/sign-in")
        .send({ email: user.email, password: user.password });
      expect(res.status).toBe(200);
      expect(cookieOf(res)).toMatch(/^__Host-bp_session=[^;]+; Path=\/; Expires=[^;]+; HttpOnly; Secure; SameSite=Lax/);
    } finally {
      await secure.close();
    }
  });
});
