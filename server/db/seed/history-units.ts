// Invented customers and units for the history, and what each unit turns out to have wrong with it.
import type { customers, units } from "../schema.ts";
import { complaints, firstNames, kinds, lastNames } from "./history-cast.ts";
import { areaWeights, faultAreas, findingWeights, type FaultArea } from "./history-findings.ts";
import type { FlowGuide, UnitFeatures } from "./history-guide.ts";
import type { Random } from "./random.ts";

export interface PlannedUnit {
  row: typeof units.$inferInsert;
  cycle: 2 | 4;
  features: UnitFeatures;
}

/** The built-in flow written for each kind of unit in the cast. */
export function flowOfKind(kind: number): string {
  const { kind: equipment, cycle } = kinds[kind]!;
  if (equipment === "walk_behind_mower") return "walk-behind-mower-no-start";
  if (equipment === "generator") return "generator-no-start";
  return cycle === 2 ? "handheld-2-stroke-no-start" : "handheld-4-stroke-no-start";
}

const mailbox = (text: string) => text.toLowerCase().replace(/[^a-z]+/g, "");

export function newCustomer(rng: Random, at: number): typeof customers.$inferInsert & { id: string } {
  const first = rng.pick(firstNames);
  const last = rng.pick(lastNames);
  const email = rng.chance(0.6) ? `${mailbox(first)}.${mailbox(last)}@${rng.pick(["example.com", "example.net", "example.org"])}` : "";
  // 555-0100 to 555-0199 are set aside for fiction.
  const phone = `555-01${String(rng.int(0, 99)).padStart(2, "0")}`;
  return { id: rng.uuid(at), name: `${first} ${last}`, phone, email, createdAt: new Date(at), updatedAt: new Date(at) };
}

export function newUnit(rng: Random, kind: number, customerId: string, at: number): PlannedUnit {
  const spec = kinds[kind]!;
  const { make, models, engine } = rng.pick(spec.makes);
  const cc = rng.pick(spec.cc);
  const compressionRelease = spec.cycle === 2 ? "no" : rng.weighted([["yes", 0.7], ["unknown", 0.25], ["no", 0.05]] as const);
  const row: typeof units.$inferInsert = {
    id: rng.uuid(at),
    customerId,
    equipmentKind: spec.kind,
    make,
    model: rng.pick(models),
    engineModel: `${engine}${Math.round(cc)}-${spec.cycle}T`,
    engineType: `${rng.pick(["A", "B", "C", "E"])}${rng.int(1, 4)}`,
    engineSerial: `${engine}${rng.int(1_000_000, 9_999_999)}`,
    cycle: spec.cycle,
    displacementCc: cc,
    compressionRelease,
    hours: rng.chance(spec.hourMeter) ? Math.round(rng.between(20, 900)) : null,
    createdAt: new Date(at),
  };
  const features: UnitFeatures = {
    cycle: spec.cycle,
    primer: rng.chance(spec.primer),
    fuelValve: rng.chance(spec.fuelValve),
    oilSensor: rng.chance(spec.oilSensor),
    arrestor: rng.chance(spec.arrestor),
  };
  return { row, cycle: spec.cycle, features };
}

export function areaOf(guide: FlowGuide, findingId: string): FaultArea {
  return findingWeights[guide.key(guide.flow.steps[findingId]!)]?.area ?? "other";
}

/** The finding this unit's checks end on: first the area by how often it is behind a no-start, then a finding in it. */
export function pickTarget(guide: FlowGuide, features: UnitFeatures, rng: Random): string {
  const findings = guide.findings(features);
  const byArea = new Map<FaultArea, (readonly [string, number])[]>();
  for (const id of findings) {
    const known = findingWeights[guide.key(guide.flow.steps[id]!)];
    const list = byArea.get(known?.area ?? "other") ?? [];
    list.push([id, known?.weight ?? 0.5]);
    byArea.set(known?.area ?? "other", list);
  }
  const area = rng.weighted(faultAreas.filter((a) => byArea.has(a)).map((a) => [a, areaWeights[a]] as const));
  return rng.weighted(byArea.get(area)!);
}

/** What the customer said at the counter: often only that it will not start. */
export function complaintFor(guide: FlowGuide, target: string, rng: Random): string {
  const key = guide.key(guide.flow.steps[target]!);
  if (key.endsWith("/flywheel-key") && rng.chance(0.6)) return rng.pick(["Won't start after I hit a root.", "Rope kicks back hard and it won't start."]);
  if (key.endsWith("/bail-cable") && rng.chance(0.6)) return "The handle bar feels loose and it won't start.";
  if (/low-oil|sensor-failed|not-level/.test(key) && rng.chance(0.6)) return "Oil light flashes and it stops.";
  const area = areaOf(guide, target);
  return rng.chance(0.45) || area === "other" ? rng.pick(complaints.any) : rng.pick(complaints[area]);
}
