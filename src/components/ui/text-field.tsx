import type { InputHTMLAttributes, ReactNode, Ref } from "react";
import { FieldFrame, type FieldFrameProps } from "./field-frame.tsx";

interface TextFieldProps extends FieldFrameProps, Omit<InputHTMLAttributes<HTMLInputElement>, "id" | "className"> {
  /** Sits at the end of the input row, e.g. a show-password button or a unit. */
  trailing?: ReactNode;
  ref?: Ref<HTMLInputElement>;
}

export function TextField({ id, label, error, hint, needed, trailing, className, ref, ...inputProps }: TextFieldProps) {
  return (
    <FieldFrame id={id} label={label} error={error} hint={hint} needed={needed} className={className}>
      {(aria) => (
        <div className="flex items-stretch gap-2">
          <input
            id={id}
            ref={ref}
            {...aria}
            className={"min-h-14 w-full min-w-0 rounded-lg border-2 bg-raised px-4 text-lg text-ink " + (error ? "border-problem" : "border-line-strong")}
            {...inputProps}
          />
          {trailing}
        </div>
      )}
    </FieldFrame>
  );
}
