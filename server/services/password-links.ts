// One-time links to set a password: issued for an invitation or a reset, used once, kept only as a hash.
import { and, eq, gt, isNull, ne } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { AppContext } from "../context.ts";
import { users, userTokens, type UserRow, type UserTokenRow } from "../db/schema.ts";
import { hashToken, newLinkToken } from "../auth/tokens.ts";
import { HttpError, notFound } from "../lib/errors.ts";
import { resetMail } from "../mail/user-links.ts";
import { recordAudit } from "./audit.ts";
import { setPassword } from "./users.ts";
import { getShopName } from "./settings.ts";
import { RESET_VALID_MINUTES, type PasswordLink } from "../../shared/schemas/people.ts";
import type { UserTokenPurpose } from "../../shared/schemas/estimate-records.ts";

const gone = (id: string, message: string) => new HttpError(410, id, message);

/** Makes a new link for the user and purpose; any older open link of that purpose stops working. */
export async function issueLink(ctx: Pick<AppContext, "db">, input: { userId: string; purpose: UserTokenPurpose; validMs: number; createdBy: string | null }): Promise<{ token: string; expiresAt: Date }> {
  const now = new Date();
  const token = newLinkToken();
  const expiresAt = new Date(now.getTime() + input.validMs);
  await ctx.db.transaction(async (tx) => {
    await tx
      .update(userTokens)
      .set({ expiresAt: now })
      .where(and(eq(userTokens.userId, input.userId), eq(userTokens.purpose, input.purpose), isNull(userTokens.usedAt), gt(userTokens.expiresAt, now)));
    await tx.insert(userTokens).values({ id: uuidv7(), userId: input.userId, purpose: input.purpose, tokenHash: hashToken(token), expiresAt, createdBy: input.createdBy });
  });
  return { token, expiresAt };
}

/** The link's row and its user when it can still be used; otherwise the error that says why not. */
async function openLink(ctx: Pick<AppContext, "db">, token: string): Promise<{ link: UserTokenRow; user: UserRow }> {
  const [found] = await ctx.db.select({ link: userTokens, user: users }).from(userTokens).innerJoin(users, eq(users.id, userTokens.userId)).where(eq(userTokens.tokenHash, hashToken(token))).limit(1);
  if (!found) throw notFound("Benchpath does not know this link. Check that the whole address was copied from the e-mail.");
  const { link, user } = found;
  if (link.usedAt) throw gone("link_used", "This link has already been used. Sign in with the password you chose, or ask for a new link.");
  if (link.expiresAt.getTime() <= Date.now()) throw gone("link_expired", "This link has expired or a newer one was sent. Ask for a new link.");
  if (link.purpose === "invite" && user.joinedAt) throw gone("link_used", "You have already joined. Sign in with the password you chose.");
  if (link.purpose === "password_reset" && !user.active) throw gone("account_inactive", "This account has been deactivated. Ask your shop lead.");
  return { link, user };
}

export async function readLink(ctx: Pick<AppContext, "db">, token: string): Promise<PasswordLink> {
  const { link, user } = await openLink(ctx, token);
  return { purpose: link.purpose, name: user.name, expiresAt: link.expiresAt.toISOString() };
}

/**
 * Sets the password through the link, once: the link is claimed before anything changes, so two
 * tabs cannot both use it. Every session of the user ends (setPassword), an invitation makes the
 * person active and joined, and every other open link of theirs stops working.
 */
export async function usePasswordLink(ctx: AppContext, token: string, password: string): Promise<{ purpose: UserTokenPurpose; email: string }> {
  const { link, user } = await openLink(ctx, token);
  const now = new Date();
  const claimed = await ctx.db
    .update(userTokens)
    .set({ usedAt: now })
    .where(and(eq(userTokens.id, link.id), isNull(userTokens.usedAt), gt(userTokens.expiresAt, now)))
    .returning({ id: userTokens.id });
  if (claimed.length === 0) throw gone("link_used", "This link has already been used. Sign in with the password you chose, or ask for a new link.");
  await setPassword(ctx, user.id, password, user.id);
  if (link.purpose === "invite") await ctx.db.update(users).set({ active: true, joinedAt: now, updatedAt: now }).where(eq(users.id, user.id));
  await ctx.db
    .update(userTokens)
    .set({ expiresAt: now })
    .where(and(eq(userTokens.userId, user.id), ne(userTokens.id, link.id), isNull(userTokens.usedAt), gt(userTokens.expiresAt, now)));
  await recordAudit(ctx.db, { userId: user.id, action: link.purpose === "invite" ? "user.joined" : "user.password_reset", recordType: "user", recordId: user.id, details: { linkId: link.id } });
  return { purpose: link.purpose, email: user.email };
}

/**
 * Sends a reset link when the address belongs to an active person who has joined; says nothing
 * either way, so the caller answers the same for every address.
 */
export async function requestPasswordReset(ctx: AppContext, email: string, baseUrl: string, ip: string | undefined): Promise<void> {
  const [user] = await ctx.db.select().from(users).where(eq(users.email, email)).limit(1);
  if (!user || !user.active || !user.joinedAt && user.invitedAt) {
    await recordAudit(ctx.db, { userId: null, action: "auth.password_reset_refused", recordType: "user", recordId: user?.id ?? null, details: { ip } });
    return;
  }
  const { token } = await issueLink(ctx, { userId: user.id, purpose: "password_reset", validMs: RESET_VALID_MINUTES * 60_000, createdBy: null });
  const outcome = await ctx.mail.send(
    resetMail({ to: user.email, name: user.name, shopName: await getShopName(ctx), link: `${baseUrl}/reset-password/${token}`, userId: user.id, createdBy: null, validMinutes: RESET_VALID_MINUTES }),
  );
  await recordAudit(ctx.db, { userId: user.id, action: "auth.password_reset_requested", recordType: "user", recordId: user.id, details: { ip, mailId: outcome.id, mailStatus: outcome.status } });
}
