import { Controller, type UseFormReturn } from "react-hook-form";
import { compressionReleaseValues, engineCycles, type CompressionRelease } from "../../../../shared/equipment.ts";
import { tankContentLabels, tankContents } from "../../../../shared/schemas/work-orders.ts";
import { ChoiceGroup } from "../../../components/ui/choice-group.tsx";
import { TextArea } from "../../../components/ui/text-area.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { numberOrNull, type IntakeFields, type IntakeValues } from "../lib/intake-fields.ts";
import { FieldPair, IntakeSection } from "./intake-section.tsx";

type IntakeForm = UseFormReturn<IntakeFields, unknown, IntakeValues>;

const cycleChoices = engineCycles.map((cycle) => ({ value: cycle, label: `${cycle}-stroke` }));
const releaseLabels: Record<CompressionRelease, string> = { yes: "Yes", no: "No", unknown: "Not known" };
const releaseChoices = compressionReleaseValues.map((value) => ({ value, label: releaseLabels[value] }));
const tankChoices = tankContents.map((value) => ({ value, label: tankContentLabels[value] }));

function Unit({ children }: { children: string }) {
  return (
    <span aria-hidden="true" className="flex min-w-14 items-center justify-center rounded-lg bg-sunken px-3 text-lg font-semibold">
      {children}
    </span>
  );
}

export function EngineSection({ form }: { form: IntakeForm }) {
  const { register, control, formState: { errors } } = form;
  const number = { setValueAs: numberOrNull };
  return (
    <IntakeSection
      id="intake-engine"
      title="Engine"
      intro="Model, type and serial are on the engine's own label (often stamped on the shroud or block), not the unit's sticker. They are what pick the right parts."
    >
      <FieldPair>
        <TextField id="unit-engineModel" label="Engine model" autoComplete="off" autoCapitalize="characters" error={errors.unit?.engineModel?.message} {...register("unit.engineModel")} />
        <TextField id="unit-engineType" label="Engine type or spec code" autoComplete="off" autoCapitalize="characters" error={errors.unit?.engineType?.message} {...register("unit.engineType")} />
      </FieldPair>
      <TextField id="unit-engineSerial" label="Engine serial number" autoComplete="off" autoCapitalize="characters" error={errors.unit?.engineSerial?.message} {...register("unit.engineSerial")} />
      <Controller
        control={control}
        name="unit.cycle"
        render={({ field, fieldState }) => (
          <ChoiceGroup id="unit-cycle" name={field.name} legend="2-stroke or 4-stroke?" hint="A 2-stroke usually runs on premix and has no crankcase oil cap." needed minChoiceWidth="narrow" choices={cycleChoices} value={field.value} onChange={field.onChange} onBlur={field.onBlur} ref={field.ref} error={fieldState.error?.message} />
        )}
      />
      <FieldPair>
        <TextField id="unit-displacementCc" label="Displacement in cc" hint="Leave empty if it is not on the label." inputMode="decimal" autoComplete="off" trailing={<Unit>cc</Unit>} error={errors.unit?.displacementCc?.message} {...register("unit.displacementCc", number)} />
        <TextField id="unit-hours" label="Hour meter" hint="Leave empty if there is no meter." inputMode="decimal" autoComplete="off" trailing={<Unit>h</Unit>} error={errors.unit?.hours?.message} {...register("unit.hours", number)} />
      </FieldPair>
      <Controller
        control={control}
        name="unit.compressionRelease"
        render={({ field, fieldState }) => (
          <ChoiceGroup id="unit-compressionRelease" name={field.name} legend="Automatic compression release fitted?" hint="It makes a 4-stroke read low on a compression gauge." minChoiceWidth="narrow" choices={releaseChoices} value={field.value} onChange={field.onChange} onBlur={field.onBlur} ref={field.ref} error={fieldState.error?.message} />
        )}
      />
    </IntakeSection>
  );
}

export function ComplaintSection({ form }: { form: IntakeForm }) {
  const { register, control, formState: { errors } } = form;
  return (
    <IntakeSection id="intake-complaint" title="The complaint">
      <TextArea id="complaint" label="What the customer says is wrong" hint="In their words, e.g. “Pulls over but never catches.”" needed error={errors.complaint?.message} {...register("complaint")} />
      <TextArea id="alreadyTried" label="What they already tried" rows={2} error={errors.alreadyTried?.message} {...register("alreadyTried")} />
      <Controller
        control={control}
        name="tankContents"
        render={({ field, fieldState }) => (
          <ChoiceGroup id="tankContents" name={field.name} legend="What is in the tank?" needed choices={tankChoices} value={field.value} onChange={field.onChange} onBlur={field.onBlur} ref={field.ref} error={fieldState.error?.message} />
        )}
      />
    </IntakeSection>
  );
}
