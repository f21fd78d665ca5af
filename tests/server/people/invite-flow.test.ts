import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { auditLog, users, userTokens } from "../../../server/db/schema.ts";
import { hashToken } from "../../../server/auth/tokens.ts";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { linkInMail, outgoingTo } from "./mail-links.ts";

let t: TestApp;
let lead: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  t = await createTestApp();
  lead = await signedInAs(t, "shop_lead");
});
afterAll(() => t.close());

const newPassword = "mulch-and-two-stroke-oil";

describe("inviting someone by e-mail", () => {
  it("adds them unable to sign in, mails a welcome link whose token is stored only as a hash, and lets them join once", async () => {
    const invited = await lead.agent.post("/api/users/invites").send({ email: "  Nell.Varga@Example.com ", name: "Nell Varga", role: "apprentice" });
    expect(invited.status).toBe(201);
    expect(invited.body.mail).toEqual({ status: "sent", error: null });
    expect(invited.body.person).toMatchObject({ email: "nell.varga@example.com", name: "Nell Varga", role: "apprentice", status: "invited", active: false, joinedAt: null });
    expect(invited.body.person.inviteExpiresAt).not.toBeNull();
    const userId = invited.body.person.id as string;

    // Before choosing a password there is no way in, whatever is typed.
    const early = await t.agent().post("/api/auth/sign-in").send({ email: "nell.varga@example.com", password: newPassword });
    expect(early.status).toBe(401);

    const { token, url, message } = await linkInMail(t, "nell.varga@example.com", "welcome");
    expect(url).toBe(`http://bench.test/welcome/${token}`);
    expect(message.subject).toContain("Join");
    const tokens = await t.ctx.db.select().from(userTokens).where(eq(userTokens.userId, userId));
    expect(tokens).toHaveLength(1);
    expect(tokens[0]!.tokenHash).toBe(hashToken(token));
    expect(tokens[0]!.tokenHash).not.toContain(token);
    // Seven days, give or take the seconds the test takes.
    const days = (tokens[0]!.expiresAt.getTime() - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);
    const [sent] = await outgoingTo(t, "nell.varga@example.com");
    expect(sent).toMatchObject({ kind: "invite", status: "sent", recordType: "user", recordId: userId, createdBy: lead.user.id });

    const stranger = t.agent();
    const look = await stranger.get(`/api/public/password-links/${token}`);
    expect(look.status).toBe(200);
    expect(look.body).toEqual({ purpose: "invite", name: "Nell Varga", expiresAt: tokens[0]!.expiresAt.toISOString() });

    const tooShort = await stranger.post(`/api/public/password-links/${token}`).send({ password: "short" });
    expect(tooShort.status).toBe(400);
    expect(tooShort.body.error.details.fieldErrors.password).toEqual(["Use at least 12 characters."]);

    const set = await stranger.post(`/api/public/password-links/${token}`).send({ password: newPassword });
    expect(set.status).toBe(200);
    expect(set.body).toEqual({ purpose: "invite", email: "nell.varga@example.com" });
    const [row] = await t.ctx.db.select().from(users).where(eq(users.id, userId));
    expect(row!.active).toBe(true);
    expect(row!.joinedAt).toBeInstanceOf(Date);

    const signIn = await t.agent().post("/api/auth/sign-in").send({ email: "nell.varga@example.com", password: newPassword });
    expect(signIn.status).toBe(200);
    expect(signIn.body.user).toMatchObject({ id: userId, role: "apprentice" });

    const again = await stranger.post(`/api/public/password-links/${token}`).send({ password: "another-long-password" });
    expect(again.status).toBe(410);
    expect(again.body.error.id).toBe("link_used");
    const lookAgain = await stranger.get(`/api/public/password-links/${token}`);
    expect(lookAgain.status).toBe(410);
    // The reused link changed nothing: the chosen password still works.
    expect((await t.agent().post("/api/auth/sign-in").send({ email: "nell.varga@example.com", password: newPassword })).status).toBe(200);

    const list = await lead.agent.get("/api/users");
    const listed = (list.body.people as { id: string; status: string; lastSignInAt: string | null }[]).find((p) => p.id === userId);
    expect(listed).toMatchObject({ status: "active" });
    expect(listed!.lastSignInAt).not.toBeNull();
    const actions = (await t.ctx.db.select().from(auditLog).where(eq(auditLog.recordId, userId))).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(["user.invited", "user.invite_sent", "user.password_changed", "user.joined"]));
  });

  it("refuses an expired link with 410 and changes nothing", async () => {
    const invited = await lead.agent.post("/api/users/invites").send({ email: "osk.brandt@example.com", name: "Osk Brandt", role: "senior_tech" });
    expect(invited.status).toBe(201);
    const { token } = await linkInMail(t, "osk.brandt@example.com", "welcome");
    await t.ctx.db.update(userTokens).set({ expiresAt: new Date(Date.now() - 60_000) }).where(eq(userTokens.tokenHash, hashToken(token)));
    const look = await t.agent().get(`/api/public/password-links/${token}`);
    expect(look.status).toBe(410);
    expect(look.body.error).toMatchObject({ id: "link_expired" });
    const set = await t.agent().post(`/api/public/password-links/${token}`).send({ password: newPassword });
    expect(set.status).toBe(410);
    const [row] = await t.ctx.db.select().from(users).where(eq(users.id, invited.body.person.id as string));
    expect(row).toMatchObject({ active: false, joinedAt: null });
    expect((await t.agent().post("/api/auth/sign-in").send({ email: "osk.brandt@example.com", password: newPassword })).status).toBe(401);
  });

  it("answers 404 for a link it never sent", async () => {
    const res = await t.agent().get(`/api/public/password-links/${"x".repeat(43)}`);
    expect(res.status).toBe(404);
    expect(res.body.error.message).toMatch(/does not know this link/);
  });

  it("resends with a fresh link and the old one stops working", async () => {
    const invited = await lead.agent.post("/api/users/invites").send({ email: "pia.lund@example.com", name: "Pia Lund", role: "apprentice" });
    const first = await linkInMail(t, "pia.lund@example.com", "welcome");
    const resent = await lead.agent.post(`/api/users/${invited.body.person.id as string}/invites`);
    expect(resent.status).toBe(200);
    expect(resent.body.mail.status).toBe("sent");
    const second = await linkInMail(t, "pia.lund@example.com", "welcome");
    expect(second.token).not.toBe(first.token);
    expect((await t.agent().get(`/api/public/password-links/${first.token}`)).status).toBe(410);
    expect((await t.agent().get(`/api/public/password-links/${second.token}`)).status).toBe(200);
  });

  it("refuses a resend to someone who has joined", async () => {
    const res = await lead.agent.post(`/api/users/${lead.user.id}/invites`);
    expect(res.status).toBe(409);
    expect(res.body.error.id).toBe("already_joined");
  });

  it("answers 409 beside the e-mail field when the address is taken, and 400 beside each bad field", async () => {
    const taken = await lead.agent.post("/api/users/invites").send({ email: lead.user.email.toUpperCase(), name: "Twin", role: "apprentice" });
    expect(taken.status).toBe(409);
    expect(taken.body.error.details.fieldErrors.email).toEqual(["Someone in this shop already uses that e-mail address."]);
    const bad = await lead.agent.post("/api/users/invites").send({ email: "not-an-address", name: " ", role: "owner" });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.details.fieldErrors).sort()).toEqual(["email", "name", "role"]);
  });

  it("says plainly when the invitation could not be mailed, and keeps the person to resend to", async () => {
    const failing = await createTestApp({ SMTP_URL: "smtp://127.0.0.1:9" });
    try {
      const { agent } = await signedInAs(failing, "shop_lead");
      const res = await agent.post("/api/users/invites").send({ email: "quin.moss@example.com", name: "Quin Moss", role: "apprentice" });
      expect(res.status).toBe(201);
      expect(res.body.mail.status).toBe("failed");
      expect(res.body.mail.error).toMatch(/Could not reach the mail server at smtp:\/\/127\.0\.0\.1:9/);
      expect(res.body.person.status).toBe("invited");
    } finally {
      await failing.close();
    }
  });
});
