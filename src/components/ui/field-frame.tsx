import type { ReactNode } from "react";
import { describedBy, FieldError, NeededTag } from "./field-error.tsx";

export interface FieldFrameProps {
  id: string;
  label: string;
  error?: string;
  /** A short line under the label saying where to find the answer. */
  hint?: string;
  /** Shows that the form cannot go without it. */
  needed?: boolean;
  className?: string;
}

/** The attributes that tie a control to its label's hint and error. */
export interface FieldAria {
  "aria-required": true | undefined;
  "aria-invalid": true | undefined;
  "aria-describedby": string | undefined;
}

/** Label, hint and error around one control; every form field shares this frame. */
export function FieldFrame({ id, label, error, hint, needed, className, children }: FieldFrameProps & { children: (aria: FieldAria) => ReactNode }) {
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  const aria: FieldAria = {
    "aria-required": needed ? true : undefined,
    "aria-invalid": error ? true : undefined,
    "aria-describedby": describedBy(error && errorId, hint && hintId),
  };
  return (
    <div className={`flex flex-col gap-2 ${className ?? ""}`}>
      <label htmlFor={id} className="text-base font-semibold">
        {label}
        {needed && <NeededTag />}
      </label>
      {hint && (
        <p id={hintId} className="-mt-1 text-base text-ink-muted">
          {hint}
        </p>
      )}
      {children(aria)}
      {error && <FieldError id={errorId} message={error} />}
    </div>
  );
}
