import { z } from "zod";
import { equipmentKinds } from "../equipment.ts";

/** The longest date range shop insight reads at once. */
export const INSIGHT_MAX_DAYS = 366 * 3;
const DAY_MS = 86_400_000;
const isoDay = (name: string) => z.iso.date({ error: `${name} is a date written YYYY-MM-DD.` });
// The range checks speak only about two real dates: a malformed day gets its own message and no other.
const datesValid = { when: (payload: { issues: readonly unknown[] }) => payload.issues.length === 0 };

/**
 * GET /api/insight — the shop lead's figures over whole UTC days, both ends included, by the day a
 * session began. Unknown parameters are refused.
 */
export const insightQuerySchema = z
  .strictObject({ from: isoDay("from"), to: isoDay("to") }, { error: (issue) => (issue.code === "unrecognized_keys" ? `Unknown parameter: ${issue.keys.join(", ")}.` : undefined) })
  .refine((q) => q.from <= q.to, { path: ["to"], message: "to must be on or after from.", ...datesValid })
  .refine((q) => (Date.parse(q.to) - Date.parse(q.from)) / DAY_MS < INSIGHT_MAX_DAYS, { path: ["from"], message: `Choose a range of at most ${INSIGHT_MAX_DAYS} days.`, ...datesValid });
export type InsightQuery = z.output<typeof insightQuerySchema>;

const share = z.number().min(0).max(1).nullable();

export const insightResponseSchema = z.object({
  from: z.string(),
  to: z.string(),
  totals: z.object({
    /** Sessions begun in the range, whatever became of them. */
    sessions: z.number().int(),
    completed: z.number().int(),
    abandoned: z.number().int(),
    open: z.number().int(),
    /** Completed sessions the shop lead approved or returned. */
    reviewed: z.number().int(),
    returned: z.number().int(),
    /** returned / reviewed; null when nothing was reviewed. */
    returnRate: share,
    /** Median minutes from start to completion over completed sessions; null when there are none. */
    medianMinutesToFinding: z.number().nullable(),
    /** Completed sessions with at least one automatic flag. */
    flaggedSessions: z.number().int(),
  }),
  /** Completed sessions per flow and finding, most frequent first. */
  findingsByFlow: z.array(z.object({ flowId: z.string(), flowTitle: z.string(), findingStepId: z.string(), findingTitle: z.string(), count: z.number().int() })),
  /** Completed sessions per kind of equipment and finding (by the finding's title), most frequent first. */
  findingsByEquipment: z.array(z.object({ equipmentKind: z.enum(equipmentKinds), findingTitle: z.string(), count: z.number().int() })),
  /** Median minutes to a finding per flow. */
  timeToFinding: z.array(z.object({ flowId: z.string(), flowTitle: z.string(), completed: z.number().int(), medianMinutes: z.number() })),
  /** One row per tech with a session in the range, by name. */
  techs: z.array(
    z.object({
      techId: z.string(),
      techName: z.string(),
      sessions: z.number().int(),
      completed: z.number().int(),
      reviewed: z.number().int(),
      returned: z.number().int(),
      returnRate: share,
      /** Flags on the tech's completed sessions, and how many of those sessions had any. */
      flags: z.number().int(),
      flaggedSessions: z.number().int(),
    }),
  ),
});
export type InsightResponse = z.infer<typeof insightResponseSchema>;
