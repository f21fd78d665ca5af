// Money as the customer reads it: integer minor units and an ISO 4217 code, formatted by Intl.

const formatters = new Map<string, Intl.NumberFormat>();

function formatterFor(currency: string, locale: string): Intl.NumberFormat {
  const key = `${locale}|${currency}`;
  let formatter = formatters.get(key);
  if (!formatter) {
    formatter = new Intl.NumberFormat(locale, { style: "currency", currency, currencyDisplay: "narrowSymbol" });
    formatters.set(key, formatter);
  }
  return formatter;
}

/** Cents as "$1,234.50" (or the currency's own symbol and decimals); negatives as "-$45.00". */
export function formatMoney(cents: number, currency: string, locale = "en-US"): string {
  const formatter = formatterFor(currency, locale);
  const digits = formatter.resolvedOptions().maximumFractionDigits ?? 2;
  // Minor units are cents for two-decimal currencies; a currency with none (JPY) is stored whole.
  return formatter.format(cents / 10 ** digits);
}

/** A quantity as written on a line: no trailing zeros, up to three decimals. */
export function formatQuantity(quantity: number): string {
  return String(Number(quantity.toFixed(3)));
}

/** Basis points as a percentage: 725 → "7.25 %". */
export function formatRate(basisPoints: number): string {
  return `${String(Number((basisPoints / 100).toFixed(2)))} %`;
}
