import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { auditLog, users, userTokens } from "../../../server/db/schema.ts";
import { buildUser } from "../../factories/users.ts";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { linkInMail, mailTo, outgoingTo, waitForMail } from "./mail-links.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const joined = (overrides: Parameters<typeof buildUser>[1] = {}) => buildUser(t.ctx.db, { joinedAt: new Date(), ...overrides });

describe("resetting a password by e-mail", () => {
  it("answers 202 for an unknown address and sends nothing, in the same words as for a real one", async () => {
    const person = await joined({ email: "rue.holm@example.com" });
    const unknown = await t.agent().post("/api/auth/password-resets").send({ email: "nobody.here@example.com" });
    expect(unknown.status).toBe(202);
    const known = await t.agent().post("/api/auth/password-resets").send({ email: person.email });
    expect(known.status).toBe(202);
    expect(known.body).toEqual(unknown.body);
    await waitForMail(t, person.email);
    expect(await outgoingTo(t, "nobody.here@example.com")).toEqual([]);
    expect(await mailTo(t, "nobody.here@example.com")).toEqual([]);
  });

  it("sends nothing to a deactivated person", async () => {
    const person = await joined({ email: "sol.dane@example.com", active: false });
    const res = await t.agent().post("/api/auth/password-resets").send({ email: person.email });
    expect(res.status).toBe(202);
    // Wait for a message that does go out after it, so the refused request has surely finished.
    const other = await joined({ email: "tova.rask@example.com" });
    await t.agent().post("/api/auth/password-resets").send({ email: other.email });
    await waitForMail(t, other.email);
    expect(await outgoingTo(t, person.email)).toEqual([]);
    const refused = await t.ctx.db.select().from(auditLog).where(and(eq(auditLog.action, "auth.password_reset_refused"), eq(auditLog.recordId, person.id)));
    expect(refused).toHaveLength(1);
  });

  it("mails a one-hour link that sets the new password and ends every other session", async () => {
    const person = await joined({ email: "ulf.berg@example.com" });
    const elsewhere = t.agent();
    expect((await elsewhere.post("/api/auth/sign-in").send({ email: person.email, password: person.password })).status).toBe(200);
    expect((await elsewhere.get("/api/auth/me")).status).toBe(200);

    expect((await t.agent().post("/api/auth/password-resets").send({ email: "ULF.BERG@example.com" })).status).toBe(202);
    await waitForMail(t, person.email);
    const { token, message } = await linkInMail(t, person.email, "reset-password");
    expect(message.subject).toBe("Reset your Benchpath password");
    const [link] = await t.ctx.db.select().from(userTokens).where(eq(userTokens.userId, person.id));
    expect(link!.purpose).toBe("password_reset");
    const minutes = (link!.expiresAt.getTime() - Date.now()) / 60_000;
    expect(minutes).toBeGreaterThan(59);
    expect(minutes).toBeLessThanOrEqual(60);

    const look = await t.agent().get(`/api/public/password-links/${token}`);
    expect(look.body).toMatchObject({ purpose: "password_reset", name: person.name });

    const set = await t.agent().post(`/api/public/password-links/${token}`).send({ password: "a-fresh-spark-plug-gap" });
    expect(set.status).toBe(200);
    expect((await elsewhere.get("/api/auth/me")).status).toBe(401);
    expect((await t.agent().post("/api/auth/sign-in").send({ email: person.email, password: person.password })).status).toBe(401);
    expect((await t.agent().post("/api/auth/sign-in").send({ email: person.email, password: "a-fresh-spark-plug-gap" })).status).toBe(200);
    expect((await t.agent().post(`/api/public/password-links/${token}`).send({ password: "yet-another-password" })).status).toBe(410);
    const actions = (await t.ctx.db.select().from(auditLog).where(eq(auditLog.recordId, person.id))).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(["auth.password_reset_requested", "user.password_changed", "user.password_reset"]));
  });

  it("refuses a reset link once the person has been deactivated", async () => {
    const person = await joined({ email: "vera.nyx@example.com" });
    await t.agent().post("/api/auth/password-resets").send({ email: person.email });
    await waitForMail(t, person.email);
    const { token } = await linkInMail(t, person.email, "reset-password");
    await t.ctx.db.update(users).set({ active: false }).where(eq(users.id, person.id));
    const res = await t.agent().post(`/api/public/password-links/${token}`).send({ password: "a-fresh-spark-plug-gap" });
    expect(res.status).toBe(410);
    expect(res.body.error.id).toBe("account_inactive");
  });

  it("slows down repeated requests for one address with a clear 429", async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 6; i++) statuses.push((await t.agent().post("/api/auth/password-resets").send({ email: "flood.target@example.com" })).status);
    expect(statuses).toEqual([202, 202, 202, 202, 202, 429]);
    const blocked = await t.agent().post("/api/auth/password-resets").send({ email: "flood.target@example.com" });
    expect(blocked.body.error.message).toMatch(/Too many reset requests/);
  });
});
