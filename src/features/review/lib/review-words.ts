import { equipmentKindLabels, type EquipmentKind } from "../../../../shared/equipment.ts";
import type { FlagCode } from "../../../../shared/review/flags.ts";
import type { Amount } from "../../../../shared/review/timeline.ts";
import type { reviewStates, sessionStatuses } from "../../../../shared/schemas/sessions.ts";

export type ReviewState = (typeof reviewStates)[number];
export type SessionStatus = (typeof sessionStatuses)[number];

// The same short form the work orders use, said aloud at the counter: "WO 1042".
export function workOrderNumber(number: number) {
  return `WO ${number}`;
}

export function reviewSessionPath(sessionId: string) {
  return `/review/sessions/${encodeURIComponent(sessionId)}`;
}

/** "Hollis TR-22", with the kind beside it where there is room. */
export function makeModel({ make, model }: { make: string; model: string }) {
  return `${make} ${model}`;
}

export function kindLabel(kind: EquipmentKind) {
  return equipmentKindLabels[kind];
}

/** Where a session stands for review, in the words the bench uses too ("sent back"). */
export function reviewStateWords(state: ReviewState, status: SessionStatus) {
  switch (state) {
    case "waiting":
      return "Waiting for sign-off";
    case "approved":
      return "Signed off";
    case "returned":
      return "Sent back";
    case "not_submitted":
      return status === "abandoned" ? "Abandoned" : "Still on the bench";
  }
}

/** The review-state filter's choices; "not handed in" covers open and abandoned sessions alike. */
export const reviewStateChoices: { value: ReviewState; label: string }[] = [
  { value: "waiting", label: "Waiting for sign-off" },
  { value: "approved", label: "Signed off" },
  { value: "returned", label: "Sent back" },
  { value: "not_submitted", label: "Not handed in (open or abandoned)" },
];

export const flagWords: Record<FlagCode, string> = {
  reading_implausible: "Reading hard to believe",
  step_too_fast: "Step done too fast",
  photo_missing: "Photo missing",
  caution_not_acknowledged: "Caution not acknowledged",
  open_too_long: "Open too long",
};

export function flagCountWords(count: number) {
  return count === 0 ? "No flags" : `${count} ${count === 1 ? "flag" : "flags"}`;
}

const dayFormat = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short", year: "numeric" });
const timeFormat = new Intl.DateTimeFormat(undefined, { hour: "2-digit", minute: "2-digit" });
const timeWithSecondsFormat = new Intl.DateTimeFormat(undefined, { hour: "2-digit", minute: "2-digit", second: "2-digit" });

/** A stored time in the tablet's own time zone: the day and the time of day. */
export function localDay(iso: string) {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? "" : dayFormat.format(date);
}

export function localTime(iso: string, seconds = false) {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return "";
  return (seconds ? timeWithSecondsFormat : timeFormat).format(date);
}

export function localDayTime(iso: string) {
  const day = localDay(iso);
  return day === "" ? "" : `${day}, ${localTime(iso)}`;
}

/** "45 s", "2 min 05 s", "1 h 12 min": time on a step. */
export function durationWords(seconds: number) {
  const whole = Math.max(0, Math.round(seconds));
  if (whole < 60) return `${whole} s`;
  const minutes = Math.floor(whole / 60);
  if (minutes < 60) return `${minutes} min ${String(whole % 60).padStart(2, "0")} s`;
  return `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, "0")} min`;
}

export function amountWords(amount: Amount) {
  return `${amount.value} ${amount.unitLabel}`;
}
