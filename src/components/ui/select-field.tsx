import type { ReactNode, Ref, SelectHTMLAttributes } from "react";
import { FieldFrame, type FieldFrameProps } from "./field-frame.tsx";

interface SelectFieldProps extends FieldFrameProps, Omit<SelectHTMLAttributes<HTMLSelectElement>, "id" | "className"> {
  ref?: Ref<HTMLSelectElement>;
  children: ReactNode;
}

/** One answer from a list too long for tiles (a step to go to, a unit). */
export function SelectField({ id, label, error, hint, needed, className, ref, children, ...props }: SelectFieldProps) {
  return (
    <FieldFrame id={id} label={label} error={error} hint={hint} needed={needed} className={className}>
      {(aria) => (
        <select
          id={id}
          ref={ref}
          {...aria}
          className={"min-h-14 w-full min-w-0 rounded-lg border-2 bg-raised px-3 text-lg text-ink " + (error ? "border-problem" : "border-line-strong")}
          {...props}
        >
          {children}
        </select>
      )}
    </FieldFrame>
  );
}
