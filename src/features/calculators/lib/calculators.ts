import { inEveryUnit, type Unit } from "../../../../shared/calc/units.ts";
import { oilForFuel } from "../../../../shared/calc/premix.ts";

export const calculatorIds = ["oil", "premix", "gap", "torque"] as const;
export type CalculatorId = (typeof calculatorIds)[number];

export const calculatorNames: Record<CalculatorId, string> = {
  oil: "Oil amount",
  premix: "2-stroke premix",
  gap: "Plug and coil gaps",
  torque: "Torque",
};

/** The units each converter offers, the bench's usual one first. */
export const converterUnits = {
  oil: ["fl_oz_us", "fl_oz_imp", "mL"],
  gap: ["in", "mm"],
  torque: ["lbf_in", "lbf_ft", "N_m"],
} as const satisfies Record<Exclude<CalculatorId, "premix">, readonly Unit[]>;

export const fuelUnits = ["gal_us", "L", "fl_oz_us", "mL"] as const satisfies readonly Unit[];
export const oilUnits = ["fl_oz_us", "mL"] as const satisfies readonly Unit[];
/** Ratios printed on most 2-stroke oil and engine labels. */
export const commonRatios = [25, 32, 40, 50] as const;

// Decimals a bench reads each unit to: gaps in thousandths of an inch or hundredths of a millimetre.
const decimals: Partial<Record<Unit, number>> = { in: 3, mm: 2, mL: 0, L: 2, gal_us: 2, fl_oz_us: 2, fl_oz_imp: 2, lbf_in: 0, lbf_ft: 1, N_m: 1 };

export function rounded(value: number, unit: Unit): string {
  const places = decimals[unit] ?? 2;
  return value.toLocaleString("en-US", { minimumFractionDigits: places, maximumFractionDigits: places });
}

/** Reads what the keypad typed: a positive number, or the reason it is not one. */
export function parseAmount(text: string, what: string): { ok: true; value: number } | { ok: false; reason: string } {
  if (text.trim() === "") return { ok: false, reason: `Enter the ${what}.` };
  const value = Number(text);
  if (!Number.isFinite(value)) return { ok: false, reason: `The ${what} is not a number.` };
  if (value <= 0) return { ok: false, reason: `The ${what} must be more than zero.` };
  return { ok: true, value };
}

/** The value in the other units of its quantity (the entered unit left out). */
export function conversions(value: number, unit: Unit) {
  return inEveryUnit(value, unit).slice(1);
}

export function premixOil(fuel: number, fuelUnit: Unit, ratio: number) {
  return oilUnits.map((oilUnit) => ({ unit: oilUnit, value: oilForFuel({ fuel, fuelUnit, ratio, oilUnit }) }));
}
