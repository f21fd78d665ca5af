import { equipmentKindLabels, type EquipmentKind } from "../../../../shared/equipment.ts";
import { workOrderStateLabels, type WorkOrderState } from "../../../../shared/schemas/work-orders.ts";

export const ticketNumber = (number: number) => `WO ${number}`;
export const ticketPath = (id: string) => `/work-orders/${encodeURIComponent(id)}`;
export const stateLabel = (state: WorkOrderState) => workOrderStateLabels[state];

export function unitWords({ make, model, equipmentKind }: { make: string; model: string; equipmentKind: EquipmentKind }) {
  return `${make} ${model} ${equipmentKindLabels[equipmentKind].toLowerCase()}`;
}


const minute = 60;
const hour = 60 * minute;
const day = 24 * hour;

/** How long a ticket has sat in its state, said plainly. */
export function timeInState(seconds: number) {
  if (seconds < hour) return "Under an hour in this state";
  if (seconds < day) {
    const hours = Math.floor(seconds / hour);
    return `${hours} ${hours === 1 ? "hour" : "hours"} in this state`;
  }
  const days = Math.floor(seconds / day);
  return `${days} ${days === 1 ? "day" : "days"} in this state`;
}

const movedFormat = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });

export function movedWords(movedBy: { name: string } | null, movedAt: string) {
  const when = movedFormat.format(new Date(movedAt));
  return movedBy ? `Moved by ${movedBy.name}, ${when}` : `Moved ${when}`;
}
