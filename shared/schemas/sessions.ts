import { z } from "zod";
import { equipmentKinds } from "../equipment.ts";
import { flowEventSchema, signalWords } from "../flow/schema.ts";

/** What a tablet may append to a session besides the flow's own events. */
export const noteEventSchema = z.object({ type: z.literal("note.add"), stepId: z.string().min(1).max(800), text: z.string().trim().min(1).max(500) });
export const photoEventSchema = z.object({ type: z.literal("photo.attach"), stepId: z.string().min(1).max(800), attachmentId: z.uuid() });
export const cautionEventSchema = z.object({ type: z.literal("caution.acknowledge"), stepId: z.string().min(1).max(800), signal: z.enum(signalWords) });

export const sessionEventBodySchema = z.union([flowEventSchema, noteEventSchema, photoEventSchema, cautionEventSchema]);
export type SessionEventBody = z.infer<typeof sessionEventBodySchema>;

/** POST /api/sessions/:id/events — the client makes the id (uuid v7) and the next seq (1, 2, ...). */
export const appendEventRequestSchema = z.object({
  id: z.uuid({ error: "an event id is a uuid made by the tablet" }),
  seq: z.number().int().min(1).max(100_000),
  recordedAt: z.iso.datetime({ offset: true }),
  event: sessionEventBodySchema,
});
export type AppendEventRequest = z.infer<typeof appendEventRequestSchema>;

export const storedEventSchema = appendEventRequestSchema.extend({ receivedAt: z.string() });
export type StoredEvent = z.infer<typeof storedEventSchema>;

export const createSessionRequestSchema = z.object({ flowId: z.string().min(1).max(80) });

export const abandonSessionRequestSchema = z.object({ reason: z.string().trim().min(3, { error: "Say in a few words why the session is abandoned." }).max(500) });

export const sessionStatuses = ["open", "completed", "abandoned"] as const;
export const reviewStates = ["not_submitted", "waiting", "approved", "returned"] as const;

export const sessionDetailSchema = z.object({
  id: z.string(),
  workOrderId: z.string(),
  workOrderNumber: z.number().int(),
  customer: z.string(),
  /** The unit on the bench, so the screen always says which one the check is for. */
  unit: z.object({ equipmentKind: z.enum(equipmentKinds), make: z.string(), model: z.string() }),
  techId: z.string(),
  techName: z.string(),
  status: z.enum(sessionStatuses),
  /** Why the tech stopped, for an abandoned session. */
  abandonReason: z.string().nullable(),
  reviewState: z.enum(reviewStates),
  reviewComment: z.string().nullable(),
  /** Who signed the session off or sent it back, and when; null until then. */
  reviewerName: z.string().nullable(),
  reviewedAt: z.string().nullable(),
  flow: z.object({ flowId: z.string(), versionId: z.string(), version: z.number().int(), title: z.string() }),
  /** The pinned version's definition with its sections inlined, ready for compileFlow. */
  definition: z.unknown(),
  /** The machine's input: the unit's engine facts and the shop's altitude when the session began. */
  input: z.object({
    profile: z.object({ cycle: z.union([z.literal(2), z.literal(4)]), compressionRelease: z.enum(["yes", "no", "unknown"]), displacementCc: z.number().nullable() }),
    altitudeM: z.number(),
  }),
  events: z.array(storedEventSchema),
  /** The server's replay: where the session stands. */
  currentStepId: z.string(),
  findingStepId: z.string().nullable(),
  startedAt: z.string(),
  completedAt: z.string().nullable(),
});
export type SessionDetail = z.infer<typeof sessionDetailSchema>;

export const appendEventResponseSchema = z.object({
  stored: z.boolean(),
  event: storedEventSchema,
  currentStepId: z.string(),
  findingStepId: z.string().nullable(),
});

/** The multipart `stepId` field of POST /api/sessions/:id/photos. */
export const sessionPhotoFieldsSchema = z.object({
  stepId: z.string().min(1, { error: "Name the step the photo is for." }).max(800),
  /** Chosen by the tablet, so a photo sent again after a lost answer is stored once. */
  id: z.uuid({ error: "The photo's id must be a UUID." }).optional(),
});

/** What an upload answers; the tablet then appends a photo.attach event naming the id. */
export const uploadedPhotoSchema = z.object({ id: z.string(), width: z.number().int(), height: z.number().int(), url: z.string(), thumbUrl: z.string() });
export type UploadedPhoto = z.infer<typeof uploadedPhotoSchema>;

export const benchSessionSchema = z.object({
  sessionId: z.string(),
  workOrderId: z.string(),
  workOrderNumber: z.number().int(),
  unit: z.object({ equipmentKind: z.string(), make: z.string(), model: z.string() }),
  flowTitle: z.string(),
  currentStepId: z.string(),
  currentStepTitle: z.string(),
  reviewComment: z.string().nullable(),
  startedAt: z.string(),
});
export type BenchSession = z.infer<typeof benchSessionSchema>;

/** GET /api/bench/home — the signed-in tech's own sessions. */
export const benchHomeResponseSchema = z.object({
  open: z.array(benchSessionSchema),
  waitingForReview: z.array(benchSessionSchema),
  returned: z.array(benchSessionSchema),
});
export type BenchHomeResponse = z.infer<typeof benchHomeResponseSchema>;
