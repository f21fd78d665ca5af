const format = new Intl.DateTimeFormat("en-US", { day: "numeric", month: "short", year: "numeric", hour: "numeric", minute: "2-digit" });
const dayFormat = new Intl.DateTimeFormat("en-US", { day: "numeric", month: "long", year: "numeric" });

/** "Dec 2, 2026, 3:42 PM" in the reader's own time zone. */
export function whenWords(iso: string): string {
  return format.format(new Date(iso));
}

export function dayWords(iso: string): string {
  return dayFormat.format(new Date(iso));
}
