import { sql } from "drizzle-orm";
import type { AppContext } from "../context.ts";
import { recordAudit } from "./audit.ts";
import { shopSettings, type ShopSettingsRow } from "../db/schema.ts";
import { DEFAULT_FLAG_LIMITS, type FlagLimits } from "../../shared/review/flags.ts";
import { settingsFieldNames, type Settings, type SettingsResponse } from "../../shared/schemas/settings.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

export async function getSettings(ctx: Pick<AppContext, "db">): Promise<ShopSettingsRow | null> {
  const [row] = await ctx.db.select().from(shopSettings).limit(1);
  return row ?? null;
}

export async function getShopName(ctx: Pick<AppContext, "db">): Promise<string> {
  return (await getSettings(ctx))?.name ?? "Benchpath";
}

/** The shop's limits for the automatic review flags. */
export async function flagLimits(ctx: Pick<AppContext, "db">): Promise<FlagLimits> {
  const [row] = await ctx.db.select({ openHours: shopSettings.reviewOpenHours }).from(shopSettings).limit(1);
  return row ?? DEFAULT_FLAG_LIMITS;
}

/** The stored settings as the API answers them; before the shop is set up, the table's defaults with no name. */
export async function readSettings(ctx: Pick<AppContext, "db">): Promise<SettingsResponse> {
  const row = await getSettings(ctx);
  if (!row) return { ...unsetShop, updatedAt: null };
  return toResponse(row);
}

/** Replaces the settings row and audits which fields changed (names only; the values are in the row). */
export async function updateSettings(ctx: Pick<AppContext, "db">, user: PublicUser, input: Settings): Promise<SettingsResponse> {
  return ctx.db.transaction(async (tx) => {
    const [before] = await tx.select().from(shopSettings).limit(1).for("update");
    const changed = settingsFieldNames.filter((field) => !before || before[field] !== input[field]);
    if (changed.length === 0 && before) return toResponse(before);
    const [row] = await tx
      .insert(shopSettings)
      .values({ id: 1, ...input })
      .onConflictDoUpdate({ target: shopSettings.id, set: { ...input, updatedAt: sql`now()` } })
      .returning();
    await recordAudit(tx, { userId: user.id, action: "settings.updated", recordType: "shop", recordId: "1", details: { changed } });
    return toResponse(row!);
  });
}

const unsetShop: Settings = {
  name: "",
  phone: "",
  email: "",
  address: "",
  labourRateCents: 0,
  diagnosticFeeCents: 0,
  creditDiagnosticFee: true,
  taxRateBasisPoints: 0,
  taxLabour: false,
  currency: "USD",
  defaultUnitSystem: "imperial",
  altitudeM: 0,
  replaceThresholdPercent: 50,
  estimateValidDays: 30,
  reviewOpenHours: DEFAULT_FLAG_LIMITS.openHours,
  warrantyNote: "",
};

function toResponse(row: ShopSettingsRow): SettingsResponse {
  const { id: _id, updatedAt, ...rest } = row;
  return { ...rest, updatedAt: updatedAt.toISOString() };
}
