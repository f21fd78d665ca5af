import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { instructionStepSchema } from "../../../../shared/flow/schema.ts";
import { TextField } from "../../../components/ui/text-field.tsx";
import { editorParse } from "../lib/form-messages.ts";
import { fieldId, formValuesOf, useStepFormSync } from "../lib/use-step-form.ts";
import { FormPart } from "./form-part.tsx";
import { baseFormOf, StepBasics, StepExtras } from "./step-common-fields.tsx";
import { numberOrAbsent, StepFormFrame } from "./step-form-frame.tsx";
import type { StepFormProps } from "./step-form-props.ts";
import { TargetField } from "./target-field.tsx";

type Fields = z.input<typeof instructionStepSchema>;
type Values = z.output<typeof instructionStepSchema>;
const resolver = zodResolver(instructionStepSchema, editorParse);

export function InstructionForm({ step, choices, onChange, onAddStep }: StepFormProps) {
  const form = useForm<Fields, unknown, Values>({ resolver, mode: "onChange", defaultValues: formValuesOf<Fields>(step, ["cautions"]) });
  useStepFormSync(form, onChange);
  const base = baseFormOf(form);
  const { register, control, formState: { errors } } = form;
  return (
    <StepFormFrame label="Instruction step">
      <StepBasics form={base} />
      <FormPart title="Where it leads">
        <div className="grid gap-5 landscape:grid-cols-2">
          <TargetField control={control} name="next" label="When done, go to" choices={choices} onAddStep={onAddStep} />
          <TextField
            id={fieldId("minSeconds")}
            label="Shortest plausible time, in seconds"
            hint="Faster than this is flagged in review; leave empty for any"
            type="number"
            inputMode="numeric"
            min={0}
            error={errors.minSeconds?.message}
            {...register("minSeconds", { setValueAs: numberOrAbsent })}
          />
        </div>
      </FormPart>
      <StepExtras form={base} />
    </StepFormFrame>
  );
}
