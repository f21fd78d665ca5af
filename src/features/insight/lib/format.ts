/** A duration as the bench says it: "18 min", "1 h 05 min"; whole minutes. */
export function formatMinutes(minutes: number): string {
  if (minutes > 0 && minutes < 0.5) return "under 1 min";
  const whole = Math.round(minutes);
  if (whole < 60) return `${whole} min`;
  return `${Math.floor(whole / 60)} h ${String(whole % 60).padStart(2, "0")} min`;
}

/** A share as a whole percentage, never rounded to 0 % or 100 % when it is not. */
export function formatShare(share: number | null): string {
  if (share === null) return "none reviewed";
  if (share > 0 && share < 0.005) return "under 1%";
  if (share < 1 && share > 0.995) return "over 99%";
  return `${Math.round(share * 100)}%`;
}

/** The same share as a number for a spreadsheet: a whole percentage, or empty. */
export function sharePercent(share: number | null): number | null {
  return share === null ? null : Math.round(share * 100);
}

/** Minutes to one decimal for a spreadsheet. */
export function roundMinutes(minutes: number | null): number | null {
  return minutes === null ? null : Math.round(minutes * 10) / 10;
}

const dayFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

/** "1 Mar 2026 to 31 May 2026" */
export function formatRange({ from, to }: { from: string; to: string }): string {
  const day = (iso: string) => dayFormat.format(new Date(`${iso}T00:00:00Z`));
  return from === to ? day(from) : `${day(from)} to ${day(to)}`;
}
