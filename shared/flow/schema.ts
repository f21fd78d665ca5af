// The flow format, version 1: zod schemas are the final word; docs/flow-format.md explains them.
import { z } from "zod";
import { equipmentKinds } from "../equipment.ts";
import { quantities } from "../calc/units.ts";

export const SLUG = /^[a-z0-9]+(-[a-z0-9]+)*$/;
const OPTION_VALUE = /^[a-z0-9]+([-_][a-z0-9]+)*$/;

/** Inside a section, this target means "go on at the calling step's next". */
export const CONTINUE = "@continue";
/** The value an instruction step is answered with. */
export const DONE = "done";
/** A generous ceiling that keeps a forged or runaway definition from costing the server much. */
export const MAX_STEPS = 20_000;

const slug = (what: string) =>
  z.string().max(80, { error: `${what} is at most 80 characters` }).regex(SLUG, { error: `${what} uses lowercase letters, digits and single hyphens` });

export const flowIdSchema = slug("an id");
export const stepIdSchema = slug("a step id");
// One regex rather than a union of two schemas: a union costs a parse of each option, per target.
export const targetSchema = z
  .string()
  .max(80, { error: "a target is at most 80 characters" })
  .regex(/^(@continue|[a-z0-9]+(-[a-z0-9]+)*)$/, { error: `a target is a step id (lowercase letters, digits, single hyphens) or "${CONTINUE}"` });

export const signalWords = ["DANGER", "WARNING", "CAUTION", "NOTICE"] as const;
export const verdicts = ["good", "marginal", "low", "high", "implausible"] as const;
export const compressionVerdicts = ["good", "marginal", "low", "implausible"] as const;
export const stepKinds = ["instruction", "choice", "reading", "finding", "section"] as const;

// Text is optional here so the validator can say which caution lacks it, by step.
export const cautionSchema = z.strictObject({ signal: z.enum(signalWords), text: z.string().max(500).optional() });

export const photoRequestSchema = z.strictObject({
  requirement: z.enum(["optional", "required"]),
  prompt: z.string().min(1).max(200),
});

const baseStep = {
  title: z.string().min(1).max(120),
  body: z.string().max(2000).optional(),
  cautions: z.array(cautionSchema).max(10).optional(),
  misleads: z.string().max(1000).optional(),
  photo: photoRequestSchema.optional(),
};

export const instructionStepSchema = z.strictObject({
  kind: z.literal("instruction"),
  ...baseStep,
  minSeconds: z.number().int().min(0).max(86_400).optional(),
  next: targetSchema,
});

export const choiceOptionSchema = z.strictObject({
  value: z.string().max(60).regex(OPTION_VALUE, { error: "an option value uses lowercase letters, digits, hyphens and underscores" }),
  label: z.string().min(1).max(120),
  next: targetSchema,
});

export const choiceStepSchema = z.strictObject({
  kind: z.literal("choice"),
  ...baseStep,
  options: z.array(choiceOptionSchema).min(2).max(12),
});

export const boundSchema = z.strictObject({ value: z.number(), inclusive: z.boolean() });

export const bandSchema = z.strictObject({
  from: boundSchema.nullable(),
  to: boundSchema.nullable(),
  label: z.string().min(1).max(80),
  verdict: z.enum(verdicts),
  next: targetSchema,
});

export const compressionEvaluationSchema = z.strictObject({
  kind: z.literal("compression"),
  next: z.strictObject({ good: targetSchema, marginal: targetSchema, low: targetSchema, implausible: targetSchema }),
});

export const evaluationSchema = z.discriminatedUnion("kind", [compressionEvaluationSchema]);

// "Exactly one of evaluation or bands" and "unit of the quantity" are checked by validate.ts, per step.
export const readingStepSchema = z.strictObject({
  kind: z.literal("reading"),
  ...baseStep,
  quantity: z.enum(quantities),
  unit: z.string().min(1).max(20),
  evaluation: evaluationSchema.optional(),
  bands: z.array(bandSchema).min(1).max(20).optional(),
});

export const repairSchema = z.strictObject({
  title: z.string().min(1).max(120),
  labourHours: z.number().min(0).max(100),
  parts: z.array(z.string().min(1).max(120)).max(50),
});

export const findingStepSchema = z.strictObject({
  kind: z.literal("finding"),
  ...baseStep,
  certainty: z.enum(["confirmed", "likely"]),
  explanation: z.string().min(1).max(2000),
  repairs: z.array(repairSchema).max(20),
  followUp: z.array(z.string().min(1).max(200)).max(20).optional(),
});

export const sectionStepSchema = z.strictObject({
  kind: z.literal("section"),
  ...baseStep,
  section: flowIdSchema,
  next: targetSchema,
});

export const flowStepSchema = z.discriminatedUnion("kind", [
  instructionStepSchema,
  choiceStepSchema,
  readingStepSchema,
  findingStepSchema,
  sectionStepSchema,
]);

export const appliesToSchema = z.strictObject({
  equipment: z.array(z.enum(equipmentKinds)).min(1),
  cycle: z.union([z.literal(2), z.literal(4), z.literal("any")]),
});

const envelope = {
  formatVersion: z.literal(1),
  id: flowIdSchema,
  title: z.string().min(1).max(120),
  summary: z.string().max(500).optional(),
  start: stepIdSchema,
};

export const sectionDefinitionSchema = z.strictObject({
  ...envelope,
  steps: z.record(stepIdSchema, flowStepSchema),
});

export const flowDefinitionSchema = z.strictObject({
  ...envelope,
  appliesTo: appliesToSchema,
  steps: z.record(stepIdSchema, flowStepSchema),
  /** Sections embedded by resolveSections, so a stored version needs nothing else. */
  sections: z.record(flowIdSchema, sectionDefinitionSchema).optional(),
});

// The validator parses the envelope and each step on its own, so it can name the step at fault;
// here steps only need to be an object (a record schema would walk every key a second time).
const anObject = (what: string) =>
  z.custom<Record<string, unknown>>((v) => typeof v === "object" && v !== null && !Array.isArray(v), { error: `${what} is an object keyed by id` });
export const flowEnvelopeSchema = z.strictObject({
  ...envelope,
  appliesTo: appliesToSchema,
  steps: anObject("steps"),
  sections: anObject("sections").optional(),
});
export const sectionEnvelopeSchema = z.strictObject({ ...envelope, steps: anObject("steps") });

export type SignalWord = (typeof signalWords)[number];
export type Verdict = (typeof verdicts)[number];
export type CompressionVerdict = (typeof compressionVerdicts)[number];
export type StepKind = (typeof stepKinds)[number];
export type Caution = z.infer<typeof cautionSchema>;
export type PhotoRequest = z.infer<typeof photoRequestSchema>;
export type InstructionStep = z.infer<typeof instructionStepSchema>;
export type ChoiceOption = z.infer<typeof choiceOptionSchema>;
export type ChoiceStep = z.infer<typeof choiceStepSchema>;
export type Bound = z.infer<typeof boundSchema>;
export type Band = z.infer<typeof bandSchema>;
export type CompressionEvaluation = z.infer<typeof compressionEvaluationSchema>;
export type Evaluation = z.infer<typeof evaluationSchema>;
export type ReadingStep = z.infer<typeof readingStepSchema>;
export type Repair = z.infer<typeof repairSchema>;
export type FindingStep = z.infer<typeof findingStepSchema>;
export type SectionStep = z.infer<typeof sectionStepSchema>;
export type FlowStep = z.infer<typeof flowStepSchema>;
export type AppliesTo = z.infer<typeof appliesToSchema>;
export type SectionDefinition = z.infer<typeof sectionDefinitionSchema>;
export type FlowDefinition = z.infer<typeof flowDefinitionSchema>;

// Events. Extra keys (an event's id, seq, times) are stripped, so stored events parse as they are.
const eventStepId = z.string().min(1).max(800);

export const stepAnswerEventSchema = z.object({
  type: z.literal("step.answer"),
  stepId: eventStepId,
  value: z.string().min(1).max(60),
});
export const stepRecordEventSchema = z.object({
  type: z.literal("step.record"),
  stepId: eventStepId,
  value: z.number(),
  unit: z.string().min(1).max(20),
});
export const stepBackEventSchema = z.object({ type: z.literal("step.back") });
export const sessionRestartEventSchema = z.object({ type: z.literal("session.restart") });

export const flowEventSchema = z.discriminatedUnion("type", [
  stepAnswerEventSchema,
  stepRecordEventSchema,
  stepBackEventSchema,
  sessionRestartEventSchema,
]);

export type StepAnswerEvent = z.infer<typeof stepAnswerEventSchema>;
export type StepRecordEvent = z.infer<typeof stepRecordEventSchema>;
export type StepBackEvent = z.infer<typeof stepBackEventSchema>;
export type SessionRestartEvent = z.infer<typeof sessionRestartEventSchema>;
export type FlowEvent = z.infer<typeof flowEventSchema>;
