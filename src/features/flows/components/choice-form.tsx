import { zodResolver } from "@hookform/resolvers/zod";
import { useFieldArray, useForm } from "react-hook-form";
import type { z } from "zod";
import { choiceStepSchema } from "../../../../shared/flow/schema.ts";
import { Button } from "../../../components/ui/button.tsx";
import { FieldError } from "../../../components/ui/field-error.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { editorParse } from "../lib/form-messages.ts";
import { fieldId, formValuesOf, useStepFormSync } from "../lib/use-step-form.ts";
import { FormPart } from "./form-part.tsx";
import { baseFormOf, StepBasics, StepExtras } from "./step-common-fields.tsx";
import { StepFormFrame } from "./step-form-frame.tsx";
import type { StepFormProps } from "./step-form-props.ts";
import { TargetField } from "./target-field.tsx";

type Fields = z.input<typeof choiceStepSchema>;
type Values = z.output<typeof choiceStepSchema>;
const resolver = zodResolver(choiceStepSchema, editorParse);

export function ChoiceForm({ step, choices, onChange, onAddStep }: StepFormProps) {
  const form = useForm<Fields, unknown, Values>({ resolver, mode: "onChange", defaultValues: formValuesOf<Fields>(step, ["cautions", "options"]) });
  useStepFormSync(form, onChange);
  const base = baseFormOf(form);
  const { register, control, formState: { errors } } = form;
  const { fields, append, remove } = useFieldArray({ control, name: "options" });
  const listError = errors.options?.root?.message ?? errors.options?.message;
  return (
    <StepFormFrame label="Question step">
      <StepBasics form={base} />
      <FormPart title="Answers" intro="Two to twelve; each answer's value is what the session records, so keep it short: yes, no, weak-spark.">
        {fields.map((option, index) => (
          <fieldset key={option.id} className="grid gap-4 rounded-lg border-2 border-line px-4 py-4 landscape:grid-cols-[12rem_1fr_1fr]">
            <legend className="px-1 font-semibold">Answer {index + 1}</legend>
            <TextField
              id={fieldId(`options.${index}.value`)}
              label={`Answer ${index + 1} value`}
              autoCapitalize="none"
              autoCorrect="off"
              spellCheck={false}
              autoComplete="off"
              error={errors.options?.[index]?.value?.message}
              {...register(`options.${index}.value`)}
            />
            <TextField id={fieldId(`options.${index}.label`)} label={`Answer ${index + 1} words`} autoComplete="off" error={errors.options?.[index]?.label?.message} {...register(`options.${index}.label`)} />
            <TargetField control={control} name={`options.${index}.next`} label={`Answer ${index + 1} leads to`} choices={choices} onAddStep={onAddStep} />
            <Button className="self-start landscape:col-span-3" disabled={fields.length <= 2} onClick={() => remove(index)}>
              Remove answer {index + 1}
            </Button>
          </fieldset>
        ))}
        {listError && <FieldError id={fieldId("options-error")} message={listError} />}
        <Button className="self-start" disabled={fields.length >= 12} onClick={() => append({ value: "", label: "", next: "" })}>
          Add an answer
        </Button>
      </FormPart>
      <StepExtras form={base} />
    </StepFormFrame>
  );
}
