// The customer report of a work order: what came in, what the checks found, the estimate, and the
// safety and warranty notes, as the print page and the PDF both show it.
import { z } from "zod";
import { equipmentKinds } from "../equipment.ts";
import { signalWords, verdicts } from "../flow/schema.ts";
import { estimateStatuses } from "./estimate-records.ts";
import { workOrderStates } from "./work-orders.ts";

export const paperSizes = ["a4", "letter"] as const;
export type PaperSize = (typeof paperSizes)[number];
export const paperLabels: Record<PaperSize, string> = { a4: "A4", letter: "Letter" };

const estimateIdField = z.uuid({ error: "estimateId is not a valid id" }).optional();

/** GET /api/work-orders/:id/report: the latest estimate that is not superseded, or the one named. */
export const reportQuerySchema = z.object({ estimateId: estimateIdField });
export type ReportQuery = z.output<typeof reportQuerySchema>;

/** GET /api/work-orders/:id/report.pdf: the same, on A4 (the default) or Letter paper. */
export const reportPdfQuerySchema = z.object({
  estimateId: estimateIdField,
  paper: z.enum(paperSizes, { error: 'paper is "a4" or "letter"' }).default("a4"),
});
export type ReportPdfQuery = z.output<typeof reportPdfQuerySchema>;

const amountSchema = z.object({ value: z.number(), unit: z.string(), unitLabel: z.string() });

export const reportReadingSchema = z.object({
  stepId: z.string(),
  /** What was measured, in the flow's words. */
  title: z.string(),
  /** As the tech entered it. */
  entered: amountSchema,
  /** In the shop's unit system when it was entered in the other one. */
  converted: amountSchema.nullable(),
  verdict: z.enum(verdicts),
  verdictLabel: z.string(),
  /** The band's label ("Within the common range"), or null for an evaluation. */
  band: z.string().nullable(),
  reason: z.string(),
});
export type ReportReading = z.infer<typeof reportReadingSchema>;

export const reportFindingSchema = z.object({
  sessionId: z.string(),
  flowTitle: z.string(),
  stepId: z.string(),
  title: z.string(),
  certainty: z.enum(["confirmed", "likely"]),
  certaintyLabel: z.string(),
  explanation: z.string(),
  completedAt: z.string().nullable(),
  /** The readings that stand on the way to the finding, one per step (the last taken). */
  readings: z.array(reportReadingSchema),
  repairs: z.array(z.object({ title: z.string(), labourHours: z.number(), parts: z.array(z.string()) })),
  followUp: z.array(z.string()),
});
export type ReportFinding = z.infer<typeof reportFindingSchema>;

export const reportLineSchema = z.object({
  kind: z.enum(["part", "labour", "diagnostic_fee", "diagnostic_credit"]),
  description: z.string(),
  quantity: z.number(),
  unitPriceCents: z.number().int(),
  amountCents: z.number().int(),
  taxable: z.boolean(),
});
export type ReportLine = z.infer<typeof reportLineSchema>;

export const reportOptionSchema = z.object({
  id: z.string(),
  position: z.number().int(),
  title: z.string(),
  labourHours: z.number(),
  lines: z.array(reportLineSchema),
  partsCents: z.number().int(),
  labourCents: z.number().int(),
  diagnosticFeeCents: z.number().int(),
  diagnosticCreditCents: z.number().int(),
  subtotalCents: z.number().int(),
  taxableCents: z.number().int(),
  taxCents: z.number().int(),
  totalCents: z.number().int(),
  /** The option the customer approved. */
  approved: z.boolean(),
});
export type ReportOption = z.infer<typeof reportOptionSchema>;

export const reportEstimateSchema = z.object({
  id: z.string(),
  revision: z.number().int(),
  status: z.enum(estimateStatuses),
  statusLabel: z.string(),
  currency: z.string(),
  labourRateCents: z.number().int(),
  taxRateBasisPoints: z.number().int(),
  taxLabour: z.boolean(),
  findingTitle: z.string(),
  note: z.string(),
  sentAt: z.string().nullable(),
  validUntil: z.string().nullable(),
  decidedAt: z.string().nullable(),
  decision: z.enum(["approved", "declined", "open"]),
  /** A sentence for the customer: which option was approved, declined, or that an answer is awaited. */
  decisionText: z.string(),
  approvedOptionId: z.string().nullable(),
  options: z.array(reportOptionSchema),
});
export type ReportEstimate = z.infer<typeof reportEstimateSchema>;

export const reportSafetyNoteSchema = z.object({ signal: z.enum(signalWords), title: z.string(), text: z.string() });
export type ReportSafetyNote = z.infer<typeof reportSafetyNoteSchema>;

export const customerReportSchema = z.object({
  generatedAt: z.string(),
  shop: z.object({ name: z.string(), phone: z.string(), email: z.string(), address: z.string() }),
  workOrder: z.object({
    id: z.string(),
    number: z.number().int(),
    /** "WO 1042", as on the tag. */
    label: z.string(),
    state: z.enum(workOrderStates),
    stateLabel: z.string(),
    receivedAt: z.string(),
    updatedAt: z.string(),
  }),
  /** Only the name: the report may travel by e-mail and on paper. */
  customer: z.object({ name: z.string() }),
  unit: z.object({
    equipmentKind: z.enum(equipmentKinds),
    kindLabel: z.string(),
    make: z.string(),
    model: z.string(),
    engineModel: z.string(),
    engineType: z.string(),
    engineSerial: z.string(),
    cycle: z.union([z.literal(2), z.literal(4)]),
    displacementCc: z.number().nullable(),
    hours: z.number().nullable(),
  }),
  complaint: z.string(),
  findings: z.array(reportFindingSchema),
  estimate: reportEstimateSchema.nullable(),
  safety: z.object({ intro: z.string(), notes: z.array(reportSafetyNoteSchema) }),
  warranty: z.object({ shopNote: z.string(), standardLine: z.string() }),
});
export type CustomerReport = z.infer<typeof customerReportSchema>;
