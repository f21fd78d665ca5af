import type { ReactNode } from "react";
import { useFieldArray, useWatch, type UseFormReturn } from "react-hook-form";
import type { z } from "zod";
import { bandSchema, verdicts, type Band, type readingStepSchema } from "../../../../shared/flow/schema.ts";
import { Button } from "../../../components/ui/button.tsx";
import { SelectField } from "../../../components/ui/select-field.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { fieldId } from "../lib/use-step-form.ts";
import type { BandCoverageProps } from "../lib/view-slots.ts";
import { BoundField } from "./bound-field.tsx";
import { FormPart } from "./form-part.tsx";
import { TargetField, type StepChoice } from "./target-field.tsx";

type Fields = z.input<typeof readingStepSchema>;
type Values = z.output<typeof readingStepSchema>;

export const verdictLabels: Record<(typeof verdicts)[number], string> = {
  good: "Good",
  marginal: "Marginal",
  low: "Low",
  high: "High",
  implausible: "Implausible (a bad reading)",
};

interface BandRowsProps {
  form: UseFormReturn<Fields, unknown, Values>;
  unit: string;
  choices: readonly StepChoice[];
  onAddStep: (id: string) => void;
  renderBandCoverage?: (props: BandCoverageProps) => ReactNode;
}

/** The bands that are whole, with where each stands in the list, for the coverage drawing. */
function wholeBands(bands: unknown): { bands: Band[]; index: number[] } {
  const out: { bands: Band[]; index: number[] } = { bands: [], index: [] };
  (Array.isArray(bands) ? bands : []).forEach((band: unknown, i) => {
    const parsed = bandSchema.safeParse(band);
    if (!parsed.success) return;
    out.bands.push(parsed.data);
    out.index.push(i);
  });
  return out;
}

export function BandRows({ form, unit, choices, onAddStep, renderBandCoverage }: BandRowsProps) {
  const { control, register, formState: { errors } } = form;
  const { fields, append, remove } = useFieldArray({ control, name: "bands" });
  const watched = useWatch({ control, name: "bands" });
  const whole = wholeBands(watched);
  const openRow = (index: number) => {
    const row = whole.index[index];
    if (row !== undefined) document.getElementById(fieldId(`bands.${row}.label`))?.focus();
  };
  return (
    <FormPart title="Bands" intro={`From low to high, in ${unit}; together they must cover every reading exactly once.`}>
      {renderBandCoverage?.({ bands: whole.bands, unit, onPick: openRow })}
      {fields.map((band, index) => {
        const name = `Band ${index + 1}`;
        return (
          <fieldset key={band.id} className="grid gap-4 rounded-lg border-2 border-line px-4 py-4 landscape:grid-cols-2">
            <legend className="px-1 font-semibold">{name}</legend>
            <BoundField control={control} name={`bands.${index}.from`} band={name} side="from" />
            <BoundField control={control} name={`bands.${index}.to`} band={name} side="to" />
            <TextField id={fieldId(`bands.${index}.label`)} label={`${name} label`} hint="What the tech sees, e.g. Within range" autoComplete="off" error={errors.bands?.[index]?.label?.message} {...register(`bands.${index}.label`)} />
            <SelectField id={fieldId(`bands.${index}.verdict`)} label={`${name} verdict`} error={errors.bands?.[index]?.verdict?.message} {...register(`bands.${index}.verdict`)}>
              {verdicts.map((verdict) => (
                <option key={verdict} value={verdict}>
                  {verdictLabels[verdict]}
                </option>
              ))}
            </SelectField>
            <TargetField control={control} name={`bands.${index}.next`} label={`${name} leads to`} choices={choices} onAddStep={onAddStep} />
            <Button className="self-end justify-self-start" disabled={fields.length <= 1} onClick={() => remove(index)}>
              Remove {name.toLowerCase()}
            </Button>
          </fieldset>
        );
      })}
      <Button className="self-start" disabled={fields.length >= 20} onClick={() => append({ from: null, to: null, label: "", verdict: "good", next: "" })}>
        Add a band
      </Button>
    </FormPart>
  );
}
