import type { Ref, TextareaHTMLAttributes } from "react";
import { FieldFrame, type FieldFrameProps } from "./field-frame.tsx";

interface TextAreaProps extends FieldFrameProps, Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, "id" | "className"> {
  ref?: Ref<HTMLTextAreaElement>;
}

export function TextArea({ id, label, error, hint, needed, className, ref, rows = 3, ...props }: TextAreaProps) {
  return (
    <FieldFrame id={id} label={label} error={error} hint={hint} needed={needed} className={className}>
      {(aria) => (
        <textarea
          id={id}
          ref={ref}
          rows={rows}
          {...aria}
          className={"min-h-28 w-full rounded-lg border-2 bg-raised px-4 py-3 text-lg text-ink " + (error ? "border-problem" : "border-line-strong")}
          {...props}
        />
      )}
    </FieldFrame>
  );
}
