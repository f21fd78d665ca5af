import { Lucia, TimeSpan } from "lucia";
import { DrizzlePostgreSQLAdapter } from "@lucia-auth/adapter-drizzle";
import type { Database } from "../db/client.ts";
import { authSessions, users, type UserRow } from "../db/schema.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

/** Idle expiry (lucia slides it forward on use); the absolute limit is checked on top in session.ts. */
export const SESSION_IDLE = new TimeSpan(7, "d");
export const SESSION_ABSOLUTE_MS = 30 * 24 * 60 * 60 * 1000;

export function createLucia(db: Database) {
  return new Lucia(new DrizzlePostgreSQLAdapter(db, authSessions, users), {
    sessionExpiresIn: SESSION_IDLE,
    getSessionAttributes: (attributes) => ({ createdAt: attributes.createdAt }),
    getUserAttributes: (attributes): Omit<PublicUser, "id"> & { active: boolean } => ({
      email: attributes.email,
      name: attributes.name,
      role: attributes.role,
      unitSystem: attributes.unitSystem,
      active: attributes.active,
    }),
  });
}

export type AppLucia = ReturnType<typeof createLucia>;

declare module "lucia" {
  interface Register {
    Lucia: AppLucia;
    DatabaseUserAttributes: Omit<UserRow, "id">;
    DatabaseSessionAttributes: { createdAt: Date };
  }
}
