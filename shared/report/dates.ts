// Dates on the customer report: the calendar day in UTC, the zone the records are kept in.

const dayFormat = new Intl.DateTimeFormat("en-US", { year: "numeric", month: "long", day: "numeric", timeZone: "UTC" });

/** "December 2, 2026"; an empty string for a missing or unreadable date. */
export function formatDay(iso: string | null): string {
  if (!iso) return "";
  const time = Date.parse(iso);
  return Number.isNaN(time) ? "" : dayFormat.format(time);
}
