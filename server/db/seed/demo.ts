import { count, getTableName, is, sql } from "drizzle-orm";
import { PgTable } from "drizzle-orm/pg-core";
import { v7 as uuidv7 } from "uuid";
import type { Database } from "../client.ts";
import * as schema from "../schema.ts";
import { hashPassword } from "../../auth/password.ts";
import { recordAudit } from "../../services/audit.ts";
import { installBuiltInFlows } from "../../services/flows.ts";
import type { Storage } from "../../storage/storage.ts";
import { seedHistory } from "./history.ts";
import type { Role } from "../../../shared/schemas/users.ts";

/** The demo scenario: an invented shop and its people. Nothing here is a real business or person. */
export const demoShop = {
  name: "Kettle Creek Mower & Saw",
  phone: "555-0142",
  email: "desk@kettlecreek.example",
  address: "14 Mill Race Road, Kettle Creek",
  labourRateCents: 8500,
  diagnosticFeeCents: 4500,
  creditDiagnosticFee: true,
  taxRateBasisPoints: 725,
  currency: "USD",
  defaultUnitSystem: "imperial" as const,
  altitudeM: 410,
  warrantyNote: "Repairs are guaranteed for 90 days on parts and labour from the day you collect the unit. Wear parts (line, chains, blades, plugs) and damage from fuel left in over the season are not covered.",
};

export const demoUsers: { email: string; name: string; role: Role; password: string }[] = [
  { email: "apprentice@kettlecreek.example", name: "Robin Ashdown", role: "apprentice", password: "bench-apprentice" },
  { email: "senior@kettlecreek.example", name: "Wes Tannery", role: "senior_tech", password: "bench-senior-tech" },
  { email: "lead@kettlecreek.example", name: "June Halloway", role: "shop_lead", password: "bench-shop-lead" },
];

export async function isEmpty(db: Database): Promise<boolean> {
  const [row] = await db.select({ n: count() }).from(schema.users);
  return (row?.n ?? 0) === 0;
}

export async function seedDemo(db: Database): Promise<void> {
  const hashes = await Promise.all(demoUsers.map((u) => hashPassword(u.password)));
  await db.transaction(async (tx) => {
    await tx.insert(schema.shopSettings).values({ id: 1, ...demoShop });
    await tx.insert(schema.users).values(
      demoUsers.map((u, i) => ({ id: uuidv7(), email: u.email, name: u.name, role: u.role, unitSystem: demoShop.defaultUnitSystem, passwordHash: hashes[i]! })),
    );
    await recordAudit(tx, { userId: null, action: "demo.seeded", recordType: "shop", recordId: "1" });
  });
}

/**
 * Empties every table (work order numbers start again at 1001), then seeds the demo, the built-in
 * flows and the demo's history again. With a storage, the old photos' files go and the new ones are written.
 */
export async function resetDemo(db: Database, storage?: Storage): Promise<void> {
  const tables = (Object.values(schema) as unknown[]).filter((value): value is PgTable => is(value, PgTable));
  const names = tables.map((t) => `"${getTableName(t)}"`).join(", ");
  const files = storage ? await db.select({ main: schema.attachments.storageKey, thumb: schema.attachments.thumbKey }).from(schema.attachments) : [];
  await db.execute(sql.raw(`TRUNCATE ${names} RESTART IDENTITY CASCADE`));
  for (let i = 0; storage && i < files.length; i += 32) await Promise.all(files.slice(i, i + 32).flatMap((f) => [storage.delete(f.main), storage.delete(f.thumb)]));
  await seedDemo(db);
  await installBuiltInFlows(db);
  await seedHistory(db, storage);
}

export function demoSignInLines(): string[] {
  return demoUsers.map((u) => `  ${u.role.padEnd(12)} ${u.email.padEnd(32)} password: ${u.password}`);
}
