import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { isUnit, quantities, unitLabel, unitsByQuantity, type Quantity } from "../../../../shared/calc/units.ts";
import { compressionVerdicts, readingStepSchema } from "../../../../shared/flow/schema.ts";
import { ChoiceGroup } from "../../../components/ui/choice-group.tsx";
import { SelectField } from "../../../components/ui/select-field.tsx";
import { cleanStep } from "../lib/draft-edits.ts";
import { editorParse } from "../lib/form-messages.ts";
import { fieldId, formValuesOf, useStepFormSync } from "../lib/use-step-form.ts";
import { BandRows } from "./band-rows.tsx";
import { FormPart } from "./form-part.tsx";
import { baseFormOf, StepBasics, StepExtras } from "./step-common-fields.tsx";
import { StepFormFrame } from "./step-form-frame.tsx";
import type { StepFormProps } from "./step-form-props.ts";
import { TargetField } from "./target-field.tsx";

type Fields = z.input<typeof readingStepSchema>;
type Values = z.output<typeof readingStepSchema>;
const resolver = zodResolver(readingStepSchema, editorParse);

type Outcome = "bands" | "evaluation";
const outcomeChoices = [
  { value: "bands", label: "Bands I set" },
  { value: "evaluation", label: "Compression evaluation" },
] as const;

const quantityWords: Record<Quantity, string> = {
  pressure: "Pressure",
  resistance: "Resistance",
  length: "Length or gap",
  voltage: "Voltage",
  speed: "Speed",
  volume: "Volume",
  time: "Time",
  temperature: "Temperature",
  torque: "Torque",
};

const isQuantity = (q: unknown): q is Quantity => typeof q === "string" && (quantities as readonly string[]).includes(q);

export function ReadingForm({ step, choices, onChange, onReplace, onAddStep, renderBandCoverage }: StepFormProps) {
  const form = useForm<Fields, unknown, Values>({ resolver, mode: "onChange", defaultValues: formValuesOf<Fields>(step, ["cautions", "bands"]) });
  useStepFormSync(form, onChange);
  const base = baseFormOf(form);
  const { register, control, getValues, formState: { errors } } = form;
  const quantity = isQuantity(step.quantity) ? step.quantity : null;
  const unit = typeof step.unit === "string" ? step.unit : "";
  const units = quantity ? [...unitsByQuantity[quantity]] : [];
  const outcome: Outcome | null = "bands" in step && !("evaluation" in step) ? "bands" : "evaluation" in step && !("bands" in step) ? "evaluation" : null;

  // Reshaping the step reloads the form, so the fields always match what the step now asks for.
  const reshape = (change: (values: Record<string, unknown>) => void) => {
    const values = cleanStep(getValues());
    change(values);
    onReplace(values);
  };
  const setQuantity = (next: string) =>
    reshape((values) => {
      values.quantity = next;
      if (isQuantity(next)) values.unit = unitsByQuantity[next][0];
    });
  const setOutcome = (next: Outcome) =>
    reshape((values) => {
      delete values.bands;
      delete values.evaluation;
      if (next === "bands") values.bands = [{ from: null, to: null, label: "Any reading", verdict: "good", next: "" }];
      else values.evaluation = { kind: "compression", next: { good: "", marginal: "", low: "", implausible: "" } };
    });

  return (
    <StepFormFrame label="Reading step">
      <StepBasics form={base} />
      <FormPart title="What is measured">
        <div className="grid gap-5 landscape:grid-cols-2">
          <SelectField id={fieldId("quantity")} label="Quantity" value={quantity ?? ""} onChange={(event) => setQuantity(event.currentTarget.value)} error={errors.quantity?.message}>
            {quantity === null && <option value="">Choose a quantity…</option>}
            {quantities.map((q) => (
              <option key={q} value={q}>
                {quantityWords[q]}
              </option>
            ))}
          </SelectField>
          <SelectField id={fieldId("unit")} label="Unit the step asks for" hint="The tech may enter any unit of the quantity" error={errors.unit?.message} {...register("unit")}>
            {!units.includes(unit as never) && <option value={unit}>{unit === "" ? "Choose a unit…" : `${unit} (not a unit of this quantity)`}</option>}
            {units.map((u) => (
              <option key={u} value={u}>
                {isUnit(u) ? unitLabel(u) : u}
              </option>
            ))}
          </SelectField>
        </div>
        <ChoiceGroup id={fieldId("outcome")} name="outcome" legend="Where the reading leads is decided by" choices={outcomeChoices} value={outcome} onChange={setOutcome} minChoiceWidth="wide" />
      </FormPart>
      {outcome === "bands" && <BandRows form={form} unit={unit} choices={choices} onAddStep={onAddStep} renderBandCoverage={renderBandCoverage} />}
      {outcome === "evaluation" && (
        <FormPart title="Compression verdicts" intro="The engine's profile and the shop's altitude decide the verdict; each verdict leads to a step.">
          <div className="grid gap-5 landscape:grid-cols-2">
            {compressionVerdicts.map((verdict) => (
              <TargetField key={verdict} control={control} name={`evaluation.next.${verdict}`} label={`When ${verdict}, go to`} choices={choices} onAddStep={onAddStep} />
            ))}
          </div>
        </FormPart>
      )}
      <StepExtras form={base} />
    </StepFormFrame>
  );
}
