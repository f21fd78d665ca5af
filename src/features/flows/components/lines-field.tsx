import { useState } from "react";
import { Controller, type Control, type FieldPath, type FieldValues, type RefCallBack } from "react-hook-form";
import { TextArea } from "../../../components/ui/text-area.tsx";
import { fieldId } from "../lib/use-step-form.ts";
import { firstMessage } from "./step-form-frame.tsx";

interface LinesFieldProps<T extends FieldValues, O> {
  control: Control<T, unknown, O>;
  name: FieldPath<T>;
  label: string;
  hint?: string;
}

const linesOf = (text: string) =>
  text
    .split("\n")
    .map((line) => line.trim())
    .filter((line) => line !== "");

/** A list of short texts, one a line (parts, follow-ups); blank lines are left out. */
export function LinesField<T extends FieldValues, O>({ control, name, label, hint }: LinesFieldProps<T, O>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <LinesInput
          id={fieldId(name)}
          label={label}
          hint={hint}
          initial={Array.isArray(field.value) ? (field.value as unknown[]).join("\n") : ""}
          onChange={field.onChange}
          onBlur={field.onBlur}
          ref={field.ref}
          error={firstMessage(fieldState.error)}
        />
      )}
    />
  );
}

interface LinesInputProps {
  id: string;
  label: string;
  hint?: string;
  initial: string;
  onChange: (lines: string[]) => void;
  onBlur: () => void;
  ref: RefCallBack;
  error: string | undefined;
}

function LinesInput({ id, label, hint, initial, onChange, onBlur, ref, error }: LinesInputProps) {
  // The text is the field's own, so a blank line being typed is not lost to the list it stands for.
  const [text, setText] = useState(initial);
  return (
    <TextArea
      id={id}
      label={label}
      hint={hint}
      rows={3}
      value={text}
      onChange={(event) => {
        setText(event.currentTarget.value);
        onChange(linesOf(event.currentTarget.value));
      }}
      onBlur={onBlur}
      ref={ref}
      error={error}
    />
  );
}
