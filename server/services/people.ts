// The shop lead's people: the list, invitations by e-mail, roles and standing; each person's own units.
import { and, asc, count, eq, isNull, max, sql } from "drizzle-orm";
import { randomBytes } from "node:crypto";
import { v7 as uuidv7 } from "uuid";
import type { AppContext } from "../context.ts";
import { auditLog, users, userTokens, type UserRow } from "../db/schema.ts";
import { conflict, isUniqueViolation, notFound } from "../lib/errors.ts";
import { inviteMail } from "../mail/user-links.ts";
import { recordAudit } from "./audit.ts";
import { changeRole, setActive } from "./users.ts";
import { getShopName } from "./settings.ts";
import { issueLink } from "./password-links.ts";
import { toPublicUser } from "./auth.ts";
import { INVITE_VALID_DAYS, type InviteResponse, type Person, type PersonStatus } from "../../shared/schemas/people.ts";
import { roleLabels, type PublicUser, type Role } from "../../shared/schemas/users.ts";
import type { UnitSystem } from "../../shared/equipment.ts";

/** Not an argon2 hash, so no password ever matches it: an invited person cannot sign in before choosing one. */
const unusablePasswordHash = () => `!unset:${randomBytes(16).toString("hex")}`;

const statusOf = (u: Pick<UserRow, "active" | "invitedAt" | "joinedAt">): PersonStatus => (u.invitedAt && !u.joinedAt ? "invited" : u.active ? "active" : "deactivated");

export async function listPeople(ctx: Pick<AppContext, "db">, only?: string): Promise<Person[]> {
  const signIns = ctx.db
    .select({ userId: auditLog.recordId, at: max(auditLog.at).as("last_sign_in") })
    .from(auditLog)
    .where(and(eq(auditLog.action, "auth.sign_in"), eq(auditLog.recordType, "user")))
    .groupBy(auditLog.recordId)
    .as("sign_ins");
  const invites = ctx.db
    .select({ userId: userTokens.userId, expiresAt: max(userTokens.expiresAt).as("invite_expires") })
    .from(userTokens)
    .where(and(eq(userTokens.purpose, "invite"), isNull(userTokens.usedAt)))
    .groupBy(userTokens.userId)
    .as("invites");
  const rows = await ctx.db
    .select({ user: users, lastSignInAt: signIns.at, inviteExpiresAt: invites.expiresAt })
    .from(users)
    .leftJoin(signIns, eq(signIns.userId, users.id))
    .leftJoin(invites, eq(invites.userId, users.id))
    .where(only ? eq(users.id, only) : undefined)
    .orderBy(asc(sql`lower(${users.name})`), asc(users.id));
  return rows.map(({ user, lastSignInAt, inviteExpiresAt }) => {
    const status = statusOf(user);
    return {
      id: user.id,
      email: user.email,
      name: user.name,
      role: user.role,
      active: user.active,
      status,
      unitSystem: user.unitSystem,
      invitedAt: user.invitedAt?.toISOString() ?? null,
      joinedAt: user.joinedAt?.toISOString() ?? null,
      lastSignInAt: lastSignInAt ? new Date(lastSignInAt).toISOString() : null,
      inviteExpiresAt: status === "invited" && inviteExpiresAt ? new Date(inviteExpiresAt).toISOString() : null,
    };
  });
}

async function person(ctx: Pick<AppContext, "db">, id: string): Promise<Person> {
  const [found] = await listPeople(ctx, id);
  if (!found) throw notFound("No such person in this shop.");
  return found;
}

async function sendInvite(ctx: AppContext, user: UserRow, baseUrl: string, actorId: string): Promise<InviteResponse["mail"]> {
  const { token } = await issueLink(ctx, { userId: user.id, purpose: "invite", validMs: INVITE_VALID_DAYS * 24 * 3600_000, createdBy: actorId });
  const outcome = await ctx.mail.send(
    inviteMail({ to: user.email, name: user.name, role: roleLabels[user.role].toLowerCase(), shopName: await getShopName(ctx), link: `${baseUrl}/welcome/${token}`, userId: user.id, createdBy: actorId, validDays: INVITE_VALID_DAYS }),
  );
  await recordAudit(ctx.db, { userId: actorId, action: "user.invite_sent", recordType: "user", recordId: user.id, details: { mailId: outcome.id, mailStatus: outcome.status } });
  return { status: outcome.status, error: outcome.error };
}

const emailTaken = () => conflict("email_taken", "Someone in this shop already uses that e-mail address.", { fieldErrors: { email: ["Someone in this shop already uses that e-mail address."] }, formErrors: [] });

/** Adds the person, not yet able to sign in, and e-mails them a link to choose a password. */
export async function invitePerson(ctx: AppContext, input: { email: string; name: string; role: Role }, baseUrl: string, actorId: string): Promise<InviteResponse> {
  const [existing] = await ctx.db.select({ id: users.id }).from(users).where(eq(users.email, input.email)).limit(1);
  if (existing) throw emailTaken();
  let user: UserRow;
  try {
    const now = new Date();
    [user] = (await ctx.db
      .insert(users)
      .values({ id: uuidv7(), email: input.email, name: input.name, role: input.role, active: false, passwordHash: unusablePasswordHash(), invitedAt: now })
      .returning()) as [UserRow];
  } catch (error) {
    if (isUniqueViolation(error)) throw emailTaken();
    throw error;
  }
  await recordAudit(ctx.db, { userId: actorId, action: "user.invited", recordType: "user", recordId: user.id, details: { role: input.role } });
  const mail = await sendInvite(ctx, user, baseUrl, actorId);
  return { person: await person(ctx, user.id), mail };
}

/** A fresh invitation link; the older ones stop working. Only for someone who has not joined yet. */
export async function resendInvite(ctx: AppContext, userId: string, baseUrl: string, actorId: string): Promise<InviteResponse> {
  const [user] = await ctx.db.select().from(users).where(eq(users.id, userId)).limit(1);
  if (!user) throw notFound("No such person in this shop.");
  if (statusOf(user) !== "invited") throw conflict("already_joined", `${user.name} has already joined. To help them back in, they can use "Forgot your password?" on the sign-in page.`);
  const mail = await sendInvite(ctx, user, baseUrl, actorId);
  return { person: await person(ctx, user.id), mail };
}

async function activeLeads(ctx: Pick<AppContext, "db">): Promise<number> {
  const [row] = await ctx.db.select({ n: count() }).from(users).where(and(eq(users.role, "shop_lead"), eq(users.active, true)));
  return row?.n ?? 0;
}

/** A new role and/or standing; the shop always keeps one active shop lead. */
export async function updatePerson(ctx: AppContext, userId: string, change: { role?: Role; active?: boolean }, actorId: string): Promise<Person> {
  const [user] = await ctx.db.select().from(users).where(eq(users.id, userId)).limit(1);
  if (!user) throw notFound("No such person in this shop.");
  const pending = statusOf(user) === "invited";
  if (pending && change.active !== undefined)
    throw conflict("not_joined", `${user.name} has not chosen a password yet, so there is nothing to ${change.active ? "reactivate" : "deactivate"}. Resend the invitation instead.`);
  const losesLead = user.role === "shop_lead" && user.active && ((change.role !== undefined && change.role !== "shop_lead") || change.active === false);
  if (losesLead && (await activeLeads(ctx)) <= 1) {
    const who = user.id === actorId ? "You are" : `${user.name} is`;
    throw conflict("last_shop_lead", `${who} the only active shop lead. Make someone else shop lead first, so the shop is never left without one.`);
  }
  if (change.role !== undefined && change.role !== user.role) await changeRole(ctx, user.id, change.role, actorId);
  if (change.active !== undefined && change.active !== user.active) await setActive(ctx, user.id, change.active, actorId);
  return person(ctx, user.id);
}

/** The signed-in person's own choice of units. */
export async function setOwnUnits(ctx: Pick<AppContext, "db">, userId: string, unitSystem: UnitSystem): Promise<PublicUser> {
  const [row] = await ctx.db.update(users).set({ unitSystem, updatedAt: new Date() }).where(eq(users.id, userId)).returning();
  if (!row) throw notFound("No such user.");
  await recordAudit(ctx.db, { userId, action: "user.units_changed", recordType: "user", recordId: userId, details: { unitSystem } });
  return toPublicUser(row);
}
