// The shop's settings: the API's contract (money in minor units, tax in basis points, altitude in
// metres) and the screen's form, which takes decimals, percent and the shop's own length unit.
import { z } from "zod";
import { unitSystems, type UnitSystem } from "../equipment.ts";

// Source: ISO 4217 via ICU (the runtime's list of currency codes).
const isoCurrencies: ReadonlySet<string> = new Set(Intl.supportedValuesOf("currency"));
export const isCurrencyCode = (code: string) => /^[A-Z]{3}$/.test(code) && isoCurrencies.has(code);

/** Digits after the decimal point in the currency's minor unit (2 for USD and EUR, 0 for JPY). */
export function currencyDigits(code: string): number {
  if (!isCurrencyCode(code)) return 2;
  return new Intl.NumberFormat("en", { style: "currency", currency: code }).resolvedOptions().maximumFractionDigits ?? 2;
}

export const ALTITUDE_LIMITS_M = { min: -500, max: 5000 } as const;
// Source: the international foot is exactly 0.3048 m.
export const METRES_PER_FOOT = 0.3048;
export const MAX_MONEY_MINOR = 10_000_000;
export const WARRANTY_NOTE_MAX = 2000;

const intIn = (min: number, max: number, what: string) =>
  z
    .number({ error: `Enter ${what}.` })
    .int({ error: `Use a whole number for ${what}.` })
    .min(min, { error: `Use ${min} to ${max} for ${what}.` })
    .max(max, { error: `Use ${min} to ${max} for ${what}.` });

const money = (what: string) =>
  z
    .number({ error: `Enter the ${what}.` })
    .int({ error: `The ${what} goes in whole minor units (cents).` })
    .min(0, { error: `The ${what} cannot be negative.` })
    .max(MAX_MONEY_MINOR, { error: `The ${what} is too large.` });

const phone = z
  .string()
  .trim()
  .max(40, { error: "Use at most 40 characters." })
  .regex(/^[0-9+() .-]*$/, { error: "Use digits, spaces and + ( ) - . only." });
const email = z.union([z.literal(""), z.string().trim().toLowerCase().pipe(z.email({ error: "Enter an e-mail address such as desk@example.com, or leave it empty." }))]);
const currency = z
  .string()
  .trim()
  .toUpperCase()
  .refine(isCurrencyCode, { error: (issue) => `“${String(issue.input)}” is not an ISO 4217 currency code. Use three letters such as USD, EUR or CAD.` });

/** PUT /api/settings: the whole settings row, as stored. */
export const settingsSchema = z.object({
  name: z.string().trim().min(1, { error: "Enter the shop's name." }).max(120, { error: "Use at most 120 characters." }),
  phone: phone.default(""),
  email: email.default(""),
  address: z.string().trim().max(300, { error: "Use at most 300 characters." }).default(""),
  labourRateCents: money("labour rate"),
  diagnosticFeeCents: money("diagnostic fee"),
  /** Whether the diagnostic fee is taken off the bill when the customer approves the repair. */
  creditDiagnosticFee: z.boolean({ error: "Choose whether the diagnostic fee is credited." }),
  taxRateBasisPoints: intIn(0, 10_000, "the tax rate in basis points"),
  taxLabour: z.boolean({ error: "Choose whether labour is taxed." }),
  currency,
  defaultUnitSystem: z.enum(unitSystems, { error: "Choose imperial or metric." }),
  altitudeM: intIn(ALTITUDE_LIMITS_M.min, ALTITUDE_LIMITS_M.max, "the altitude in metres"),
  replaceThresholdPercent: intIn(1, 100, "the replace threshold"),
  estimateValidDays: intIn(1, 365, "the days an estimate stays valid"),
  reviewOpenHours: intIn(1, 720, "the hours a check may stay open"),
  warrantyNote: z.string().trim().max(WARRANTY_NOTE_MAX, { error: `Use at most ${WARRANTY_NOTE_MAX} characters.` }).default(""),
});
export type SettingsInput = z.input<typeof settingsSchema>;
export type Settings = z.output<typeof settingsSchema>;

/** GET and PUT answer with the stored row; a shop not yet set up has an empty name. */
export const settingsResponseSchema = settingsSchema.extend({ name: z.string(), updatedAt: z.string().nullable() });
export type SettingsResponse = z.infer<typeof settingsResponseSchema>;

export const settingsFieldNames = Object.keys(settingsSchema.shape) as (keyof Settings)[];

// ---- The screen's form: what a person types, turned into the API's shape. ----

const decimalText = /^\d{1,7}(\.\d{1,2})?$/;

/** "85.5" → 8550 with two minor digits; null when the text is not a plain amount. */
export function toMinorUnits(text: string, digits: number): number | null {
  const t = text.trim();
  if (!decimalText.test(t)) return null;
  const [whole, fraction = ""] = t.split(".");
  if (fraction.length > digits && Number(fraction) !== 0) return null;
  return Number(whole) * 10 ** digits + Number(fraction.padEnd(digits, "0").slice(0, digits) || "0");
}

export function fromMinorUnits(minor: number, digits: number): string {
  if (digits === 0) return String(minor);
  const whole = Math.trunc(minor / 10 ** digits);
  return `${whole}.${String(minor % 10 ** digits).padStart(digits, "0")}`;
}

/** "8.25" (percent) → 825 basis points, by the digits, with no floating point. */
export function percentToBasisPoints(text: string): number | null {
  const t = text.trim();
  if (!/^\d{1,3}(\.\d{1,2})?$/.test(t)) return null;
  const [whole, fraction = ""] = t.split(".");
  return Number(whole) * 100 + Number(fraction.padEnd(2, "0"));
}

export function basisPointsToPercent(bp: number): string {
  const whole = Math.trunc(bp / 100);
  const rest = bp % 100;
  if (rest === 0) return String(whole);
  return `${whole}.${String(rest).padStart(2, "0").replace(/0$/, "")}`;
}

export const altitudeUnit = (system: UnitSystem) => (system === "imperial" ? "ft" : "m");
export const altitudeToMetres = (value: number, system: UnitSystem) => (system === "imperial" ? Math.round(value * METRES_PER_FOOT) : value);
export const altitudeFromMetres = (metres: number, system: UnitSystem) => (system === "imperial" ? Math.round(metres / METRES_PER_FOOT) : metres);

export const settingsFormSchema = z
  .object({
    name: settingsSchema.shape.name,
    phone,
    email,
    address: settingsSchema.shape.address,
    labourRate: z.string().trim().regex(decimalText, { error: "Enter an amount such as 85 or 85.50." }),
    diagnosticFee: z.string().trim().regex(decimalText, { error: "Enter an amount such as 45 or 45.00." }),
    creditDiagnosticFee: z.boolean(),
    taxPercent: z
      .string()
      .trim()
      .regex(/^\d{1,3}(\.\d{1,2})?$/, { error: "Enter the tax rate in percent, such as 8.25 (up to two decimals)." })
      .refine((t) => (percentToBasisPoints(t) ?? 0) <= 10_000, { error: "Use 0 to 100 percent." }),
    taxLabour: z.boolean(),
    currency,
    defaultUnitSystem: settingsSchema.shape.defaultUnitSystem,
    altitude: z.string().trim().regex(/^-?\d{1,5}$/, { error: "Enter the altitude as a whole number." }),
    replaceThresholdPercent: z.string().trim().regex(/^\d{1,3}$/, { error: "Use a whole percent from 1 to 100." }),
    estimateValidDays: z.string().trim().regex(/^\d{1,3}$/, { error: "Use a whole number of days from 1 to 365." }),
    reviewOpenHours: z.string().trim().regex(/^\d{1,3}$/, { error: "Use a whole number of hours from 1 to 720." }),
    warrantyNote: settingsSchema.shape.warrantyNote,
  })
  .transform((form, ctx): Settings => {
    const digits = currencyDigits(form.currency);
    const minor = (field: "labourRate" | "diagnosticFee") => {
      const value = toMinorUnits(form[field], digits);
      if (value === null) ctx.addIssue({ code: "custom", path: [field], message: digits === 0 ? `${form.currency} has no cents: enter a whole amount.` : "Use at most two decimals." });
      else if (value > MAX_MONEY_MINOR) ctx.addIssue({ code: "custom", path: [field], message: "That amount is too large." });
      return value ?? 0;
    };
    const whole = (field: "replaceThresholdPercent" | "estimateValidDays" | "reviewOpenHours", min: number, max: number, message: string) => {
      const value = Number(form[field]);
      if (value < min || value > max) ctx.addIssue({ code: "custom", path: [field], message });
      return value;
    };
    const unit = altitudeUnit(form.defaultUnitSystem);
    const altitudeM = altitudeToMetres(Number(form.altitude), form.defaultUnitSystem);
    if (altitudeM < ALTITUDE_LIMITS_M.min || altitudeM > ALTITUDE_LIMITS_M.max) {
      const [lo, hi] = [altitudeFromMetres(ALTITUDE_LIMITS_M.min, form.defaultUnitSystem), altitudeFromMetres(ALTITUDE_LIMITS_M.max, form.defaultUnitSystem)];
      ctx.addIssue({ code: "custom", path: ["altitude"], message: `Use ${lo} to ${hi} ${unit} above sea level.` });
    }
    return {
      name: form.name,
      phone: form.phone,
      email: form.email,
      address: form.address,
      labourRateCents: minor("labourRate"),
      diagnosticFeeCents: minor("diagnosticFee"),
      creditDiagnosticFee: form.creditDiagnosticFee,
      taxRateBasisPoints: percentToBasisPoints(form.taxPercent) ?? 0,
      taxLabour: form.taxLabour,
      currency: form.currency,
      defaultUnitSystem: form.defaultUnitSystem,
      altitudeM,
      replaceThresholdPercent: whole("replaceThresholdPercent", 1, 100, "Use a whole percent from 1 to 100."),
      estimateValidDays: whole("estimateValidDays", 1, 365, "Use a whole number of days from 1 to 365."),
      reviewOpenHours: whole("reviewOpenHours", 1, 720, "Use a whole number of hours from 1 to 720."),
      warrantyNote: form.warrantyNote,
    };
  });
export type SettingsFormFields = z.input<typeof settingsFormSchema>;

/** The form's values for a stored row. */
export function settingsToForm(s: Settings): SettingsFormFields {
  const digits = currencyDigits(s.currency);
  return {
    name: s.name,
    phone: s.phone,
    email: s.email,
    address: s.address,
    labourRate: fromMinorUnits(s.labourRateCents, digits),
    diagnosticFee: fromMinorUnits(s.diagnosticFeeCents, digits),
    creditDiagnosticFee: s.creditDiagnosticFee,
    taxPercent: basisPointsToPercent(s.taxRateBasisPoints),
    taxLabour: s.taxLabour,
    currency: s.currency,
    defaultUnitSystem: s.defaultUnitSystem,
    altitude: String(altitudeFromMetres(s.altitudeM, s.defaultUnitSystem)),
    replaceThresholdPercent: String(s.replaceThresholdPercent),
    estimateValidDays: String(s.estimateValidDays),
    reviewOpenHours: String(s.reviewOpenHours),
    warrantyNote: s.warrantyNote,
  };
}

/** Where an API field's error shows on the form. */
export const formFieldOfApiField: Partial<Record<keyof Settings, keyof SettingsFormFields>> = {
  labourRateCents: "labourRate",
  diagnosticFeeCents: "diagnosticFee",
  taxRateBasisPoints: "taxPercent",
  altitudeM: "altitude",
};
