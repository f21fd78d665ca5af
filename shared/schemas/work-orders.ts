import { z } from "zod";
import { compressionReleaseValues, equipmentKinds } from "../equipment.ts";
import { testRunSchema } from "./test-runs.ts";

export const workOrderStates = [
  "waiting_for_diagnosis",
  "diagnosing",
  "waiting_for_approval",
  "approved",
  "declined",
  "waiting_for_parts",
  "in_repair",
  "test_run",
  "ready_for_pickup",
  "picked_up",
] as const;
export type WorkOrderState = (typeof workOrderStates)[number];

export const workOrderStateLabels: Record<WorkOrderState, string> = {
  waiting_for_diagnosis: "Waiting for diagnosis",
  diagnosing: "Diagnosing",
  waiting_for_approval: "Waiting for approval",
  approved: "Approved",
  declined: "Declined",
  waiting_for_parts: "Waiting for parts",
  in_repair: "In repair",
  test_run: "Test run",
  ready_for_pickup: "Ready for pick-up",
  picked_up: "Picked up",
};

export const tankContents = ["fresh", "stale", "premix", "empty", "unknown"] as const;
export type TankContents = (typeof tankContents)[number];
export const tankContentLabels: Record<TankContents, string> = {
  fresh: "Fresh fuel",
  stale: "Stale fuel",
  premix: "Premix (fuel and oil)",
  empty: "Empty",
  unknown: "Not known",
};

const text = (max: number, message: string) => z.string().trim().min(1, { error: message }).max(max, { error: `Use at most ${max} characters.` });
const optionalText = (max: number) => z.string().trim().max(max, { error: `Use at most ${max} characters.` }).default("");

export const customerInputSchema = z.object({
  name: text(120, "Enter the customer's name."),
  phone: z
    .string()
    .trim()
    .max(40, { error: "Use at most 40 characters." })
    .regex(/^[0-9+() .-]*$/, { error: "Use digits, spaces and + ( ) - . only." })
    .default(""),
  email: z.union([z.literal(""), z.string().trim().toLowerCase().pipe(z.email({ error: "Enter an e-mail address such as name@example.com, or leave it empty." }))]).default(""),
});

export const unitInputSchema = z.object({
  equipmentKind: z.enum(equipmentKinds, { error: "Choose the kind of equipment." }),
  make: text(80, "Enter the make as printed on the unit."),
  model: text(80, "Enter the model as printed on the unit."),
  engineModel: optionalText(80),
  engineType: optionalText(80),
  engineSerial: optionalText(80),
  cycle: z.union([z.literal(2), z.literal(4)], { error: "Choose 2-stroke or 4-stroke." }),
  displacementCc: z
    .number({ error: "Enter the displacement in cc, or leave it empty." })
    .min(10, { error: "Small engines are 10 cc or more." })
    .max(1000, { error: "Use at most 1000 cc." })
    .nullable()
    .default(null),
  compressionRelease: z.enum(compressionReleaseValues, { error: "Choose yes, no or not known." }).default("unknown"),
  hours: z.number({ error: "Enter the hour meter reading, or leave it empty." }).min(0, { error: "Hours cannot be negative." }).max(100_000).nullable().default(null),
});

export const createWorkOrderRequestSchema = z.object({
  customer: customerInputSchema,
  unit: unitInputSchema,
  complaint: text(2000, "Write the complaint in the customer's words."),
  alreadyTried: optionalText(2000),
  tankContents: z.enum(tankContents, { error: "Choose what is in the tank." }),
});
export type CreateWorkOrderRequest = z.input<typeof createWorkOrderRequestSchema>;

export const listWorkOrdersQuerySchema = z.object({
  search: z.string().trim().max(100).optional(),
  state: z.union([z.enum(workOrderStates), z.literal("open"), z.literal("all")]).default("open"),
  limit: z.coerce.number().int().min(1).max(100).default(50),
});

export const workOrderSummarySchema = z.object({
  id: z.string(),
  number: z.number().int(),
  state: z.enum(workOrderStates),
  customerName: z.string(),
  equipmentKind: z.enum(equipmentKinds),
  make: z.string(),
  model: z.string(),
  complaint: z.string(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type WorkOrderSummary = z.infer<typeof workOrderSummarySchema>;

export const workOrderDetailSchema = workOrderSummarySchema.extend({
  customer: z.object({ id: z.string(), name: z.string(), phone: z.string(), email: z.string() }),
  unit: unitInputSchema.extend({ id: z.string() }),
  alreadyTried: z.string(),
  tankContents: z.enum(tankContents),
  intakePhotoId: z.string().nullable(),
  sessions: z.array(
    z.object({
      id: z.string(),
      flowTitle: z.string(),
      flowVersion: z.number().int(),
      techId: z.string(),
      techName: z.string(),
      status: z.enum(["open", "completed", "abandoned"]),
      findingTitle: z.string().nullable(),
      startedAt: z.string(),
    }),
  ),
  /** Published flows whose equipment kinds and cycle fit this unit. */
  applicableFlows: z.array(z.object({ flowId: z.string(), title: z.string(), summary: z.string(), version: z.number().int() })),
  /** The newest test run after a repair, if one was recorded. */
  latestTestRun: testRunSchema.nullable().optional(),
});
export type WorkOrderDetail = z.infer<typeof workOrderDetailSchema>;

/** A record's id in a path: uuids only, so a malformed id is a clear 400, not a database error. */
export const idParamsSchema = z.object({ id: z.uuid({ error: "the id in the path is not a valid id" }) });

export const workOrderListResponseSchema = z.object({ workOrders: z.array(workOrderSummarySchema) });
export type WorkOrderListResponse = z.infer<typeof workOrderListResponseSchema>;
