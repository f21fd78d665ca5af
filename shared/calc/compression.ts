// Cranking-compression verdicts: the reading is brought to sea level, then read against data.
import type { EngineProfile } from "../equipment.ts";
import { seaLevelEquivalentGauge, SEA_LEVEL_PRESSURE_PA } from "./atmosphere.ts";
import { convert } from "./units.ts";

export type CompressionVerdict = "good" | "marginal" | "low" | "implausible";

/** A band runs from `fromPsi` (sea-level gauge, whole psi, inclusive) up to the next band's `fromPsi`. */
export interface CompressionBand {
  fromPsi: number;
  verdict: Exclude<CompressionVerdict, "implausible">;
  says: string;
}

export interface CompressionRule {
  id: string;
  source: string;
  bands: readonly CompressionBand[];
}

const HANDHELD_2_STROKE = "a handheld 2-stroke";
const RELEASE_4_STROKE = "a 4-stroke with a compression release";

// The sources disagree (60–75 psi "ordinary" vs about 80 psi "marginal, may still start"): we keep
// 60–75 as good and mark anything above it marginal (more than a working release lets through, so
// not a failure but worth checking the release), which also keeps 80 psi marginal and never low.
function releaseBands(engine: string): readonly CompressionBand[] {
  return [
    { fromPsi: 0, verdict: "low", says: `below the 25 psi line where something is wrong for ${engine}` },
    { fromPsi: 25, verdict: "marginal", says: `under the ordinary 60–75 psi for ${engine}, but not a failure: it may still start` },
    { fromPsi: 60, verdict: "good", says: `within the ordinary 60–75 psi for ${engine}` },
    { fromPsi: 76, verdict: "marginal", says: `above the ordinary 60–75 psi for ${engine}; not a failure and it may still start, but if it kicks back, check the release` },
  ];
}

/** Thresholds as data; each row names where its numbers come from. */
export const compressionRules = {
  two_stroke: {
    id: "two_stroke",
    source: "common practice (90–180 psi typical, below about 90 hard or no start); the 80–89 psi marginal band is Benchpath's allowance for \"about\"",
    bands: [
      { fromPsi: 0, verdict: "low", says: `well under the usual 90–180 psi for ${HANDHELD_2_STROKE}: expect a hard or no start` },
      { fromPsi: 80, verdict: "marginal", says: `just under the usual 90–180 psi for ${HANDHELD_2_STROKE}: it may start hard` },
      { fromPsi: 90, verdict: "good", says: `within the usual range for ${HANDHELD_2_STROKE}` },
      { fromPsi: 181, verdict: "good", says: `above the usual 90–180 psi for ${HANDHELD_2_STROKE}: enough to start, though carbon build-up or the gauge may be reading high` },
    ],
  },
  four_stroke_release: {
    id: "four_stroke_release",
    source: "60–75 psi and 25 psi: a general engine-testing guide (weak published source); about 80 psi marginal: common practice",
    bands: releaseBands(RELEASE_4_STROKE),
  },
  four_stroke_release_unknown: {
    id: "four_stroke_release_unknown",
    source: "as four_stroke_release; the release was not recorded, so it is treated as fitted and a healthy engine is not called low",
    bands: releaseBands(`${RELEASE_4_STROKE} (assumed, as none was recorded)`),
  },
  four_stroke_no_release: {
    id: "four_stroke_no_release",
    source: "common practice (no published source): the 2-stroke bands, as the whole stroke is compressed",
    bands: [
      { fromPsi: 0, verdict: "low", says: "well under the usual 90 psi or more for a 4-stroke without a compression release" },
      { fromPsi: 80, verdict: "marginal", says: "just under the usual 90 psi or more for a 4-stroke without a compression release" },
      { fromPsi: 90, verdict: "good", says: "within the usual range for a 4-stroke without a compression release" },
    ],
  },
} as const satisfies Record<string, CompressionRule>;

/** Within this fraction below the maker's minimum a reading is marginal (common practice: gauges and cranking speed vary by about 10 %). */
export const SPEC_MARGINAL_FRACTION = 0.1;

export function theoreticalCrankingPressure(input: { compressionRatio: number; ambientKPa: number; polytropicN?: number }): {
  absoluteKPa: number;
  gaugeKPa: number;
} {
  const { compressionRatio: r, ambientKPa, polytropicN: n = 1.3 } = input;
  if (!Number.isFinite(r) || r < 1) throw new RangeError(`Compression ratio must be 1 or more; got ${r}.`);
  if (!Number.isFinite(ambientKPa) || ambientKPa <= 0) throw new RangeError(`Ambient pressure must be positive; got ${ambientKPa} kPa.`);
  if (!Number.isFinite(n) || n < 1 || n > 1.67) throw new RangeError(`Polytropic exponent must be between 1 and 1.67; got ${n}.`);
  const absoluteKPa = ambientKPa * Math.pow(r, n);
  return { absoluteKPa, gaugeKPa: absoluteKPa - ambientKPa };
}

/** Upper bound: isentropic (n = 1.4, no leakage or heat loss) compression of sea-level air at a generous 12:1. */
export const MAX_PLAUSIBLE_GAUGE_KPA = theoreticalCrankingPressure({
  compressionRatio: 12,
  ambientKPa: SEA_LEVEL_PRESSURE_PA / 1000,
  polytropicN: 1.4,
}).gaugeKPa;

function specRule(spec: { min: number; max: number }): CompressionRule {
  const { min, max } = spec;
  if (!Number.isFinite(min) || !Number.isFinite(max) || min <= 0 || max < min) {
    throw new RangeError(`The maker's range must have 0 < min ≤ max; got ${min}–${max} psi.`);
  }
  const range = `the maker's ${min}–${max} psi`;
  return {
    id: "maker_spec",
    source: `maker's specification; the ${SPEC_MARGINAL_FRACTION * 100} % marginal band below it is common practice`,
    bands: [
      { fromPsi: 0, verdict: "low", says: `below ${range}` },
      { fromPsi: min * (1 - SPEC_MARGINAL_FRACTION), verdict: "marginal", says: `just under ${range}: it may still start` },
      { fromPsi: min, verdict: "good", says: `within ${range}` },
      { fromPsi: Math.floor(max) + 1, verdict: "marginal", says: `above ${range}: check the gauge and look for carbon build-up` },
    ],
  };
}

function ruleFor(profile: EngineProfile): CompressionRule {
  if (profile.specPsi) return specRule(profile.specPsi);
  if (profile.cycle === 2) return compressionRules.two_stroke;
  if (profile.compressionRelease === "yes") return compressionRules.four_stroke_release;
  if (profile.compressionRelease === "no") return compressionRules.four_stroke_no_release;
  return compressionRules.four_stroke_release_unknown;
}

function psiText(psi: number): string {
  return `${Math.round(psi)} psi`;
}

export interface CompressionResult {
  verdict: CompressionVerdict;
  reason: string;
  seaLevelKPa: number;
  seaLevelPsi: number;
  rule: { id: string; source: string };
}

export function evaluateCompression(input: { gaugeKPa: number; altitudeM: number; profile: EngineProfile }): CompressionResult {
  const { gaugeKPa, altitudeM, profile } = input;
  const seaLevelKPa = seaLevelEquivalentGauge(gaugeKPa, altitudeM);
  const seaLevelPsi = convert(seaLevelKPa, "kPa", "psi");
  const readPsi = convert(gaugeKPa, "kPa", "psi");
  const where =
    Math.round(altitudeM) === 0
      ? `${psiText(readPsi)} read at sea level`
      : `${psiText(seaLevelPsi)} at sea level (${psiText(readPsi)} read at ${Math.round(altitudeM)} m)`;
  const values = { seaLevelKPa, seaLevelPsi };

  // Classified at the whole-psi resolution the sentence shows, so the two never disagree.
  const shownPsi = Math.round(seaLevelPsi);
  if (shownPsi < 0) {
    const rule = { id: "implausible_negative", source: "physics: a compression gauge holds the highest pressure and cannot read below zero" };
    return { verdict: "implausible", reason: `${where}: a compression gauge cannot read below zero; check the gauge and the entry.`, ...values, rule };
  }
  if (seaLevelKPa > MAX_PLAUSIBLE_GAUGE_KPA) {
    const bound = psiText(convert(MAX_PLAUSIBLE_GAUGE_KPA, "kPa", "psi"));
    const rule = { id: "implausible_high", source: "polytropic bound: P2 = P1·r^n with r = 12, n = 1.4, sea-level air" };
    return { verdict: "implausible", reason: `${where}: more than a small engine can make (about ${bound} even at 12:1 with no losses); check the gauge and the entry.`, ...values, rule };
  }

  const rule = ruleFor(profile);
  const band = [...rule.bands].reverse().find((b) => shownPsi >= b.fromPsi) ?? rule.bands[0];
  if (!band) throw new Error(`Compression rule ${rule.id} has no bands.`);
  return { verdict: band.verdict, reason: `${where}: ${band.says}.`, ...values, rule: { id: rule.id, source: rule.source } };
}
