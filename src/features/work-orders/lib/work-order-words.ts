import { equipmentKindLabels, type EquipmentKind } from "../../../../shared/equipment.ts";

/** Our own short form, said aloud at the counter: "WO 1042". */
export function workOrderNumber(number: number) {
  return `WO ${number}`;
}

export function workOrderPath(id: string) {
  return `/work-orders/${encodeURIComponent(id)}`;
}

export function unitName({ make, model, equipmentKind }: { make: string; model: string; equipmentKind: EquipmentKind }) {
  return `${make} ${model} ${equipmentKindLabels[equipmentKind].toLowerCase()}`;
}

const hour = 60 * 60_000;
const day = 24 * hour;

/** How long the unit has been in the shop, in the words a bench uses. */
export function ageInShop(createdAt: string, now: number = Date.now()) {
  const elapsed = Math.max(0, now - Date.parse(createdAt));
  if (Number.isNaN(elapsed)) return "";
  if (elapsed < hour) return "In today, under an hour";
  if (elapsed < day) {
    const hours = Math.floor(elapsed / hour);
    return `${hours} ${hours === 1 ? "hour" : "hours"} in the shop`;
  }
  const days = Math.floor(elapsed / day);
  return `${days} ${days === 1 ? "day" : "days"} in the shop`;
}
