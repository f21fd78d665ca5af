import type { AppContext } from "../context.ts";
import { shopSettings, type ShopSettingsRow } from "../db/schema.ts";
import { DEFAULT_FLAG_LIMITS, type FlagLimits } from "../../shared/review/flags.ts";

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
