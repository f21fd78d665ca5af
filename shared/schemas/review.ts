import { z } from "zod";
import { equipmentKinds } from "../equipment.ts";
import { flagCodes } from "../review/flags.ts";
import { reviewStates, sessionStatuses } from "./sessions.ts";

export const REVIEW_COMMENT_MAX = 2000;

/** POST /api/sessions/:id/review — the shop lead's sign-off; a return says what to redo. */
export const reviewDecisionRequestSchema = z
  .strictObject({
    decision: z.enum(["approve", "return"], { error: 'The decision is "approve" or "return".' }),
    comment: z.string({ error: "The comment is text." }).trim().max(REVIEW_COMMENT_MAX, { error: `Keep the comment to ${REVIEW_COMMENT_MAX} characters.` }).default(""),
  })
  .superRefine((body, ctx) => {
    if (body.decision === "return" && body.comment === "") ctx.addIssue({ code: "custom", path: ["comment"], message: "Say what the tech should look at again before returning the session." });
  });
export type ReviewDecisionRequest = z.output<typeof reviewDecisionRequestSchema>;

export const reviewSorts = ["startedAt", "completedAt", "tech", "flow"] as const;
export type ReviewSort = (typeof reviewSorts)[number];

const list = (values: readonly string[]) => values.map((v) => `"${v}"`).join(", ");
const oneOf = <T extends readonly [string, ...string[]]>(name: string, values: T) => z.enum(values, { error: `${name} is one of ${list(values)}.` });
const isoDay = (name: string) => z.iso.date({ error: `${name} is a date written YYYY-MM-DD.` });

/** GET /api/review/sessions — query parameters arrive as text; unknown ones are refused. */
export const reviewQueueQuerySchema = z
  .strictObject({
    page: z.coerce.number({ error: "page is a whole number from 1." }).int({ error: "page is a whole number from 1." }).min(1, { error: "page is a whole number from 1." }).default(1),
    pageSize: z.coerce.number({ error: "pageSize is a whole number from 1 to 100." }).int({ error: "pageSize is a whole number from 1 to 100." }).min(1, { error: "pageSize is a whole number from 1 to 100." }).max(100, { error: "pageSize is at most 100." }).default(25),
    sort: oneOf("sort", reviewSorts).default("startedAt"),
    order: oneOf("order", ["asc", "desc"]).default("desc"),
    techId: z.string().min(1).max(80).optional(),
    flowId: z.string().min(1).max(80).optional(),
    findingStepId: z.string().min(1).max(800).optional(),
    equipmentKind: oneOf("equipmentKind", equipmentKinds).optional(),
    from: isoDay("from").optional(),
    to: isoDay("to").optional(),
    flagged: oneOf("flagged", ["true", "false"]).transform((v) => v === "true").optional(),
    reviewState: oneOf("reviewState", reviewStates).optional(),
    search: z.string().trim().max(100, { error: "search is at most 100 characters." }).optional(),
  }, { error: (issue) => (issue.code === "unrecognized_keys" ? `Unknown filter: ${issue.keys.join(", ")}.` : undefined) })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { path: ["to"], message: "to must be on or after from." });
export type ReviewQueueQuery = z.output<typeof reviewQueueQuerySchema>;

export const reviewQueueRowSchema = z.object({
  sessionId: z.string(),
  workOrderNumber: z.number().int(),
  customer: z.string(),
  unit: z.object({ equipmentKind: z.enum(equipmentKinds), make: z.string(), model: z.string() }),
  techId: z.string(),
  techName: z.string(),
  flow: z.object({ flowId: z.string(), title: z.string(), version: z.number().int() }),
  findingStepId: z.string().nullable(),
  findingStepTitle: z.string().nullable(),
  status: z.enum(sessionStatuses),
  reviewState: z.enum(reviewStates),
  startedAt: z.string(),
  completedAt: z.string().nullable(),
  /** Counted when the session was completed; an open session counts its open_too_long flag once it is past the shop's limit. */
  flagCount: z.number().int(),
});
export type ReviewQueueRow = z.infer<typeof reviewQueueRowSchema>;

export const reviewQueueResponseSchema = z.object({ rows: z.array(reviewQueueRowSchema), total: z.number().int(), page: z.number().int(), pageSize: z.number().int() });
export type ReviewQueueResponse = z.infer<typeof reviewQueueResponseSchema>;

export const sessionFlagSchema = z.object({ code: z.enum(flagCodes), stepId: z.string().nullable(), reason: z.string() });

/** GET /api/review/sessions/:id/flags — stored at completion; worked out now for a session still open. */
export const sessionFlagsResponseSchema = z.object({ sessionId: z.string(), computedAt: z.string(), flags: z.array(sessionFlagSchema) });
export type SessionFlagsResponse = z.infer<typeof sessionFlagsResponseSchema>;

/** GET /api/review/options takes no parameters. */
export const reviewOptionsQuerySchema = z.strictObject({}, { error: (issue) => (issue.code === "unrecognized_keys" ? `The filter options take no parameters: ${issue.keys.join(", ")}.` : undefined) });

/** GET /api/review/options — what the queue's filters offer, from the sessions the caller may list. */
export const reviewOptionsResponseSchema = z.object({
  techs: z.array(z.object({ id: z.string(), name: z.string() })),
  /** Each flow with the findings its versions can end at, newest version's titles first. */
  flows: z.array(z.object({ flowId: z.string(), title: z.string(), findings: z.array(z.object({ stepId: z.string(), title: z.string() })) })),
});
export type ReviewOptionsResponse = z.infer<typeof reviewOptionsResponseSchema>;
