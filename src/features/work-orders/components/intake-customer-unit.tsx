import { Controller, type UseFormReturn } from "react-hook-form";
import { equipmentKindLabels, equipmentKinds } from "../../../../shared/equipment.ts";
import { ChoiceGroup } from "../../../components/ui/choice-group.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import type { IntakeFields, IntakeValues } from "../lib/intake-fields.ts";
import { FieldPair, IntakeSection } from "./intake-section.tsx";

type IntakeForm = UseFormReturn<IntakeFields, unknown, IntakeValues>;

const kindChoices = equipmentKinds.map((kind) => ({ value: kind, label: equipmentKindLabels[kind] }));

export function CustomerSection({ form }: { form: IntakeForm }) {
  const { register, formState: { errors } } = form;
  return (
    <IntakeSection id="intake-customer" title="Customer">
      <TextField id="customer-name" label="Customer's name" needed autoComplete="off" error={errors.customer?.name?.message} {...register("customer.name")} />
      <FieldPair>
        <TextField id="customer-phone" label="Phone" type="tel" inputMode="tel" autoComplete="off" error={errors.customer?.phone?.message} {...register("customer.phone")} />
        <TextField
          id="customer-email"
          label="E-mail"
          type="email"
          inputMode="email"
          autoCapitalize="none"
          autoCorrect="off"
          spellCheck={false}
          autoComplete="off"
          error={errors.customer?.email?.message}
          {...register("customer.email")}
        />
      </FieldPair>
    </IntakeSection>
  );
}

export function EquipmentSection({ form }: { form: IntakeForm }) {
  const { register, control, formState: { errors } } = form;
  return (
    <IntakeSection id="intake-equipment" title="Equipment" intro="Make and model exactly as printed on the unit's own sticker or casting.">
      <Controller
        control={control}
        name="unit.equipmentKind"
        render={({ field, fieldState }) => (
          <ChoiceGroup
            id="unit-equipmentKind"
            name={field.name}
            legend="What kind of equipment is it?"
            needed
            choices={kindChoices}
            value={field.value}
            onChange={field.onChange}
            onBlur={field.onBlur}
            ref={field.ref}
            error={fieldState.error?.message}
          />
        )}
      />
      <FieldPair>
        <TextField id="unit-make" label="Make" needed autoComplete="off" error={errors.unit?.make?.message} {...register("unit.make")} />
        <TextField id="unit-model" label="Model" needed autoComplete="off" autoCapitalize="characters" error={errors.unit?.model?.message} {...register("unit.model")} />
      </FieldPair>
    </IntakeSection>
  );
}
