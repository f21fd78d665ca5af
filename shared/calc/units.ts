// Units of the bench's readings: conversion factors from NIST SP 811 (2008), Appendix B.8.

export const quantities = ["pressure", "resistance", "length", "voltage", "speed", "volume", "time", "temperature", "torque"] as const;
export type Quantity = (typeof quantities)[number];

const unitTable = {
  pressure: ["psi", "kPa", "bar"],
  resistance: ["ohm", "kohm"],
  length: ["in", "mm"],
  voltage: ["V", "kV"],
  speed: ["rpm"],
  volume: ["fl_oz_us", "fl_oz_imp", "mL", "L", "gal_us"],
  time: ["s", "min"],
  temperature: ["degF", "degC"],
  torque: ["lbf_in", "lbf_ft", "N_m"],
} as const satisfies Record<Quantity, readonly string[]>;

export type Unit = (typeof unitTable)[Quantity][number];

export const unitsByQuantity: Record<Quantity, readonly Unit[]> = unitTable;

export const canonicalUnit: Record<Quantity, Unit> = {
  pressure: "kPa",
  resistance: "ohm",
  length: "mm",
  voltage: "V",
  speed: "rpm",
  volume: "mL",
  time: "s",
  temperature: "degC",
  torque: "N_m",
};

/** Exact by definition: 1 lbf = 0.453 592 37 kg × 9.806 65 m/s² (NIST SP 811, B.8). */
const NEWTONS_PER_LBF = 4.4482216152605;

interface UnitDef {
  quantity: Quantity;
  label: string;
  /** Value in this unit to the canonical unit of its quantity. */
  toCanonical: (v: number) => number;
  fromCanonical: (v: number) => number;
}

function scaled(quantity: Quantity, label: string, factor: number): UnitDef {
  return { quantity, label, toCanonical: (v) => v * factor, fromCanonical: (v) => v / factor };
}

const defs: Record<Unit, UnitDef> = {
  psi: scaled("pressure", "psi", NEWTONS_PER_LBF / (0.0254 * 0.0254) / 1000),
  kPa: scaled("pressure", "kPa", 1),
  bar: scaled("pressure", "bar", 100),
  ohm: scaled("resistance", "Ω", 1),
  kohm: scaled("resistance", "kΩ", 1000),
  in: scaled("length", "in", 25.4),
  mm: scaled("length", "mm", 1),
  V: scaled("voltage", "V", 1),
  kV: scaled("voltage", "kV", 1000),
  rpm: scaled("speed", "rpm", 1),
  fl_oz_us: scaled("volume", "US fl oz", 3785.411784 / 128),
  fl_oz_imp: scaled("volume", "imp fl oz", 4546.09 / 160),
  mL: scaled("volume", "mL", 1),
  L: scaled("volume", "L", 1000),
  gal_us: scaled("volume", "US gal", 3785.411784),
  s: scaled("time", "s", 1),
  min: scaled("time", "min", 60),
  degF: { quantity: "temperature", label: "°F", toCanonical: (v) => (v - 32) / 1.8, fromCanonical: (v) => v * 1.8 + 32 },
  degC: scaled("temperature", "°C", 1),
  lbf_in: scaled("torque", "lbf·in", NEWTONS_PER_LBF * 0.0254),
  lbf_ft: scaled("torque", "lbf·ft", NEWTONS_PER_LBF * 0.3048),
  N_m: scaled("torque", "N·m", 1),
};

export class UnitError extends Error {
  override name = "UnitError";
}

export function isUnit(s: string): s is Unit {
  return Object.prototype.hasOwnProperty.call(defs, s);
}

function defOf(unit: string): UnitDef {
  if (!isUnit(unit)) throw new UnitError(`Unknown unit "${unit}".`);
  return defs[unit];
}

export function unitLabel(unit: Unit): string {
  return defOf(unit).label;
}

export function quantityOf(unit: Unit): Quantity {
  return defOf(unit).quantity;
}

export function convert(value: number, from: Unit, to: Unit): number {
  const a = defOf(from);
  const b = defOf(to);
  if (a.quantity !== b.quantity) {
    throw new UnitError(`Cannot convert ${a.label} (${a.quantity}) to ${b.label} (${b.quantity}).`);
  }
  // Same unit returns the value untouched, so a round trip adds no floating-point noise.
  if (from === to) return value;
  return b.fromCanonical(a.toCanonical(value));
}

export function preferredUnit(quantity: Quantity, system: "imperial" | "metric"): Unit {
  const imperial: Partial<Record<Quantity, Unit>> = { pressure: "psi", length: "in", volume: "fl_oz_us", temperature: "degF", torque: "lbf_ft" };
  return system === "imperial" ? (imperial[quantity] ?? canonicalUnit[quantity]) : canonicalUnit[quantity];
}

const imperialUnits: ReadonlySet<Unit> = new Set<Unit>(["psi", "in", "fl_oz_us", "fl_oz_imp", "gal_us", "degF", "lbf_in", "lbf_ft"]);

/** The system a unit belongs to, or null for one both systems use (Ω, V, rpm, s). */
export function systemOf(unit: Unit): "imperial" | "metric" | null {
  if (imperialUnits.has(unit)) return "imperial";
  const quantity = quantityOf(unit);
  return preferredUnit(quantity, "imperial") === preferredUnit(quantity, "metric") ? null : "metric";
}

export interface ReadingLimit {
  /** Bounds in the quantity's canonical unit, both inclusive. */
  min: number;
  max: number;
  whyMin: string;
  whyMax: string;
}

/** What the bench will accept as a reading; sanity bounds, not specifications. */
export const readingLimits: Record<Quantity, ReadingLimit> = {
  pressure: { min: -101.325, max: 7000, whyMin: "gauge pressure below one standard atmosphere of vacuum would be a negative absolute pressure", whyMax: "no small engine or shop air line makes that much" },
  resistance: { min: 0, max: 1e9, whyMin: "resistance cannot be negative", whyMax: "that is beyond any bench meter's range" },
  length: { min: 0, max: 5000, whyMin: "a length cannot be negative", whyMax: "that is longer than any part of a small engine" },
  voltage: { min: -100_000, max: 100_000, whyMin: "small-engine ignition makes tens of kilovolts, not more", whyMax: "small-engine ignition makes tens of kilovolts, not more" },
  speed: { min: 0, max: 30_000, whyMin: "engine speed cannot be negative", whyMax: "no small engine turns that fast" },
  volume: { min: 0, max: 200_000, whyMin: "a volume cannot be negative", whyMax: "that is more than any small-engine tank or crankcase holds" },
  time: { min: 0, max: 86_400, whyMin: "a duration cannot be negative", whyMax: "a bench reading does not last more than a day" },
  temperature: { min: -273.15, max: 2000, whyMin: "that is below absolute zero", whyMax: "that is hotter than any part of a running engine" },
  torque: { min: 0, max: 2000, whyMin: "enter a tightening torque as a positive number", whyMax: "that is far beyond any small-engine fastener" },
};

export type ReadingCheck =
  | { ok: true; value: number; unit: Unit; canonical: number }
  | { ok: false; code: "not_a_number" | "unknown_unit" | "wrong_quantity" | "out_of_range"; reason: string };

function fmt(n: number): string {
  return String(Number(n.toPrecision(6)));
}

export function checkReading(input: { quantity: Quantity; value: unknown; unit: string }): ReadingCheck {
  const { quantity, value, unit } = input;
  if (typeof value !== "number" || !Number.isFinite(value)) {
    return { ok: false, code: "not_a_number", reason: "Enter the reading as a number." };
  }
  if (!isUnit(unit)) return { ok: false, code: "unknown_unit", reason: `"${unit}" is not a unit Benchpath knows.` };
  if (!(quantities as readonly string[]).includes(quantity)) {
    return { ok: false, code: "wrong_quantity", reason: `"${String(quantity)}" is not a quantity Benchpath knows.` };
  }
  if (quantityOf(unit) !== quantity) {
    return { ok: false, code: "wrong_quantity", reason: `${unitLabel(unit)} measures ${quantityOf(unit)}, not ${quantity}.` };
  }
  const canonical = convert(value, unit, canonicalUnit[quantity]);
  const limit = readingLimits[quantity];
  const label = unitLabel(unit);
  if (canonical < limit.min) {
    const bound = convert(limit.min, canonicalUnit[quantity], unit);
    return { ok: false, code: "out_of_range", reason: `${fmt(value)} ${label} is below ${fmt(bound)} ${label}: ${limit.whyMin}.` };
  }
  if (canonical > limit.max) {
    const bound = convert(limit.max, canonicalUnit[quantity], unit);
    return { ok: false, code: "out_of_range", reason: `${fmt(value)} ${label} is above ${fmt(bound)} ${label}: ${limit.whyMax}.` };
  }
  return { ok: true, value, unit, canonical };
}

/** A value in every unit of its quantity, the given unit first. */
export function inEveryUnit(value: number, unit: Unit): { unit: Unit; value: number }[] {
  const others = unitsByQuantity[quantityOf(unit)].filter((u) => u !== unit);
  return [unit, ...others].map((u) => ({ unit: u, value: convert(value, unit, u) }));
}
