// Two-stroke premix: a ratio of R:1 means R parts of fuel to one part of oil, by volume.
import { convert, quantityOf, unitLabel, UnitError, type Unit } from "./units.ts";

function requireVolumeUnit(unit: Unit, field: string): void {
  if (quantityOf(unit) !== "volume") {
    throw new UnitError(`${field} must be a volume unit; ${unitLabel(unit)} is a ${quantityOf(unit)} unit.`);
  }
}

function requirePositive(value: number, field: string): void {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${field} must be a positive number; got ${String(value)}.`);
  }
}

/** Oil to add to `fuel` for a ratio of `ratio`:1, in `oilUnit`. */
export function oilForFuel(input: { fuel: number; fuelUnit: Unit; ratio: number; oilUnit: Unit }): number {
  const { fuel, fuelUnit, ratio, oilUnit } = input;
  requireVolumeUnit(fuelUnit, "The fuel unit");
  requireVolumeUnit(oilUnit, "The oil unit");
  requirePositive(fuel, "The fuel amount");
  requirePositive(ratio, "The ratio");
  return convert(convert(fuel, fuelUnit, "mL") / ratio, "mL", oilUnit);
}

/** The ratio R (as in R:1) of a mix made of `fuel` and `oil`. */
export function ratioFromAmounts(input: { fuel: number; fuelUnit: Unit; oil: number; oilUnit: Unit }): number {
  const { fuel, fuelUnit, oil, oilUnit } = input;
  requireVolumeUnit(fuelUnit, "The fuel unit");
  requireVolumeUnit(oilUnit, "The oil unit");
  requirePositive(fuel, "The fuel amount");
  requirePositive(oil, "The oil amount");
  return convert(fuel, fuelUnit, "mL") / convert(oil, oilUnit, "mL");
}
