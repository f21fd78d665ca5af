import { eq } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import { users } from "../db/schema.ts";
import { hashPassword, verifyPassword } from "../auth/password.ts";
import { notFound, unauthenticated } from "../lib/errors.ts";
import { recordAudit } from "./audit.ts";
import type { Role } from "../../shared/schemas/users.ts";

// Each of these ends every session of the user: a changed credential or standing must sign in again.

export async function changePassword(ctx: AppContext, userId: string, current: string, next: string): Promise<void> {
  const [row] = await ctx.db.select().from(users).where(eq(users.id, userId)).limit(1);
  if (!row) throw notFound("No such user.");
  if (!(await verifyPassword(row.passwordHash, current))) throw unauthenticated("The current password is not right.");
  await setPassword(ctx, userId, next, userId);
}

export async function setPassword(ctx: AppContext, userId: string, next: string, actorId: string): Promise<void> {
  const passwordHash = await hashPassword(next);
  await ctx.db.update(users).set({ passwordHash, passwordChangedAt: new Date(), updatedAt: new Date() }).where(eq(users.id, userId));
  await ctx.lucia.invalidateUserSessions(userId);
  await recordAudit(ctx.db, { userId: actorId, action: "user.password_changed", recordType: "user", recordId: userId });
}

export async function changeRole(ctx: AppContext, userId: string, role: Role, actorId: string): Promise<void> {
  const updated = await ctx.db.update(users).set({ role, updatedAt: new Date() }).where(eq(users.id, userId)).returning({ id: users.id });
  if (updated.length === 0) throw notFound("No such user.");
  await ctx.lucia.invalidateUserSessions(userId);
  await recordAudit(ctx.db, { userId: actorId, action: "user.role_changed", recordType: "user", recordId: userId, details: { role } });
}

export async function setActive(ctx: AppContext, userId: string, active: boolean, actorId: string): Promise<void> {
  const updated = await ctx.db.update(users).set({ active, updatedAt: new Date() }).where(eq(users.id, userId)).returning({ id: users.id });
  if (updated.length === 0) throw notFound("No such user.");
  if (!active) await ctx.lucia.invalidateUserSessions(userId);
  await recordAudit(ctx.db, { userId: actorId, action: active ? "user.reactivated" : "user.deactivated", recordType: "user", recordId: userId });
}
