import { v7 as uuidv7 } from "uuid";
import type { Database } from "../../server/db/client.ts";
import { users, type UserRow } from "../../server/db/schema.ts";
import { hashPassword } from "../../server/auth/password.ts";
import type { Role } from "../../shared/schemas/users.ts";

export const DEFAULT_PASSWORD = "correct-horse-battery";
const hashes = new Map<string, Promise<string>>();

let counter = 0;

/** Inserts a user; argon2 hashes are cached per password so files stay fast. */
export async function buildUser(db: Database, overrides: Partial<Omit<UserRow, "passwordHash">> & { password?: string } = {}): Promise<UserRow & { password: string }> {
  const { password = DEFAULT_PASSWORD, ...rest } = overrides;
  if (!hashes.has(password)) hashes.set(password, hashPassword(password));
  counter += 1;
  const role: Role = rest.role ?? "apprentice";
  const [row] = await db
    .insert(users)
    .values({
      id: uuidv7(),
      email: `${role}.${counter}.${uuidv7().slice(-6)}@bench.test`,
      name: `Test ${role} ${counter}`,
      role,
      passwordHash: await hashes.get(password)!,
      ...rest,
    })
    .returning();
  return { ...row!, password };
}
