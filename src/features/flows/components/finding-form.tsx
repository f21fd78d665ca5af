import { zodResolver } from "@hookform/resolvers/zod";
import { useFieldArray, useForm } from "react-hook-form";
import type { z } from "zod";
import { findingStepSchema } from "../../../../shared/flow/schema.ts";
import { Button } from "../../../components/ui/button.tsx";
import { SelectField } from "../../../components/ui/select-field.tsx";
import { TextArea } from "../../../components/ui/text-area.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { editorParse } from "../lib/form-messages.ts";
import { fieldId, formValuesOf, useStepFormSync } from "../lib/use-step-form.ts";
import { FormPart } from "./form-part.tsx";
import { LinesField } from "./lines-field.tsx";
import { baseFormOf, StepBasics, StepExtras } from "./step-common-fields.tsx";
import { numberOrAbsent, StepFormFrame } from "./step-form-frame.tsx";
import type { StepFormProps } from "./step-form-props.ts";

type Fields = z.input<typeof findingStepSchema>;
type Values = z.output<typeof findingStepSchema>;
const resolver = zodResolver(findingStepSchema, editorParse);

export function FindingForm({ step, onChange }: StepFormProps) {
  const form = useForm<Fields, unknown, Values>({ resolver, mode: "onChange", defaultValues: formValuesOf<Fields>(step, ["cautions", "repairs", "followUp"]) });
  useStepFormSync(form, onChange);
  const base = baseFormOf(form);
  const { register, control, formState: { errors } } = form;
  const { fields, append, remove } = useFieldArray({ control, name: "repairs" });
  return (
    <StepFormFrame label="Finding step">
      <StepBasics form={base} />
      <FormPart title="The finding">
        <SelectField id={fieldId("certainty")} label="How sure the checks make it" error={errors.certainty?.message} {...register("certainty")}>
          <option value="confirmed">Confirmed: the checks prove it</option>
          <option value="likely">Likely: the best explanation of what the checks found</option>
        </SelectField>
        <TextArea id={fieldId("explanation")} label="Explanation" hint="Why the checks point here, in words a customer could follow" needed error={errors.explanation?.message} {...register("explanation")} />
      </FormPart>
      <FormPart title="Repairs" intro="What an estimate starts from; a finding without repairs is a warning.">
        {fields.map((repair, index) => (
          <fieldset key={repair.id} className="grid gap-4 rounded-lg border-2 border-line px-4 py-4 landscape:grid-cols-[1fr_12rem]">
            <legend className="px-1 font-semibold">Repair {index + 1}</legend>
            <TextField id={fieldId(`repairs.${index}.title`)} label={`Repair ${index + 1} title`} autoComplete="off" error={errors.repairs?.[index]?.title?.message} {...register(`repairs.${index}.title`)} />
            <TextField
              id={fieldId(`repairs.${index}.labourHours`)}
              label={`Repair ${index + 1} labour, hours`}
              type="number"
              inputMode="decimal"
              step="any"
              min={0}
              error={errors.repairs?.[index]?.labourHours?.message}
              {...register(`repairs.${index}.labourHours`, { setValueAs: numberOrAbsent })}
            />
            <LinesField control={control} name={`repairs.${index}.parts`} label={`Repair ${index + 1} parts`} hint="One part a line" />
            <Button className="self-end justify-self-start" onClick={() => remove(index)}>
              Remove repair {index + 1}
            </Button>
          </fieldset>
        ))}
        <Button className="self-start" disabled={fields.length >= 20} onClick={() => append({ title: "", labourHours: 0, parts: [] })}>
          Add a repair
        </Button>
      </FormPart>
      <LinesField control={control} name="followUp" label="Follow-up checks" hint="One a line, e.g. Recheck the idle after the repair" />
      <StepExtras form={base} />
    </StepFormFrame>
  );
}
