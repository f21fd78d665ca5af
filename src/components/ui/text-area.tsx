import type { Ref, TextareaHTMLAttributes } from "react";
import { describedBy, FieldError, NeededTag } from "./field-error.tsx";

interface TextAreaProps extends TextareaHTMLAttributes<HTMLTextAreaElement> {
  id: string;
  label: string;
  error?: string;
  hint?: string;
  needed?: boolean;
  ref?: Ref<HTMLTextAreaElement>;
}

export function TextArea({ id, label, error, hint, needed, className, ref, rows = 3, ...props }: TextAreaProps) {
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
      <textarea
        id={id}
        ref={ref}
        rows={rows}
        aria-required={needed ? true : undefined}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(error && errorId, hint && hintId)}
        className={
          "min-h-28 w-full rounded-lg border-2 bg-raised px-4 py-3 text-lg text-ink " +
          (error ? "border-problem" : "border-line-strong")
        }
        {...props}
      />
      {error && <FieldError id={errorId} message={error} />}
    </div>
  );
}
