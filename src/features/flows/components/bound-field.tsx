import { useState } from "react";
import { Controller, type Control, type FieldPath, type FieldValues } from "react-hook-form";
import { TextField } from "../../../components/ui/text-field.tsx";
import { fieldId } from "../lib/use-step-form.ts";
import { firstMessage } from "./step-form-frame.tsx";

interface BoundFieldProps<T extends FieldValues, O> {
  control: Control<T, unknown, O>;
  name: FieldPath<T>;
  /** "Band 2", to name the controls. */
  band: string;
  side: "from" | "to";
}

type BoundValue = { value?: number; inclusive?: boolean } | null | undefined;

/** One end of a band: unbounded (−∞ or +∞), or a number that the band includes or stops short of. */
export function BoundField<T extends FieldValues, O>({ control, name, band, side }: BoundFieldProps<T, O>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <BoundInput id={fieldId(name)} band={band} side={side} bound={field.value as BoundValue} onChange={field.onChange} onBlur={field.onBlur} error={firstMessage(fieldState.error)} />
      )}
    />
  );
}

interface BoundInputProps {
  id: string;
  band: string;
  side: "from" | "to";
  bound: BoundValue;
  onChange: (bound: BoundValue) => void;
  onBlur: () => void;
  error: string | undefined;
}

function BoundInput({ id, band, side, bound, onChange, onBlur, error }: BoundInputProps) {
  const [text, setText] = useState(typeof bound?.value === "number" && Number.isFinite(bound.value) ? String(bound.value) : "");
  const unbounded = bound === null;
  const edge = side === "from" ? "start" : "end";
  const parsed = (t: string) => (t === "" ? undefined : Number(t));
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-1 font-semibold">
        {band} {edge}s
      </legend>
      <Check
        id={`${id}-open`}
        label={side === "from" ? "No lower limit (from −∞)" : "No upper limit (to +∞)"}
        checked={unbounded}
        onChange={(checked) => onChange(checked ? null : { value: parsed(text), inclusive: side === "from" })}
      />
      {!unbounded && (
        <>
          <TextField
            id={`${id}-value`}
            label={`${band} ${edge}s at`}
            type="number"
            inputMode="decimal"
            step="any"
            value={text}
            onChange={(event) => {
              const next = event.currentTarget.value;
              setText(next);
              onChange({ inclusive: bound?.inclusive ?? side === "from", value: parsed(next) });
            }}
            onBlur={onBlur}
            error={error}
          />
          <Check
            id={`${id}-inclusive`}
            label={`Includes the ${edge} value itself`}
            checked={bound?.inclusive ?? false}
            onChange={(checked) => onChange({ value: bound?.value, inclusive: checked })}
          />
        </>
      )}
    </fieldset>
  );
}

function Check({ id, label, checked, onChange }: { id: string; label: string; checked: boolean; onChange: (checked: boolean) => void }) {
  return (
    <label htmlFor={id} className="flex min-h-12 items-center gap-3 text-base">
      <input id={id} type="checkbox" className="size-6 shrink-0 accent-accent" checked={checked} onChange={(event) => onChange(event.currentTarget.checked)} />
      {label}
    </label>
  );
}
