import { zodResolver } from "@hookform/resolvers/zod";
import { Controller, useForm } from "react-hook-form";
import type { z } from "zod";
import { flowDefinitionSchema } from "../../../../shared/flow/schema.ts";
import { ChoiceGroup } from "../../../components/ui/choice-group.tsx";
import { describedBy, FieldError } from "../../../components/ui/field-error.tsx";
import { SelectField } from "../../../components/ui/select-field.tsx";
import { TextArea } from "../../../components/ui/text-area.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import type { DraftDefinition } from "../api/save-draft.ts";
import { equipmentChoices } from "../lib/flow-words.ts";
import { editorParse } from "../lib/form-messages.ts";
import { fieldId, useStepFormSync, type StepChange } from "../lib/use-step-form.ts";
import { FormPart } from "./form-part.tsx";
import { StepFormFrame } from "./step-form-frame.tsx";
import type { StepChoice } from "./target-field.tsx";

/** The flow's own fields: the same rules as the whole definition, for these keys. */
export const flowDetailsSchema = flowDefinitionSchema.pick({ title: true, summary: true, appliesTo: true, start: true });
type Fields = z.input<typeof flowDetailsSchema>;
type Values = z.output<typeof flowDetailsSchema>;
const resolver = zodResolver(flowDetailsSchema, editorParse);

const cycleChoices = [
  { value: 2, label: "2-stroke" },
  { value: 4, label: "4-stroke" },
  { value: "any", label: "Either" },
] as const;

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

function detailsOf(definition: DraftDefinition): Fields {
  const appliesTo = isRecord(definition.appliesTo) ? definition.appliesTo : {};
  return {
    title: typeof definition.title === "string" ? definition.title : "",
    summary: typeof definition.summary === "string" ? definition.summary : undefined,
    appliesTo: { equipment: Array.isArray(appliesTo.equipment) ? appliesTo.equipment : [], cycle: appliesTo.cycle ?? "any" } as Fields["appliesTo"],
    start: typeof definition.start === "string" ? definition.start : "",
  };
}

/** The details form's values written into the definition, its other keys left where they are. */
export function mergeDetails(definition: DraftDefinition, values: Record<string, unknown>): DraftDefinition {
  const merged: DraftDefinition = { ...definition };
  for (const key of ["title", "summary", "appliesTo", "start"] as const) {
    if (values[key] === undefined || (key === "summary" && values[key] === "")) delete merged[key];
    else merged[key] = values[key];
  }
  return merged;
}

interface FlowDetailsFormProps {
  definition: DraftDefinition;
  choices: readonly StepChoice[];
  /** Called with the definition's new envelope fields. */
  onChange: StepChange;
}

export function FlowDetailsForm({ definition, choices, onChange }: FlowDetailsFormProps) {
  const form = useForm<Fields, unknown, Values>({ resolver, mode: "onChange", defaultValues: detailsOf(definition) });
  useStepFormSync(form, onChange);
  const { register, control, formState: { errors } } = form;
  return (
    <section aria-labelledby="flow-details-title" className="flex flex-col gap-5 rounded-xl border-2 border-line bg-raised/60 px-5 py-5">
      <h2 id="flow-details-title" className="text-2xl font-semibold">
        Flow details
      </h2>
      <StepFormFrame label="Flow details">
        <TextField id={fieldId("flow.title")} label="Title" hint="What the check is for, e.g. Handheld 2-stroke: will not start" needed autoComplete="off" error={errors.title?.message} {...register("title")} />
        <TextArea id={fieldId("flow.summary")} label="Summary" hint="One or two sentences on what the flow covers" error={errors.summary?.message} {...register("summary")} />
        <FormPart title="What it applies to">
          <Controller
            control={control}
            name="appliesTo.equipment"
            render={({ field, fieldState }) => {
              const chosen = new Set(field.value);
              const errorId = `${fieldId("appliesTo.equipment")}-error`;
              return (
                <fieldset aria-describedby={describedBy(fieldState.error && errorId)} className="flex flex-col gap-2">
                  <legend className="mb-2 font-semibold">Equipment</legend>
                  <div className="grid gap-2 landscape:grid-cols-2">
                    {equipmentChoices.map((choice) => (
                      <label key={choice.value} className="flex min-h-12 items-center gap-3">
                        <input
                          type="checkbox"
                          className="size-6 shrink-0 accent-accent"
                          checked={chosen.has(choice.value)}
                          onChange={(event) => field.onChange(equipmentChoices.map((c) => c.value).filter((v) => (v === choice.value ? event.currentTarget.checked : chosen.has(v))))}
                        />
                        {choice.label}
                      </label>
                    ))}
                  </div>
                  {fieldState.error?.message && <FieldError id={errorId} message={fieldState.error.message} />}
                </fieldset>
              );
            }}
          />
          <Controller
            control={control}
            name="appliesTo.cycle"
            render={({ field, fieldState }) => (
              <ChoiceGroup id={fieldId("appliesTo.cycle")} name={field.name} legend="Engine cycle" choices={cycleChoices} value={field.value} onChange={field.onChange} minChoiceWidth="fit" error={fieldState.error?.message} />
            )}
          />
        </FormPart>
        <SelectField id={fieldId("flow.start")} label="The flow starts at" error={errors.start?.message} {...register("start")}>
          <option value="">Choose a step…</option>
          {choices.map((choice) => (
            <option key={choice.id} value={choice.id}>
              {choice.title === "" ? choice.id : `${choice.title} (${choice.id})`}
            </option>
          ))}
        </SelectField>
      </StepFormFrame>
    </section>
  );
}
