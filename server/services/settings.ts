import type { AppContext } from "../context.ts";
import { shopSettings, type ShopSettingsRow } from "../db/schema.ts";

export async function getSettings(ctx: Pick<AppContext, "db">): Promise<ShopSettingsRow | null> {
  const [row] = await ctx.db.select().from(shopSettings).limit(1);
  return row ?? null;
}

export async function getShopName(ctx: Pick<AppContext, "db">): Promise<string> {
  return (await getSettings(ctx))?.name ?? "Benchpath";
}
