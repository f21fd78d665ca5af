import type { PersonStatus } from "../../../../shared/schemas/people.ts";
import type { StateShape } from "../../../components/ui/state-pill.tsx";

export const statusWords: Record<PersonStatus, { label: string; shape: StateShape }> = {
  invited: { label: "Invited", shape: "waiting" },
  active: { label: "Active", shape: "yes" },
  deactivated: { label: "Deactivated", shape: "stopped" },
};

const dayFormat = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short", year: "numeric" });
const dayTimeFormat = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" });

export function localDay(iso: string | null): string {
  return iso ? dayFormat.format(new Date(iso)) : "";
}

export function localDayTime(iso: string | null): string {
  return iso ? dayTimeFormat.format(new Date(iso)) : "";
}
