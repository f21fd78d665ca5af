export { formatMoney } from "../../../../shared/calc/money.ts";

export type Parsed = { value: number; error?: undefined } | { value?: undefined; error: string };

/** A price typed as 24.95 (a leading $ and thousands commas allowed) into whole cents. */
export function parsePrice(text: string, what = "price"): Parsed {
  const cleaned = text.trim().replace(/^\$/, "").replace(/,/g, "");
  if (cleaned === "") return { error: `Enter the ${what}, 0 if there is none.` };
  if (/^-/.test(cleaned)) return { error: `The ${what} cannot be negative.` };
  if (!/^\d+(\.\d{0,2})?$/.test(cleaned)) return { error: `Enter the ${what} as a number such as 24.95.` };
  return { value: Math.round(Number(cleaned) * 100) };
}

/** Cents back into what the field shows: 2495 → "24.95". */
export function priceText(cents: number): string {
  return (cents / 100).toFixed(2);
}

/** A quantity or hours typed as 1, 1.5 or 0.25. */
export function parseAmount(text: string, what: "quantity" | "labour hours"): Parsed {
  const cleaned = text.trim().replace(",", ".");
  if (cleaned === "") return { error: what === "quantity" ? "Enter the quantity." : "Enter the labour hours, 0 if none." };
  if (/^-/.test(cleaned)) return { error: what === "quantity" ? "The quantity must be above zero." : "Labour hours cannot be negative." };
  if (!/^\d*\.?\d+$|^\d+\.$/.test(cleaned)) return { error: `Enter the ${what} as a number such as 1.5.` };
  return { value: Number(cleaned) };
}
