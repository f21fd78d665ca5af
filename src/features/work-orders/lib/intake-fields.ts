import type { DefaultValues, FieldPath } from "react-hook-form";
import type { z } from "zod";
import type { createWorkOrderRequestSchema } from "../../../../shared/schemas/work-orders.ts";

export type IntakeFields = z.input<typeof createWorkOrderRequestSchema>;
export type IntakeValues = z.output<typeof createWorkOrderRequestSchema>;
export type IntakeField = FieldPath<IntakeFields>;

/** Every answer on the form in screen order, with the words the summary uses to point at it. */
export const intakeFields = [
  ["customer.name", "Customer's name"],
  ["customer.phone", "Phone"],
  ["customer.email", "E-mail"],
  ["unit.equipmentKind", "Kind of equipment"],
  ["unit.make", "Make"],
  ["unit.model", "Model"],
  ["unit.engineModel", "Engine model"],
  ["unit.engineType", "Engine type or spec code"],
  ["unit.engineSerial", "Engine serial number"],
  ["unit.cycle", "2-stroke or 4-stroke"],
  ["unit.displacementCc", "Displacement"],
  ["unit.compressionRelease", "Automatic compression release"],
  ["unit.hours", "Hour meter"],
  ["complaint", "The complaint"],
  ["alreadyTried", "What the customer already tried"],
  ["tankContents", "What is in the tank"],
] as const satisfies readonly (readonly [IntakeField, string])[];

export type IntakeFieldName = (typeof intakeFields)[number][0];

export function fieldId(name: IntakeFieldName) {
  return name.replace(".", "-");
}

export function isIntakeField(path: string): path is IntakeFieldName {
  return intakeFields.some(([name]) => name === path);
}

/** Empty means "not given": the contract wants null, never 0 or NaN. */
export function numberOrNull(value: unknown): number | null {
  if (value === null || value === undefined) return null;
  if (typeof value === "number") return value;
  const text = String(value).trim();
  return text === "" ? null : Number(text.replace(/\s/g, ""));
}

// Kind, cycle and tank start unanswered: a guessed default would be checked in unread.
export const emptyIntake: DefaultValues<IntakeFields> = {
  customer: { name: "", phone: "", email: "" },
  unit: {
    make: "",
    model: "",
    engineModel: "",
    engineType: "",
    engineSerial: "",
    displacementCc: null,
    compressionRelease: "unknown",
    hours: null,
  },
  complaint: "",
  alreadyTried: "",
};
