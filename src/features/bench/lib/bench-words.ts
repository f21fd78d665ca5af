import { equipmentKindLabels, type EquipmentKind } from "../../../../shared/equipment.ts";
import type { BenchSession } from "../../../../shared/schemas/sessions.ts";

// The same short form the work orders use, said aloud at the counter: "WO 1042".
export function workOrderNumber(number: number) {
  return `WO ${number}`;
}

export function sessionPath(sessionId: string) {
  return `/bench/sessions/${encodeURIComponent(sessionId)}`;
}

export function workOrderPath(workOrderId: string) {
  return `/work-orders/${encodeURIComponent(workOrderId)}`;
}

function isEquipmentKind(kind: string): kind is EquipmentKind {
  return Object.hasOwn(equipmentKindLabels, kind);
}

/** "Hollis TR-22 string trimmer"; a kind this version does not know is shown as the server sent it. */
export function unitName({ equipmentKind, make, model }: BenchSession["unit"]) {
  const kind = isEquipmentKind(equipmentKind) ? equipmentKindLabels[equipmentKind].toLowerCase() : equipmentKind.replaceAll("_", " ");
  return `${make} ${model} ${kind}`;
}

const timeFormat = new Intl.DateTimeFormat(undefined, { hour: "2-digit", minute: "2-digit" });
const dayFormat = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short" });

function calendarDay(date: Date) {
  return new Date(date.getFullYear(), date.getMonth(), date.getDate()).getTime();
}

/** When a check was started, in the tablet's own time: "Started today at 09:40". */
export function startedWords(startedAt: string, now: number = Date.now()) {
  const started = new Date(startedAt);
  if (Number.isNaN(started.getTime())) return "";
  const time = timeFormat.format(started);
  const day = calendarDay(started);
  if (day === calendarDay(new Date(now))) return `Started today at ${time}`;
  // A calendar day back, not 24 hours: a daylight-saving change makes that day 23 or 25 hours long.
  const yesterday = new Date(now);
  yesterday.setDate(yesterday.getDate() - 1);
  if (day === calendarDay(yesterday)) return `Started yesterday at ${time}`;
  return `Started ${dayFormat.format(started)} at ${time}`;
}
