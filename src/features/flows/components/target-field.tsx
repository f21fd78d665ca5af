import { useState } from "react";
import { Controller, type Control, type FieldPath, type FieldValues, type RefCallBack } from "react-hook-form";
import { SLUG } from "../../../../shared/flow/schema.ts";
import { Button } from "../../../components/ui/button.tsx";
import { SelectField } from "../../../components/ui/select-field.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { targetMessage } from "../lib/form-messages.ts";
import { fieldId } from "../lib/use-step-form.ts";

const TYPE_AN_ID = "\u0000type";

export interface StepChoice {
  id: string;
  title: string;
}

interface TargetFieldProps<T extends FieldValues, O> {
  control: Control<T, unknown, O>;
  name: FieldPath<T>;
  label: string;
  choices: readonly StepChoice[];
  /** Opens "add a step" with this id filled in. */
  onAddStep: (id: string) => void;
}

/** Where a step leads: one of the flow's steps, or an id typed for a step still to be added. */
export function TargetField<T extends FieldValues, O>({ control, name, label, choices, onAddStep }: TargetFieldProps<T, O>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <TargetInput
          id={fieldId(name)}
          label={label}
          choices={choices}
          onAddStep={onAddStep}
          value={typeof field.value === "string" ? field.value : ""}
          onChange={field.onChange}
          onBlur={field.onBlur}
          ref={field.ref}
          error={fieldState.error?.message}
        />
      )}
    />
  );
}

interface TargetInputProps {
  id: string;
  label: string;
  choices: readonly StepChoice[];
  onAddStep: (id: string) => void;
  value: string;
  onChange: (value: string) => void;
  onBlur: () => void;
  ref: RefCallBack;
  error: string | undefined;
}

function TargetInput({ id, label, choices, onAddStep, value, onChange, onBlur, ref, error: fieldError }: TargetInputProps) {
  const known = choices.some((choice) => choice.id === value);
  const [typing, setTyping] = useState(value !== "" && !known);
  const error = targetMessage(value, fieldError);

  if (typing) {
    const missing = value !== "" && !known && SLUG.test(value);
    return (
      <div className="flex flex-col gap-2">
        <TextField
          id={id}
          label={label}
          hint="The id of a step; type a new one, then add the step"
          autoCapitalize="none"
          autoCorrect="off"
          spellCheck={false}
          autoComplete="off"
          value={value}
          onChange={(event) => onChange(event.currentTarget.value)}
          onBlur={onBlur}
          ref={ref}
          error={error}
          trailing={
            <Button className="min-h-14 shrink-0" onClick={() => setTyping(false)}>
              Pick from the list
            </Button>
          }
        />
        {missing && (
          <p className="flex flex-wrap items-center gap-3 text-base">
            No step has the id “{value}” yet.
            <Button onClick={() => onAddStep(value)}>Add step “{value}”…</Button>
          </p>
        )}
      </div>
    );
  }
  return (
    <SelectField
      id={id}
      label={label}
      value={known ? value : ""}
      onChange={(event) => {
        if (event.currentTarget.value === TYPE_AN_ID) setTyping(true);
        else onChange(event.currentTarget.value);
      }}
      onBlur={onBlur}
      ref={ref}
      error={error}
    >
      <option value="">Choose a step…</option>
      {choices.map((choice) => (
        <option key={choice.id} value={choice.id}>
          {choice.title === "" ? choice.id : `${choice.title} (${choice.id})`}
        </option>
      ))}
      <option value={TYPE_AN_ID}>Type an id, for a new step…</option>
    </SelectField>
  );
}
