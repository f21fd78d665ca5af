import type { ReactNode } from "react";

/** A step's fields live in a form so Enter in a field never leaves the page; edits save on their own. */
export function StepFormFrame({ label, children }: { label: string; children: ReactNode }) {
  return (
    <form aria-label={label} noValidate onSubmit={(event) => event.preventDefault()} className="flex flex-col gap-6">
      {children}
    </form>
  );
}

/** A number field's text as the draft keeps it: empty is absent. */
export const numberOrAbsent = (value: unknown) => (value === "" || value === null || value === undefined ? undefined : Number(value));

/** The first message anywhere inside a field's error (a list's error sits on its items). */
export function firstMessage(error: unknown): string | undefined {
  if (typeof error !== "object" || error === null) return undefined;
  const message = (error as { message?: unknown }).message;
  if (typeof message === "string") return message;
  for (const inner of Object.values(error)) {
    const found = firstMessage(inner);
    if (found) return found;
  }
  return undefined;
}
