import { Controller, useFieldArray, type UseFormReturn } from "react-hook-form";
import type { z } from "zod";
import type { instructionStepSchema } from "../../../../shared/flow/schema.ts";
import { Button } from "../../../components/ui/button.tsx";
import { SelectField } from "../../../components/ui/select-field.tsx";
import { TextArea } from "../../../components/ui/text-area.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { signalWordChoices } from "../lib/flow-words.ts";
import { fieldId } from "../lib/use-step-form.ts";
import { FormPart } from "./form-part.tsx";

type Instruction = z.input<typeof instructionStepSchema>;
/** The fields every step kind has, under the same names. */
export type BaseFields = Pick<Instruction, "title" | "body" | "cautions" | "misleads" | "photo">;
export type BaseForm = UseFormReturn<BaseFields, unknown, unknown>;

/** Every kind's form has the base fields; this narrows a kind's form to them. */
export function baseFormOf(form: unknown): BaseForm {
  return form as BaseForm;
}

export function StepBasics({ form }: { form: BaseForm }) {
  const { register, formState: { errors } } = form;
  return (
    <>
      <TextField id={fieldId("title")} label="Title" hint="An instruction or a question, as the tech will read it" needed autoComplete="off" error={errors.title?.message} {...register("title")} />
      <TextArea id={fieldId("body")} label="What to do and why" error={errors.body?.message} {...register("body")} />
    </>
  );
}

export function StepExtras({ form }: { form: BaseForm }) {
  return (
    <>
      <Cautions form={form} />
      <PhotoRequest form={form} />
      <TextArea
        id={fieldId("misleads")}
        label="How this can mislead"
        hint="When this test can point the wrong way, and what to check"
        error={form.formState.errors.misleads?.message}
        {...form.register("misleads")}
      />
    </>
  );
}

function Cautions({ form }: { form: BaseForm }) {
  const { control, register, formState: { errors } } = form;
  const { fields, append, remove } = useFieldArray({ control, name: "cautions" });
  return (
    <FormPart title="Safety panels" intro="DANGER and WARNING need text that says the hazard and how to avoid it; the tech must acknowledge them.">
      {fields.map((caution, index) => (
        <div key={caution.id} className="grid gap-4 rounded-lg border-2 border-line px-4 py-4 landscape:grid-cols-[12rem_1fr_auto] landscape:items-start">
          <SelectField id={fieldId(`cautions.${index}.signal`)} label={`Panel ${index + 1} signal word`} error={errors.cautions?.[index]?.signal?.message} {...register(`cautions.${index}.signal`)}>
            {signalWordChoices.map((word) => (
              <option key={word} value={word}>
                {word}
              </option>
            ))}
          </SelectField>
          <TextArea id={fieldId(`cautions.${index}.text`)} label={`Panel ${index + 1} text`} rows={2} error={errors.cautions?.[index]?.text?.message} {...register(`cautions.${index}.text`)} />
          <Button className="landscape:mt-9" onClick={() => remove(index)}>
            Remove panel {index + 1}
          </Button>
        </div>
      ))}
      <Button className="self-start" disabled={fields.length >= 10} onClick={() => append({ signal: "WARNING", text: "" })}>
        Add a safety panel
      </Button>
    </FormPart>
  );
}

const photoChoices = [
  { value: "", label: "No photo" },
  { value: "optional", label: "Ask for a photo (optional)" },
  { value: "required", label: "A photo is required" },
] as const;

function PhotoRequest({ form }: { form: BaseForm }) {
  return (
    <Controller
      control={form.control}
      name="photo"
      render={({ field, fieldState }) => {
        const photo = field.value;
        const promptError = (fieldState.error as { prompt?: { message?: string } } | undefined)?.prompt?.message;
        return (
          <div className="grid gap-4 landscape:grid-cols-[16rem_1fr]">
            <SelectField
              id={fieldId("photo.requirement")}
              label="Photo"
              value={photo?.requirement ?? ""}
              onChange={(event) => {
                const requirement = event.currentTarget.value;
                field.onChange(requirement === "" ? undefined : { requirement, prompt: photo?.prompt ?? "" });
              }}
              onBlur={field.onBlur}
              ref={field.ref}
            >
              {photoChoices.map((choice) => (
                <option key={choice.value} value={choice.value}>
                  {choice.label}
                </option>
              ))}
            </SelectField>
            {photo && (
              <TextField
                id={fieldId("photo.prompt")}
                label="What to photograph"
                needed
                autoComplete="off"
                value={photo.prompt}
                onChange={(event) => field.onChange({ ...photo, prompt: event.currentTarget.value })}
                error={promptError}
              />
            )}
          </div>
        );
      }}
    />
  );
}
