import type { InputHTMLAttributes } from "react";
import { describedBy, FieldError } from "../../../components/ui/field-error.tsx";

interface CellInputProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "id" | "className"> {
  id: string;
  label: string;
  /** Shows the label above the input; in a parts row the column headings stand for it. */
  showLabel?: boolean;
  error?: string;
  className?: string;
}

/** A compact input for the builder's rows: 48 px tall, its own message right under it. */
export function CellInput({ id, label, showLabel = false, error, className = "", ...props }: CellInputProps) {
  const errorId = `${id}-error`;
  return (
    <div className={`flex min-w-0 flex-col gap-1 ${className}`}>
      <label htmlFor={id} className={showLabel ? "text-base font-semibold" : "sr-only"}>
        {label}
      </label>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(error && errorId)}
        className={"min-h-12 w-full min-w-0 rounded-lg border-2 bg-raised px-3 text-lg text-ink tabular-figures " + (error ? "border-problem" : "border-line-strong")}
        {...props}
      />
      {error && <FieldError id={errorId} message={error} />}
    </div>
  );
}
