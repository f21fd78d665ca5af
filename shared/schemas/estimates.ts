// /api/estimates and /api/public/estimates: the tech's estimate builder and the customer's answer by link.
import { z } from "zod";
import { QUANTITY_DECIMALS } from "../calc/estimate.ts";
import { estimateStatuses } from "./estimate-records.ts";
import { equipmentKinds } from "../equipment.ts";

/** At most QUANTITY_DECIMALS places, the precision the shared arithmetic works in. */
const fewDecimals = (value: number) => Math.abs(value * 10 ** QUANTITY_DECIMALS - Math.round(value * 10 ** QUANTITY_DECIMALS)) < 1e-6;
const MAX_CENTS = 100_000_000;

export const estimatePartLineSchema = z.object({
  partNumber: z.string({ error: "Enter the part number as text, or leave it empty." }).trim().max(60, { error: "Use at most 60 characters." }).default(""),
  description: z.string({ error: "Describe the part." }).trim().min(1, { error: "Describe the part." }).max(200, { error: "Use at most 200 characters." }),
  quantity: z
    .number({ error: "Enter the quantity as a number." })
    .gt(0, { error: "The quantity must be above zero." })
    .max(10_000, { error: "Use a quantity of at most 10,000." })
    .refine(fewDecimals, { error: `Use at most ${QUANTITY_DECIMALS} decimal places.` }),
  unitPriceCents: z
    .number({ error: "Enter the unit price." })
    .int({ error: "Enter the price to the cent." })
    .min(0, { error: "The price cannot be negative." })
    .max(MAX_CENTS, { error: "That price is too large." }),
});
export type EstimatePartLineInput = z.input<typeof estimatePartLineSchema>;

export const estimateOptionInputSchema = z.object({
  /** The option's id when it was saved before; a new option has none. */
  id: z.uuid({ error: "The option's id is not a valid id." }).optional(),
  title: z.string({ error: "Name the option." }).trim().min(1, { error: "Name the option, such as “Rebuild the carburettor”." }).max(120, { error: "Use at most 120 characters." }),
  labourHours: z
    .number({ error: "Enter the labour hours as a number." })
    .min(0, { error: "Labour hours cannot be negative." })
    .max(100, { error: "Use at most 100 hours." })
    .refine(fewDecimals, { error: `Use at most ${QUANTITY_DECIMALS} decimal places.` }),
  parts: z.array(estimatePartLineSchema).max(50, { error: "Use at most 50 parts lines in one option." }),
});

/** PUT /api/estimates/:id — the whole draft as the builder holds it. */
export const updateEstimateRequestSchema = z.object({
  options: z.array(estimateOptionInputSchema).min(1, { error: "An estimate needs at least one option." }).max(10, { error: "Put at most 10 options to the customer." }),
  note: z.string({ error: "The note must be text." }).trim().max(2000, { error: "Use at most 2000 characters." }).default(""),
  replacementPriceCents: z
    .number({ error: "Enter the price of a new unit, or leave it empty." })
    .int({ error: "Enter the price to the cent." })
    .positive({ error: "The price of a new unit must be above zero, or left empty." })
    .max(MAX_CENTS, { error: "That price is too large." })
    .nullable()
    .default(null),
});
export type UpdateEstimateRequest = z.input<typeof updateEstimateRequestSchema>;

/** POST /api/estimates — a draft started from the work order's finding. */
export const createEstimateRequestSchema = z.object({
  workOrderId: z.uuid({ error: "Name the work order the estimate is for." }),
  /** The finished session to start from; the work order's latest finding when left out. */
  sessionId: z.uuid({ error: "The session's id is not a valid id." }).optional(),
});

export const listEstimatesQuerySchema = z.object({ workOrderId: z.uuid({ error: "Name the work order whose estimates to list." }) });

/** POST /api/estimates/:id/send */
export const sendEstimateRequestSchema = z.object({
  to: z
    .string({ error: "Enter the customer's e-mail address." })
    .trim()
    .toLowerCase()
    .min(1, { error: "Enter the customer's e-mail address." })
    .pipe(z.email({ error: "Enter an e-mail address such as name@example.com." })),
});

export const moneyTotalsSchema = z.object({
  partsCents: z.number().int(),
  labourCents: z.number().int(),
  diagnosticFeeCents: z.number().int(),
  diagnosticCreditCents: z.number().int(),
  subtotalCents: z.number().int(),
  taxCents: z.number().int(),
  totalCents: z.number().int(),
});

export const repairOrReplaceSchema = z.object({ recommendation: z.enum(["repair", "consider_replacing"]), sentence: z.string() });

export const estimateRatesSchema = z.object({
  labourRateCents: z.number().int(),
  diagnosticFeeCents: z.number().int(),
  creditDiagnosticFee: z.boolean(),
  taxRateBasisPoints: z.number().int(),
  taxLabour: z.boolean(),
});

const partLineSchema = z.object({ partNumber: z.string(), description: z.string(), quantity: z.number(), unitPriceCents: z.number().int() });

export const estimateOptionSchema = z.object({
  id: z.string(),
  position: z.number().int(),
  title: z.string(),
  labourHours: z.number(),
  parts: z.array(partLineSchema),
  totals: moneyTotalsSchema,
  /** Against the new unit's price, when one is entered. */
  repairOrReplace: repairOrReplaceSchema.nullable(),
});
export type EstimateOption = z.infer<typeof estimateOptionSchema>;

export const estimateSendSchema = z.object({ to: z.string(), status: z.enum(["sending", "sent", "failed"]), error: z.string().nullable(), at: z.string() });

export const estimateSchema = z.object({
  id: z.string(),
  workOrderId: z.string(),
  revision: z.number().int(),
  revisesId: z.string().nullable(),
  status: z.enum(estimateStatuses),
  findingTitle: z.string(),
  currency: z.string(),
  rates: estimateRatesSchema,
  replaceThresholdPercent: z.number().int(),
  replacementPriceCents: z.number().int().nullable(),
  note: z.string(),
  options: z.array(estimateOptionSchema),
  createdAt: z.string(),
  updatedAt: z.string(),
  sentAt: z.string().nullable(),
  sentByName: z.string().nullable(),
  validUntil: z.string().nullable(),
  decidedAt: z.string().nullable(),
  approvedOptionId: z.string().nullable(),
  customerComment: z.string(),
  /** The latest attempt to e-mail it: the shop sees a failure's reason and can send again. */
  lastSend: estimateSendSchema.nullable(),
});
export type EstimateView = z.infer<typeof estimateSchema>;

export const estimateListResponseSchema = z.object({ estimates: z.array(estimateSchema) });

/** POST /api/estimates/:id/send answers the estimate as it now stands and how the mail went. */
export const sendEstimateResponseSchema = z.object({
  estimate: estimateSchema,
  mail: z.object({ status: z.enum(["sent", "failed"]), to: z.string(), error: z.string().nullable() }),
});
export type SendEstimateResponse = z.infer<typeof sendEstimateResponseSchema>;

/** A token in the path: base64url only, so anything else is simply unknown. */
export const estimateTokenParamsSchema = z.object({ token: z.string() });
export const TOKEN_SHAPE = /^[A-Za-z0-9_-]{16,128}$/;

/** POST /api/public/estimates/:token/decision */
export const estimateDecisionRequestSchema = z.discriminatedUnion(
  "decision",
  [
    z.object({ decision: z.literal("approve"), optionId: z.uuid({ error: "Choose the option to approve." }), comment: z.string().trim().max(1000, { error: "Use at most 1000 characters." }).default("") }),
    z.object({ decision: z.literal("decline"), comment: z.string().trim().max(1000, { error: "Use at most 1000 characters." }).default("") }),
  ],
  { error: "Choose to approve an option or to decline." },
);
export type EstimateDecisionRequest = z.input<typeof estimateDecisionRequestSchema>;

/** What the customer sees through their link: the shop, the unit, the options with their totals. Nothing internal. */
export const publicEstimateSchema = z.object({
  shop: z.object({ name: z.string(), phone: z.string(), email: z.string(), address: z.string() }),
  workOrderNumber: z.number().int(),
  unit: z.object({ equipmentKind: z.enum(equipmentKinds), make: z.string(), model: z.string() }),
  findingTitle: z.string(),
  note: z.string(),
  currency: z.string(),
  revision: z.number().int(),
  validUntil: z.string(),
  options: z.array(
    z.object({
      id: z.string(),
      title: z.string(),
      lines: z.array(z.object({ kind: z.enum(["part", "labour", "diagnostic_fee", "diagnostic_credit"]), description: z.string(), quantity: z.number(), unitPriceCents: z.number().int(), amountCents: z.number().int() })),
      totals: moneyTotalsSchema,
      repairOrReplace: repairOrReplaceSchema.nullable(),
    }),
  ),
});
export type PublicEstimate = z.infer<typeof publicEstimateSchema>;

export const estimateDecisionResponseSchema = z.object({
  decision: z.enum(["approved", "declined"]),
  optionTitle: z.string().nullable(),
  shopName: z.string(),
  shopPhone: z.string(),
});
export type EstimateDecisionResponse = z.infer<typeof estimateDecisionResponseSchema>;
