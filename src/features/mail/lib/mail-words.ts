import type { MailKind, MailStatus } from "../../../../shared/schemas/estimate-records.ts";
import type { StateShape } from "../../../components/ui/state-pill.tsx";

export const kindWords: Record<MailKind, string> = {
  estimate: "Estimate",
  invite: "Invitation",
  password_reset: "Password reset",
};

export const statusWords: Record<MailStatus, { label: string; shape: StateShape }> = {
  sending: { label: "Sending", shape: "working" },
  sent: { label: "Sent", shape: "yes" },
  failed: { label: "Not sent", shape: "no" },
};

const dayTime = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });
export const localDayTime = (iso: string) => dayTime.format(new Date(iso));

export function sizeWords(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} kB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}
