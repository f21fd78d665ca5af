// The customer report built from the records as the server reads them: pure, so the print page, the
// PDF and the tests all get the same figures and words.
import { optionTotals, type EstimateRates } from "../calc/estimate.ts";
import { unitLabel } from "../calc/units.ts";
import { equipmentKindLabels, type EquipmentKind, type UnitSystem } from "../equipment.ts";
import type { CompiledFlow } from "../flow/compile.ts";
import { latestReading } from "../flow/context.ts";
import type { Verdict } from "../flow/schema.ts";
import { replaySession } from "../flow/session-log.ts";
import type { FlowInput } from "../flow/step-rules.ts";
import { convertedFor } from "../review/timeline.ts";
import type { EstimatePartLine, EstimateStatus } from "../schemas/estimate-records.ts";
import type { CustomerReport, ReportEstimate, ReportFinding, ReportReading } from "../schemas/report.ts";
import type { SessionEventBody } from "../schemas/sessions.ts";
import { workOrderStateLabels, type WorkOrderState } from "../schemas/work-orders.ts";
import { SAFETY_INTRO, safetyNotesFor, WARRANTY_STANDARD_LINE } from "./safety.ts";

export interface ReportSessionSource {
  id: string;
  flowTitle: string;
  flow: CompiledFlow;
  input: FlowInput;
  events: readonly SessionEventBody[];
  findingStepId: string;
  completedAt: string | null;
}

export interface ReportEstimateSource extends EstimateRates {
  id: string;
  revision: number;
  status: EstimateStatus;
  currency: string;
  findingTitle: string;
  note: string;
  sentAt: string | null;
  validUntil: string | null;
  decidedAt: string | null;
  approvedOptionId: string | null;
  options: { id: string; position: number; title: string; labourHours: number; parts: EstimatePartLine[] }[];
}

export interface ReportSource {
  generatedAt: string;
  shop: { name: string; phone: string; email: string; address: string; warrantyNote: string; unitSystem: UnitSystem };
  workOrder: { id: string; number: number; state: WorkOrderState; complaint: string; createdAt: string; updatedAt: string };
  customerName: string;
  unit: {
    equipmentKind: EquipmentKind;
    make: string;
    model: string;
    engineModel: string;
    engineType: string;
    engineSerial: string;
    cycle: 2 | 4;
    displacementCc: number | null;
    hours: number | null;
  };
  /** Completed sessions that reached a finding, oldest first. */
  sessions: readonly ReportSessionSource[];
  estimate: ReportEstimateSource | null;
}

/** Our own short form, said aloud at the counter: "WO 1042". */
export function workOrderLabel(number: number): string {
  return `WO ${number}`;
}

export const readingVerdictWords: Record<Verdict, string> = {
  good: "Good",
  marginal: "Marginal",
  low: "Low",
  high: "High",
  implausible: "Not believable",
};

const certaintyWords = { confirmed: "Confirmed by the checks", likely: "Likely, from the checks so far" } as const;

const estimateStatusWords: Record<EstimateStatus, string> = {
  draft: "Draft, not yet sent",
  sent: "Sent, waiting for your answer",
  approved: "Approved",
  declined: "Declined",
  superseded: "Replaced by a newer revision",
};

/** The readings that stand at the finding: for each step on the path to it, the last one taken there. */
function standingReadings(session: ReportSessionSource, unitSystem: UnitSystem): ReportReading[] {
  const replay = replaySession(session.flow, session.input, session.events);
  if (!replay.ok) return [];
  const seen = new Set<string>();
  const readings: ReportReading[] = [];
  for (const stepId of replay.context.path) {
    if (seen.has(stepId)) continue;
    seen.add(stepId);
    const reading = latestReading(replay.context, stepId);
    if (!reading) continue;
    readings.push({
      stepId,
      title: session.flow.steps[stepId]?.title ?? stepId,
      entered: { value: reading.value, unit: reading.unit, unitLabel: unitLabel(reading.unit) },
      converted: convertedFor(reading.value, reading.unit, unitSystem),
      verdict: reading.verdict,
      verdictLabel: readingVerdictWords[reading.verdict],
      band: reading.label,
      reason: reading.reason,
    });
  }
  return readings;
}

function findingOf(session: ReportSessionSource, unitSystem: UnitSystem): ReportFinding | null {
  const step = session.flow.steps[session.findingStepId];
  if (!step || step.kind !== "finding") return null;
  return {
    sessionId: session.id,
    flowTitle: session.flowTitle,
    stepId: step.id,
    title: step.title,
    certainty: step.certainty,
    certaintyLabel: certaintyWords[step.certainty],
    explanation: step.explanation,
    completedAt: session.completedAt,
    readings: standingReadings(session, unitSystem),
    repairs: step.repairs.map((r) => ({ title: r.title, labourHours: r.labourHours, parts: [...r.parts] })),
    followUp: [...(step.followUp ?? [])],
  };
}

function decisionOf(source: ReportEstimateSource): Pick<ReportEstimate, "decision" | "decisionText"> {
  const approved = source.options.find((o) => o.id === source.approvedOptionId);
  if (source.status === "approved" && approved) return { decision: "approved", decisionText: `You approved option ${approved.position}: ${approved.title}.` };
  if (source.status === "declined") return { decision: "declined", decisionText: "You declined this estimate: no repair will be made from it." };
  if (source.status === "draft") return { decision: "open", decisionText: "This estimate has not been sent yet; the shop will confirm it with you." };
  return { decision: "open", decisionText: "Waiting for your answer: choose one option, or decline." };
}

function estimateOf(source: ReportEstimateSource): ReportEstimate {
  const options = [...source.options].sort((a, b) => a.position - b.position);
  return {
    id: source.id,
    revision: source.revision,
    status: source.status,
    statusLabel: estimateStatusWords[source.status],
    currency: source.currency,
    labourRateCents: source.labourRateCents,
    taxRateBasisPoints: source.taxRateBasisPoints,
    taxLabour: source.taxLabour,
    findingTitle: source.findingTitle,
    note: source.note,
    sentAt: source.sentAt,
    validUntil: source.validUntil,
    decidedAt: source.decidedAt,
    approvedOptionId: source.approvedOptionId,
    ...decisionOf(source),
    options: options.map((option) => {
      const { lines, partsCents, labourCents, diagnosticFeeCents, diagnosticCreditCents, subtotalCents, taxableCents, taxCents, totalCents } = optionTotals(source, option);
      return {
        id: option.id,
        position: option.position,
        title: option.title,
        labourHours: option.labourHours,
        lines,
        partsCents,
        labourCents,
        diagnosticFeeCents,
        diagnosticCreditCents,
        subtotalCents,
        taxableCents,
        taxCents,
        totalCents,
        approved: source.status === "approved" && source.approvedOptionId === option.id,
      };
    }),
  };
}

export function buildCustomerReport(source: ReportSource): CustomerReport {
  const { shop, workOrder, unit } = source;
  return {
    generatedAt: source.generatedAt,
    shop: { name: shop.name, phone: shop.phone, email: shop.email, address: shop.address },
    workOrder: {
      id: workOrder.id,
      number: workOrder.number,
      label: workOrderLabel(workOrder.number),
      state: workOrder.state,
      stateLabel: workOrderStateLabels[workOrder.state],
      receivedAt: workOrder.createdAt,
      updatedAt: workOrder.updatedAt,
    },
    customer: { name: source.customerName },
    unit: { ...unit, kindLabel: equipmentKindLabels[unit.equipmentKind] },
    complaint: workOrder.complaint,
    findings: source.sessions.flatMap((s) => findingOf(s, shop.unitSystem) ?? []),
    estimate: source.estimate ? estimateOf(source.estimate) : null,
    safety: { intro: SAFETY_INTRO, notes: safetyNotesFor(unit.equipmentKind) },
    warranty: { shopNote: shop.warrantyNote.trim(), standardLine: WARRANTY_STANDARD_LINE },
  };
}

/** The file name of a work order's report: "customer-report-wo-1042.pdf". */
export function reportFileName(number: number, revision?: number): string {
  return revision === undefined ? `customer-report-wo-${number}.pdf` : `customer-report-wo-${number}-estimate-${revision}.pdf`;
}
