import type { InputHTMLAttributes, ReactNode, Ref } from "react";
import { describedBy, FieldError, NeededTag } from "./field-error.tsx";

interface TextFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  id: string;
  label: string;
  error?: string;
  /** A short line under the label saying where to find the answer. */
  hint?: string;
  /** Shows that the form cannot go without it. */
  needed?: boolean;
  /** Sits at the end of the input row, e.g. a show-password button or a unit. */
  trailing?: ReactNode;
  ref?: Ref<HTMLInputElement>;
}

export function TextField({ id, label, error, hint, needed, trailing, className, ref, ...inputProps }: TextFieldProps) {
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
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
      <div className="flex items-stretch gap-2">
        <input
          id={id}
          ref={ref}
          aria-required={needed ? true : undefined}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(error && errorId, hint && hintId)}
          className={
            "min-h-14 w-full min-w-0 rounded-lg border-2 bg-raised px-4 text-lg text-ink " +
            (error ? "border-problem" : "border-line-strong")
          }
          {...inputProps}
        />
        {trailing}
      </div>
      {error && <FieldError id={errorId} message={error} />}
    </div>
  );
}
