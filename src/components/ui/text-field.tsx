import type { InputHTMLAttributes, ReactNode, Ref } from "react";
import { ProblemGlyph } from "./problem-glyph.tsx";

interface TextFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  id: string;
  label: string;
  error?: string;
  /** Sits at the end of the input row, e.g. a show-password button. */
  trailing?: ReactNode;
  ref?: Ref<HTMLInputElement>;
}

export function TextField({ id, label, error, trailing, className, ref, ...inputProps }: TextFieldProps) {
  const errorId = `${id}-error`;
  return (
    <div className={`flex flex-col gap-2 ${className ?? ""}`}>
      <label htmlFor={id} className="text-base font-semibold">
        {label}
      </label>
      <div className="flex items-stretch gap-2">
        <input
          id={id}
          ref={ref}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? errorId : undefined}
          className={
            "min-h-14 w-full min-w-0 rounded-lg border-2 bg-raised px-4 text-lg text-ink " +
            (error ? "border-problem" : "border-line-strong")
          }
          {...inputProps}
        />
        {trailing}
      </div>
      {error && (
        <p id={errorId} className="flex items-start gap-2 font-medium text-problem">
          <ProblemGlyph className="mt-0.5 size-6 shrink-0" />
          <span>{error}</span>
        </p>
      )}
    </div>
  );
}
