// The builder's working copy: what the tech typed, as text, and the request it becomes once every field reads.
import { optionTotals, repairOrReplace, type Estimate } from "../../../../shared/calc/estimate.ts";
import { updateEstimateRequestSchema, type EstimateView, type UpdateEstimateRequest } from "../../../../shared/schemas/estimates.ts";
import { parseAmount, parsePrice, priceText } from "./money.ts";

export interface PartDraft {
  key: string;
  partNumber: string;
  description: string;
  quantity: string;
  price: string;
}

export interface OptionDraft {
  key: string;
  id?: string;
  title: string;
  labourHours: string;
  parts: PartDraft[];
}

export interface EstimateDraft {
  options: OptionDraft[];
  note: string;
  replacementPrice: string;
}

let counter = 0;
export const newKey = () => `k${++counter}`;

export const emptyPart = (): PartDraft => ({ key: newKey(), partNumber: "", description: "", quantity: "1", price: "0.00" });
export const emptyOption = (): OptionDraft => ({ key: newKey(), title: "", labourHours: "0", parts: [] });

export function draftFrom(estimate: EstimateView): EstimateDraft {
  return {
    options: estimate.options.map((o) => ({
      key: o.id,
      id: o.id,
      title: o.title,
      labourHours: String(o.labourHours),
      parts: o.parts.map((p) => ({ key: newKey(), partNumber: p.partNumber, description: p.description, quantity: String(p.quantity), price: priceText(p.unitPriceCents) })),
    })),
    note: estimate.note,
    replacementPrice: estimate.replacementPriceCents === null ? "" : priceText(estimate.replacementPriceCents),
  };
}

/** Field names the errors are kept under, the same for the builder's inputs. */
export const fieldName = {
  title: (o: number) => `options.${o}.title`,
  labourHours: (o: number) => `options.${o}.labourHours`,
  part: (o: number, p: number, field: "partNumber" | "description" | "quantity" | "unitPriceCents") => `options.${o}.parts.${p}.${field}`,
  options: "options",
  note: "note",
  replacementPrice: "replacementPriceCents",
};

export type FieldErrors = Record<string, string>;

/** Reads the draft: the request to save when every field is right, and a message per wrong field. */
export function readDraft(draft: EstimateDraft): { request: UpdateEstimateRequest | null; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const number = (parsed: ReturnType<typeof parsePrice>, name: string) => {
    if (parsed.error !== undefined) errors[name] = parsed.error;
    return parsed.value ?? 0;
  };
  const candidate = {
    options: draft.options.map((o, oi) => ({
      ...(o.id ? { id: o.id } : {}),
      title: o.title,
      labourHours: number(parseAmount(o.labourHours, "labour hours"), fieldName.labourHours(oi)),
      parts: o.parts.map((p, pi) => ({
        partNumber: p.partNumber,
        description: p.description,
        quantity: number(parseAmount(p.quantity, "quantity"), fieldName.part(oi, pi, "quantity")),
        unitPriceCents: number(parsePrice(p.price, "unit price"), fieldName.part(oi, pi, "unitPriceCents")),
      })),
    })),
    note: draft.note,
    replacementPriceCents: draft.replacementPrice.trim() === "" ? null : number(parsePrice(draft.replacementPrice, "price of a new unit"), fieldName.replacementPrice),
  };
  // The server's own contract judges the rest, so the form and the API never disagree.
  const result = updateEstimateRequestSchema.safeParse(candidate);
  if (!result.success) {
    for (const issue of result.error.issues) {
      const name = issue.path.join(".");
      errors[name] ??= issue.message;
    }
  }
  return { request: Object.keys(errors).length === 0 && result.success ? candidate : null, errors };
}

export interface OptionFigures {
  totals: Estimate | null;
  sentence: string | null;
}

/** One option's live totals, or null while one of its fields does not read. */
export function optionFigures(estimate: Pick<EstimateView, "rates" | "replaceThresholdPercent" | "currency">, option: OptionDraft, replacementPrice: string): OptionFigures {
  const hours = parseAmount(option.labourHours, "labour hours");
  const parts = option.parts.map((p) => ({ description: p.description.trim(), partNumber: p.partNumber.trim(), quantity: parseAmount(p.quantity, "quantity"), price: parsePrice(p.price) }));
  if (hours.error !== undefined || parts.some((p) => p.quantity.error !== undefined || p.price.error !== undefined || p.description === "" || (p.quantity.value ?? 0) <= 0)) {
    return { totals: null, sentence: null };
  }
  let totals: Estimate;
  try {
    totals = optionTotals(estimate.rates, { labourHours: hours.value!, parts: parts.map((p) => ({ partNumber: p.partNumber, description: p.description, quantity: p.quantity.value!, unitPriceCents: p.price.value! })) });
  } catch {
    return { totals: null, sentence: null };
  }
  const replacement = replacementPrice.trim() === "" ? null : parsePrice(replacementPrice);
  const sentence =
    replacement?.value !== undefined && replacement.value > 0
      ? repairOrReplace({ repairCents: totals.totalCents, replacementCents: replacement.value, thresholdPercent: estimate.replaceThresholdPercent, currency: estimate.currency }).sentence
      : null;
  return { totals, sentence };
}
