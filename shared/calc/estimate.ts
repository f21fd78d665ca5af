// Estimates in integer minor units (cents); all rounding happens in integer arithmetic.
import { formatMoney } from "./money.ts";

/** Quantities and labour hours may carry this many decimal places (fuel line by the metre, labour by the tenth hour). */
export const QUANTITY_DECIMALS = 3;
const QUANTITY_SCALE = 10 ** QUANTITY_DECIMALS;

export const ROUNDING_RULE =
  "Each line is quantity × unit price rounded half away from zero to the cent; tax is computed once on the taxable subtotal and rounded the same way; quantities may have up to 3 decimal places.";

export type EstimateLineKind = "part" | "labour" | "diagnostic_fee" | "diagnostic_credit";

export interface EstimateLine {
  kind: EstimateLineKind;
  description: string;
  quantity: number;
  unitPriceCents: number;
  /** Negative for the diagnostic credit. */
  amountCents: number;
  taxable: boolean;
}

export interface EstimateInput {
  parts: { description: string; quantity: number; unitPriceCents: number }[];
  labourHours: number;
  labourRateCents: number;
  diagnosticFeeCents: number;
  creditDiagnosticFee: boolean;
  taxRateBasisPoints: number;
  /** Whether labour and the diagnostic fee are taxed; default false (many places tax only separately stated parts). */
  taxLabour?: boolean;
}

export interface Estimate {
  partsCents: number;
  labourCents: number;
  diagnosticFeeCents: number;
  /** The amount credited back (positive); its line carries the negative amount. */
  diagnosticCreditCents: number;
  subtotalCents: number;
  taxableCents: number;
  taxCents: number;
  totalCents: number;
  lines: EstimateLine[];
}

/** Rounds numerator / denominator half away from zero (denominator positive). */
function divideRounded(numerator: bigint, denominator: bigint): number {
  const negative = numerator < 0n;
  const magnitude = negative ? -numerator : numerator;
  const q = (2n * magnitude + denominator) / (2n * denominator);
  const result = Number(negative ? -q : q);
  if (!Number.isSafeInteger(result)) throw new RangeError("The estimate is too large to compute exactly.");
  return result;
}

function requireCents(value: number, field: string): void {
  if (!Number.isSafeInteger(value) || value < 0) throw new RangeError(`${field} must be a whole number of cents, zero or more; got ${value}.`);
}

/** A quantity in thousandths, refusing negatives and more than QUANTITY_DECIMALS places. */
function scaledQuantity(value: number, field: string, allowZero: boolean): bigint {
  const scaled = value * QUANTITY_SCALE;
  const whole = Math.round(scaled);
  if (!Number.isFinite(value) || value < 0 || (!allowZero && value === 0) || Math.abs(scaled - whole) > 1e-6 || !Number.isSafeInteger(whole)) {
    throw new RangeError(`${field} must be a number ${allowZero ? "of zero or more" : "above zero"} with at most ${QUANTITY_DECIMALS} decimal places; got ${value}.`);
  }
  return BigInt(whole);
}

function lineAmount(quantity: number, unitPriceCents: number, field: string, allowZero: boolean): number {
  requireCents(unitPriceCents, `${field} unit price`);
  return divideRounded(scaledQuantity(quantity, `${field} quantity`, allowZero) * BigInt(unitPriceCents), BigInt(QUANTITY_SCALE));
}

export function computeEstimate(input: EstimateInput): Estimate {
  const taxLabour = input.taxLabour ?? false;
  const { taxRateBasisPoints: bp } = input;
  if (!Number.isInteger(bp) || bp < 0 || bp > 10_000) throw new RangeError(`The tax rate must be whole basis points from 0 to 10000; got ${bp}.`);
  requireCents(input.diagnosticFeeCents, "The diagnostic fee");

  const lines: EstimateLine[] = input.parts.map((part, i) => {
    if (typeof part.description !== "string" || part.description.trim() === "") throw new RangeError(`Part ${i + 1} needs a description.`);
    const amountCents = lineAmount(part.quantity, part.unitPriceCents, `Part ${i + 1}`, false);
    return { kind: "part", description: part.description, quantity: part.quantity, unitPriceCents: part.unitPriceCents, amountCents, taxable: true };
  });
  const labourCents = lineAmount(input.labourHours, input.labourRateCents, "Labour", true);
  if (input.labourHours > 0) {
    lines.push({ kind: "labour", description: "Labour", quantity: input.labourHours, unitPriceCents: input.labourRateCents, amountCents: labourCents, taxable: taxLabour });
  }
  const fee = input.diagnosticFeeCents;
  // Charged and credited as two lines, so the customer and the shop both see the fee and its credit.
  const credit = input.creditDiagnosticFee ? fee : 0;
  if (fee > 0) {
    lines.push({ kind: "diagnostic_fee", description: "Diagnostic fee", quantity: 1, unitPriceCents: fee, amountCents: fee, taxable: taxLabour });
  }
  if (credit > 0) {
    lines.push({ kind: "diagnostic_credit", description: "Diagnostic fee credited to the repair", quantity: 1, unitPriceCents: -credit, amountCents: -credit, taxable: taxLabour });
  }

  const partsCents = lines.filter((l) => l.kind === "part").reduce((sum, l) => sum + l.amountCents, 0);
  const subtotalCents = lines.reduce((sum, l) => sum + l.amountCents, 0);
  const taxableCents = lines.filter((l) => l.taxable).reduce((sum, l) => sum + l.amountCents, 0);
  const taxCents = divideRounded(BigInt(taxableCents) * BigInt(bp), 10_000n);
  const totalCents = subtotalCents + taxCents;
  if (!Number.isSafeInteger(totalCents)) throw new RangeError("The estimate is too large to compute exactly.");
  return { partsCents, labourCents, diagnosticFeeCents: fee, diagnosticCreditCents: credit, subtotalCents, taxableCents, taxCents, totalCents, lines };
}

/** Common practice (consumer advice): replace when the repair costs 50 % or more of a new unit. */
export const DEFAULT_REPLACE_THRESHOLD_PERCENT = 50;

function money(cents: number): string {
  return `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, "0")}`;
}

/** With `currency`, the sentence gives both amounts in it ("$13.33"); without, as plain figures. */
export function repairOrReplace(input: { repairCents: number; replacementCents: number; thresholdPercent?: number; currency?: string }): {
  sharePercent: number;
  recommendation: "repair" | "consider_replacing";
  sentence: string;
} {
  const { repairCents, replacementCents, thresholdPercent = DEFAULT_REPLACE_THRESHOLD_PERCENT, currency } = input;
  const amount = (cents: number) => (currency ? formatMoney(cents, currency) : money(cents));
  requireCents(repairCents, "The repair cost");
  requireCents(replacementCents, "The replacement price");
  if (replacementCents === 0) throw new RangeError("The replacement price must be above zero.");
  if (!Number.isFinite(thresholdPercent) || thresholdPercent <= 0 || thresholdPercent > 100) {
    throw new RangeError(`The threshold must be above 0 % and at most 100 %; got ${thresholdPercent}.`);
  }
  const sharePercent = (repairCents * 100) / replacementCents;
  // Compared without division, so a repair of exactly half reaches a 50 % threshold.
  const replace = repairCents * 100 >= thresholdPercent * replacementCents;
  const shown = (Math.floor(sharePercent * 10) / 10).toFixed(1);
  const tail = replace ? `at or above the ${thresholdPercent} % line, so consider replacing it.` : `under the ${thresholdPercent} % line, so repair it.`;
  return {
    sharePercent,
    recommendation: replace ? "consider_replacing" : "repair",
    sentence: `The repair (${amount(repairCents)}) is ${shown} % of a new unit (${amount(replacementCents)}): ${tail}`,
  };
}

/** The rates an estimate was written with, copied from the shop's settings when it was started. */
export interface EstimateRates {
  labourRateCents: number;
  diagnosticFeeCents: number;
  creditDiagnosticFee: boolean;
  taxRateBasisPoints: number;
  taxLabour: boolean;
}

/** One option put to the customer: its parts lines and labour hours. */
export interface EstimateOptionInput {
  labourHours: number;
  parts: { partNumber?: string; description: string; quantity: number; unitPriceCents: number }[];
}

/**
 * An option's totals: its parts and labour at the estimate's rates, the diagnostic fee (credited or
 * not) and tax. Every option carries the fee, so each total is what the customer pays if they pick it.
 */
export function optionTotals(rates: EstimateRates, option: EstimateOptionInput): Estimate {
  return computeEstimate({
    parts: option.parts.map((p) => ({ description: p.partNumber ? `${p.partNumber} ${p.description}` : p.description, quantity: p.quantity, unitPriceCents: p.unitPriceCents })),
    labourHours: option.labourHours,
    labourRateCents: rates.labourRateCents,
    diagnosticFeeCents: rates.diagnosticFeeCents,
    creditDiagnosticFee: rates.creditDiagnosticFee,
    taxRateBasisPoints: rates.taxRateBasisPoints,
    taxLabour: rates.taxLabour,
  });
}
