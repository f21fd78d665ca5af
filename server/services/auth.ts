import { eq } from "drizzle-orm";
import type { User } from "lucia";
import type { AppContext } from "../context.ts";
import { users } from "../db/schema.ts";
import { burnPasswordCheck, verifyPassword } from "../auth/password.ts";
import { hashToken, newSessionToken } from "../auth/tokens.ts";
import { SESSION_ABSOLUTE_MS } from "../auth/lucia.ts";
import { recordAudit } from "./audit.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

export interface SignedIn {
  user: PublicUser;
  token: string;
  expiresAt: Date;
}

export function toPublicUser(user: User | (PublicUser & { active?: boolean })): PublicUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role, unitSystem: user.unitSystem };
}

/** Checks the password and opens a new session; null when the e-mail or password is wrong. */
export async function signIn(ctx: AppContext, email: string, password: string, ip: string | undefined): Promise<SignedIn | null> {
  const [row] = await ctx.db.select().from(users).where(eq(users.email, email)).limit(1);
  if (!row || !row.active) {
    await burnPasswordCheck(password);
    await recordAudit(ctx.db, { userId: row?.id ?? null, action: "auth.sign_in_failed", recordType: "user", recordId: row?.id ?? null, details: { ip } });
    return null;
  }
  if (!(await verifyPassword(row.passwordHash, password))) {
    await recordAudit(ctx.db, { userId: row.id, action: "auth.sign_in_failed", recordType: "user", recordId: row.id, details: { ip } });
    return null;
  }
  const token = newSessionToken();
  const session = await ctx.lucia.createSession(row.id, { createdAt: new Date() }, { sessionId: hashToken(token) });
  await recordAudit(ctx.db, { userId: row.id, action: "auth.sign_in", recordType: "user", recordId: row.id, details: { ip } });
  return { user: toPublicUser(row), token, expiresAt: session.expiresAt };
}

export interface ValidSession {
  user: PublicUser;
  sessionId: string;
  /** Set when lucia slid the expiry forward: the cookie must be sent again. */
  renewedUntil: Date | null;
}

export async function validateToken(ctx: AppContext, token: string): Promise<ValidSession | null> {
  const { session, user } = await ctx.lucia.validateSession(hashToken(token));
  if (!session || !user) return null;
  if (!user.active) {
    await ctx.lucia.invalidateUserSessions(user.id);
    return null;
  }
  if (Date.now() - session.createdAt.getTime() > SESSION_ABSOLUTE_MS) {
    await ctx.lucia.invalidateSession(session.id);
    return null;
  }
  return { user: toPublicUser(user), sessionId: session.id, renewedUntil: session.fresh ? session.expiresAt : null };
}

export async function signOut(ctx: AppContext, session: ValidSession): Promise<void> {
  await ctx.lucia.invalidateSession(session.sessionId);
  await recordAudit(ctx.db, { userId: session.user.id, action: "auth.sign_out", recordType: "user", recordId: session.user.id });
}
