import { equipmentKindLabels, type EquipmentKind } from "../../../../shared/equipment.ts";
import type { AppliesTo, SignalWord, StepKind } from "../../../../shared/flow/schema.ts";

export const stepKindLabels: Record<StepKind, string> = {
  instruction: "Instruction",
  choice: "Question",
  reading: "Reading",
  finding: "Finding",
  section: "Section",
};

export const signalWordChoices: readonly SignalWord[] = ["DANGER", "WARNING", "CAUTION", "NOTICE"];

const plural: Record<EquipmentKind, string> = {
  string_trimmer: "string trimmers",
  chainsaw: "chainsaws",
  leaf_blower: "leaf blowers",
  hedge_trimmer: "hedge trimmers",
  walk_behind_mower: "walk-behind mowers",
  generator: "small generators",
  tiller: "tillers",
  other: "other equipment",
};

export function listInWords(items: readonly string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items.at(-1)}`;
}

const cycleWords = { 2: "a 2-stroke engine", 4: "a 4-stroke engine", any: "either engine cycle" } as const;

/** "Chainsaws and leaf blowers with a 2-stroke engine". */
export function appliesToWords(appliesTo: AppliesTo | null | undefined): string {
  if (!appliesTo || appliesTo.equipment.length === 0) return "Equipment not chosen yet";
  const kinds = listInWords(appliesTo.equipment.map((kind) => plural[kind]));
  return `${kinds.charAt(0).toUpperCase()}${kinds.slice(1)} with ${cycleWords[appliesTo.cycle]}`;
}

export const equipmentChoices = (Object.keys(equipmentKindLabels) as EquipmentKind[]).map((kind) => ({ value: kind, label: equipmentKindLabels[kind] }));

export function personName(person: { name: string } | null | undefined): string {
  return person?.name ?? "someone no longer in the shop";
}

/** Who wrote a version: built-in versions have no author in the shop. */
export function authorName(person: { name: string } | null | undefined): string {
  return person?.name ?? "Came with Benchpath";
}

const when = new Intl.DateTimeFormat(undefined, { dateStyle: "medium", timeStyle: "short" });

export function timeInWords(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? "" : when.format(date);
}

export function countInWords(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}
