// U.S. Standard Atmosphere, 1976 (troposphere layer, below 11 km geopotential).

export const SEA_LEVEL_PRESSURE_PA = 101_325;
const T0_K = 288.15;
const LAPSE_K_PER_M = -0.0065;
const G0 = 9.80665;
const M0_KG_PER_KMOL = 28.9644;
const R_STAR = 8314.32;
const EARTH_RADIUS_M = 6_356_766;

export const MIN_ALTITUDE_M = -500;
export const MAX_ALTITUDE_M = 11_000;

/** Geopotential height for a geometric altitude (1976 standard, r0 = 6 356 766 m). */
export function geopotentialHeightM(altitudeM: number): number {
  return (EARTH_RADIUS_M * altitudeM) / (EARTH_RADIUS_M + altitudeM);
}

/** Ambient pressure of the standard atmosphere at a geometric altitude in metres. */
export function standardPressurePa(altitudeM: number): number {
  if (!Number.isFinite(altitudeM) || altitudeM < MIN_ALTITUDE_M || altitudeM > MAX_ALTITUDE_M) {
    throw new RangeError(`Altitude must be between ${MIN_ALTITUDE_M} m and ${MAX_ALTITUDE_M} m; got ${altitudeM}.`);
  }
  const h = geopotentialHeightM(altitudeM);
  const exponent = (G0 * M0_KG_PER_KMOL) / (R_STAR * LAPSE_K_PER_M);
  return SEA_LEVEL_PRESSURE_PA * Math.pow(T0_K / (T0_K + LAPSE_K_PER_M * h), exponent);
}

/** The cranking gauge reading the same engine would give at sea level. */
export function seaLevelEquivalentGauge(gaugeKPa: number, altitudeM: number): number {
  if (!Number.isFinite(gaugeKPa)) throw new RangeError(`Gauge reading must be a finite number; got ${gaugeKPa}.`);
  // Gauge = P_atm·(r^n − 1): for a given engine it is proportional to P_atm, so scale by P0 / P(alt).
  return (gaugeKPa * SEA_LEVEL_PRESSURE_PA) / standardPressurePa(altitudeM);
}
