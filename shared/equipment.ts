// Equipment kinds and engine facts shared by intake, flows and review.
export const equipmentKinds = [
  "string_trimmer",
  "chainsaw",
  "leaf_blower",
  "hedge_trimmer",
  "walk_behind_mower",
  "generator",
  "tiller",
  "other",
] as const;
export type EquipmentKind = (typeof equipmentKinds)[number];

export const equipmentKindLabels: Record<EquipmentKind, string> = {
  string_trimmer: "String trimmer",
  chainsaw: "Chainsaw",
  leaf_blower: "Leaf blower",
  hedge_trimmer: "Hedge trimmer",
  walk_behind_mower: "Walk-behind mower",
  generator: "Small generator",
  tiller: "Tiller",
  other: "Other equipment",
};

export const engineCycles = [2, 4] as const;
export type EngineCycle = (typeof engineCycles)[number];

/** Automatic compression release: fitted, not fitted, or not known at intake. */
export const compressionReleaseValues = ["yes", "no", "unknown"] as const;
export type CompressionRelease = (typeof compressionReleaseValues)[number];

/** What the engine is, as far as the checks need to know. */
export interface EngineProfile {
  cycle: EngineCycle;
  compressionRelease: CompressionRelease;
  displacementCc: number | null;
  /** The maker's cranking-compression range in psi (gauge), when the shop knows it. */
  specPsi?: { min: number; max: number } | null;
}

export const unitSystems = ["imperial", "metric"] as const;
export type UnitSystem = (typeof unitSystems)[number];
