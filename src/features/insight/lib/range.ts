import { INSIGHT_MAX_DAYS, insightQuerySchema, type InsightQuery } from "../../../../shared/schemas/insight.ts";

const DAY_MS = 86_400_000;

/** Days are whole UTC days, as the server counts them. */
export const isoDay = (date: Date) => date.toISOString().slice(0, 10);
const daysBefore = (day: string, days: number) => isoDay(new Date(Date.parse(`${day}T00:00:00Z`) - days * DAY_MS));

export const quickRanges = [
  { id: "last-30", label: "Last 30 days", range: (today: string) => ({ from: daysBefore(today, 29), to: today }) },
  { id: "last-90", label: "Last 90 days", range: (today: string) => ({ from: daysBefore(today, 89), to: today }) },
  { id: "this-year", label: "This year", range: (today: string) => ({ from: `${today.slice(0, 4)}-01-01`, to: today }) },
] as const;

/** What the address asks for; a missing end falls back to the last 90 days up to today. */
export function rangeFromParams(params: URLSearchParams, today: string): { from: string; to: string } {
  const fallback = quickRanges[1].range(today);
  return { from: params.get("from") ?? fallback.from, to: params.get("to") ?? fallback.to };
}

export interface RangeCheck {
  range: InsightQuery | null;
  errors: { from?: string; to?: string };
}

/** The shared contract decides; the words are the form's own, beside the field they are about. */
export function checkRange(from: string, to: string): RangeCheck {
  const parsed = insightQuerySchema.safeParse({ from, to });
  if (parsed.success) return { range: parsed.data, errors: {} };
  const errors: RangeCheck["errors"] = {};
  for (const issue of parsed.error.issues) {
    const field = issue.path[0];
    if (field !== "from" && field !== "to") continue;
    if (errors[field]) continue;
    if (issue.code !== "custom") errors[field] = field === "from" ? "Enter the first day as a full date." : "Enter the last day as a full date.";
    else if (field === "to") errors.to = "The last day must be on or after the first day.";
    else errors.from = `Choose at most ${INSIGHT_MAX_DAYS} days (about three years).`;
  }
  return { range: null, errors };
}
