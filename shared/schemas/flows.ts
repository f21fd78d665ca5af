// The API contract for flows: the list, drafts (optimistic concurrency by revision), versions,
// publishing, retiring, import and export, and the check-order advice.
import { z } from "zod";
import { appliesToSchema, flowIdSchema } from "../flow/schema.ts";

/** A draft may be unfinished, so it travels as any JSON object; the validator names what is wrong. */
export const draftDefinitionSchema = z.record(z.string(), z.unknown());

/** A validator problem as the API sends it (shared/flow/problems.ts `Problem`, with the code as text). */
export const problemSchema = z.object({
  stepId: z.string().nullable(),
  code: z.string(),
  message: z.string(),
  severity: z.enum(["error", "warning"]),
});

/** Route parameters: any short text reaches the lookup, so an unknown id is a 404 rather than a 400. */
export const flowParamsSchema = z.object({ id: z.string().min(1).max(80) });
export const flowVersionParamsSchema = flowParamsSchema.extend({ number: z.coerce.number().int().min(1).max(1_000_000) });

const person = z.object({ id: z.string(), name: z.string() }).nullable();

/** GET /api/flows — one row per flow. Apprentices see published, unretired flows only and no drafts. */
export const flowListItemSchema = z.object({
  id: z.string(),
  title: z.string(),
  appliesTo: appliesToSchema.nullable(),
  retired: z.boolean(),
  published: z.object({ number: z.number().int(), createdAt: z.string(), createdBy: person }).nullable(),
  draft: z.object({ revision: z.number().int(), updatedAt: z.string(), updatedBy: person, errorCount: z.number().int() }).nullable(),
  /** Whoever touched the flow last: the draft's editor, else the latest version's author. */
  lastEditedBy: person,
  sessionCount: z.number().int(),
});
export type FlowListItem = z.infer<typeof flowListItemSchema>;
export const flowListResponseSchema = z.object({ flows: z.array(flowListItemSchema) });

/** POST /api/flows — a new flow starts as a draft with one finding step; nothing is published. */
export const createFlowRequestSchema = z.object({
  id: flowIdSchema,
  title: z.string().trim().min(1, { error: "Give the flow a title." }).max(120, { error: "Use at most 120 characters." }),
});

export const versionSummarySchema = z.object({
  number: z.number().int(),
  note: z.string(),
  createdAt: z.string(),
  createdBy: person,
  sessionCount: z.number().int(),
});
export type VersionSummary = z.infer<typeof versionSummarySchema>;

/** GET /api/flows/:id — the flow, its versions (newest first) and, for editors, its draft. */
export const flowDetailSchema = z.object({
  id: z.string(),
  title: z.string(),
  retired: z.boolean(),
  versions: z.array(versionSummarySchema),
  draft: z
    .object({
      revision: z.number().int(),
      basedOnVersion: z.number().int().nullable(),
      definition: draftDefinitionSchema,
      problems: z.array(problemSchema),
      updatedAt: z.string(),
      updatedBy: person,
    })
    .nullable(),
});
export type FlowDetail = z.infer<typeof flowDetailSchema>;

/** GET /api/flows/:id/versions/:number — an immutable published definition. */
export const flowVersionSchema = versionSummarySchema.extend({ flowId: z.string(), definition: draftDefinitionSchema });
export type FlowVersion = z.infer<typeof flowVersionSchema>;

/** POST /api/flows/:id/draft — start the draft from a version (default: the latest); 409 if one exists. */
export const startDraftRequestSchema = z.object({ fromVersion: z.number().int().min(1).optional() });

/** PUT /api/flows/:id/draft — save; `revision` is the one the edit was based on; a stale one gets 409. */
export const saveDraftRequestSchema = z.object({ revision: z.number().int().min(1), definition: draftDefinitionSchema });
export const saveDraftResponseSchema = z.object({ revision: z.number().int(), problems: z.array(problemSchema), updatedAt: z.string() });
export type SaveDraftResponse = z.infer<typeof saveDraftResponseSchema>;
/** The 409 body's `details` on a stale save: the draft as it now stands on the server. */
export const staleDraftDetailsSchema = z.object({ revision: z.number().int(), definition: draftDefinitionSchema, updatedBy: person, updatedAt: z.string() });

/** POST /api/flows/:id/publish — refused with 422 (details.problems) while the draft has errors. */
export const publishRequestSchema = z.object({
  revision: z.number().int().min(1),
  note: z.string().trim().min(1, { error: "Say what changed in this version." }).max(1000, { error: "Use at most 1000 characters." }),
});
export const publishResponseSchema = versionSummarySchema;

/** PATCH /api/flows/:id — retire (no new sessions) or bring back. */
export const updateFlowRequestSchema = z.object({ retired: z.boolean() });

/** GET /api/flows/:id/export?version=N|draft — the file; POST /api/flows/import takes one back. */
export const exportQuerySchema = z.object({ version: z.union([z.literal("draft"), z.coerce.number().int().min(1)]).optional() });
export const MAX_IMPORT_BYTES = 1024 * 1024;
export const importResponseSchema = z.object({
  flowId: z.string(),
  created: z.boolean(),
  revision: z.number().int(),
  problems: z.array(problemSchema),
});

/** GET /api/flows/:id/advice — from completed sessions on any version of the flow. */
export const adviceResponseSchema = z.object({
  sessionCount: z.number().int(),
  /** Below this many completed sessions the advice is withheld. */
  minimumSessions: z.number().int(),
  enough: z.boolean(),
  findings: z.array(z.object({ stepId: z.string(), title: z.string(), count: z.number().int(), share: z.number() })),
  checks: z.array(z.object({ stepId: z.string(), title: z.string(), medianMinutes: z.number().nullable(), samples: z.number().int() })),
  /** Null when there is too little history or nothing to reorder. */
  suggestion: z
    .object({
      /** The independent checks (the flow's sections at its top level) in today's order and in the p/c order. */
      current: z.array(z.string()),
      suggested: z.array(z.string()),
      expectedMinutesNow: z.number(),
      expectedMinutesSuggested: z.number(),
      explanation: z.string(),
    })
    .nullable(),
});
export type AdviceResponse = z.infer<typeof adviceResponseSchema>;
