import { useEffect, useState } from "react";
import { Controller, useForm, useWatch } from "react-hook-form";
import { useBlocker } from "react-router";
import {
  altitudeFromMetres,
  altitudeToMetres,
  altitudeUnit,
  settingsToForm,
  type Settings,
  type SettingsFormFields,
  type SettingsResponse,
} from "../../../../shared/schemas/settings.ts";
import type { UnitSystem } from "../../../../shared/equipment.ts";
import { Button } from "../../../components/ui/button.tsx";
import { ChoiceGroup } from "../../../components/ui/choice-group.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { TextArea } from "../../../components/ui/text-area.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { useUpdateSettings } from "../api/update-settings.ts";
import { serverFieldErrors, settingsResolver } from "../lib/settings-form.ts";
import { SettingsSection } from "./settings-section.tsx";

const yesNo = [
  { value: "yes", label: "Yes" },
  { value: "no", label: "No" },
] as const;
const systems = [
  { value: "imperial", label: "Imperial (psi, in, °F, ft)" },
  { value: "metric", label: "Metric (kPa, mm, °C, m)" },
] as const;

export function SettingsForm({ saved }: { saved: SettingsResponse }) {
  const update = useUpdateSettings();
  const [justSaved, setJustSaved] = useState(false);
  const [formProblem, setFormProblem] = useState<string | null>(null);
  const form = useForm<SettingsFormFields, unknown, Settings>({ resolver: settingsResolver, defaultValues: settingsToForm(saved), mode: "onTouched" });
  const { register, control, handleSubmit, setError, setValue, getValues, formState } = form;
  const { errors, isDirty, isSubmitting } = formState;
  const currency = useWatch({ control, name: "currency" }).trim().toUpperCase() || "—";
  const system = useWatch({ control, name: "defaultUnitSystem" });

  const blocker = useBlocker(isDirty && !isSubmitting);
  useEffect(() => {
    if (!isDirty) return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [isDirty]);

  const onSubmit = handleSubmit(async (values) => {
    setJustSaved(false);
    setFormProblem(null);
    try {
      // The form starts again from what the server stored, so it is no longer "changed".
      form.reset(settingsToForm(await update.mutateAsync(values)));
      setJustSaved(true);
    } catch (error) {
      if (isApiRequestError(error, "invalid_input")) {
        const { fields, form: others } = serverFieldErrors(error.details);
        fields.forEach(([name, message], i) => setError(name, { message }, { shouldFocus: i === 0 }));
        setFormProblem(others.length > 0 ? others.join(" ") : fields.length > 0 ? "The server wants some answers changed: each is marked beside its field." : error.message);
      } else if (isApiRequestError(error) && error.status === 403) setFormProblem("Only the shop lead can change the shop settings.");
      else setFormProblem("Not saved: Benchpath could not reach the shop's server. Everything you typed is still here; press Save again.");
    }
  });

  // Switching units keeps the same height above sea level, said in the new unit.
  const changeSystem = (next: UnitSystem) => {
    const text = getValues("altitude").trim();
    if (/^-?\d{1,5}$/.test(text) && next !== system) setValue("altitude", String(altitudeFromMetres(altitudeToMetres(Number(text), system), next)), { shouldDirty: true });
    setValue("defaultUnitSystem", next, { shouldDirty: true });
  };

  const err = (name: keyof SettingsFormFields) => errors[name]?.message;
  const unitTag = (text: string) => <span className="flex min-w-16 items-center justify-center rounded-lg border-2 border-line bg-sunken px-3 font-semibold">{text}</span>;

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="settings-title" className="flex max-w-4xl flex-col gap-6">
      <div className="flex flex-col gap-2">
        <h1 id="settings-title" className="text-step font-semibold">
          Shop settings
        </h1>
        <p className="max-w-[65ch] text-ink-muted">What the shop charges and prints, and the limits the bench and the review work to.</p>
      </div>
      {justSaved && !isDirty && (
        <p role="status" className="rounded-lg border-2 border-accent bg-accent-soft px-4 py-3 font-semibold">
          Settings saved.
        </p>
      )}
      {formProblem && <FormProblem title="Not saved yet.">{formProblem}</FormProblem>}

      <SettingsSection id="settings-shop" title="Shop and contact" summary="Printed on estimates and customer reports.">
        <TextField id="settings-name" label="Shop name" needed autoComplete="organization" error={err("name")} {...register("name")} />
        <div className="grid gap-5 landscape:grid-cols-2">
          <TextField id="settings-phone" label="Phone" type="tel" autoComplete="tel" error={err("phone")} {...register("phone")} />
          <TextField id="settings-email" label="E-mail" type="email" autoComplete="email" error={err("email")} {...register("email")} />
        </div>
        <TextArea id="settings-address" label="Address" rows={2} error={err("address")} {...register("address")} />
      </SettingsSection>

      <SettingsSection id="settings-money" title="Money" summary="Amounts as you would write them on a bill; the tax rate in percent.">
        <TextField
          id="settings-currency"
          label="Currency"
          hint="The three-letter ISO 4217 code, such as USD, CAD or EUR."
          autoCapitalize="characters"
          autoComplete="off"
          maxLength={3}
          className="max-w-xs"
          error={err("currency")}
          {...register("currency")}
        />
        <div className="grid gap-5 landscape:grid-cols-2">
          <TextField id="settings-labour-rate" label="Labour rate per hour" inputMode="decimal" error={err("labourRate")} trailing={unitTag(currency)} {...register("labourRate")} />
          <TextField id="settings-diagnostic-fee" label="Diagnostic fee" inputMode="decimal" error={err("diagnosticFee")} trailing={unitTag(currency)} {...register("diagnosticFee")} />
        </div>
        <Controller
          control={control}
          name="creditDiagnosticFee"
          render={({ field }) => (
            <ChoiceGroup
              id="settings-credit-fee"
              name={field.name}
              legend="Credit the diagnostic fee against the repair when the customer approves it?"
              minChoiceWidth="narrow"
              choices={yesNo}
              value={field.value ? "yes" : "no"}
              onChange={(v) => field.onChange(v === "yes")}
              onBlur={field.onBlur}
            />
          )}
        />
        <div className="grid gap-5 landscape:grid-cols-2 landscape:items-start">
          <TextField id="settings-tax" label="Tax rate" hint="Percent, up to two decimals, such as 8.25." inputMode="decimal" error={err("taxPercent")} trailing={unitTag("%")} {...register("taxPercent")} />
          <Controller
            control={control}
            name="taxLabour"
            render={({ field }) => (
              <ChoiceGroup
                id="settings-tax-labour"
                name={field.name}
                legend="Tax labour and the diagnostic fee too?"
                hint="Parts are always taxed."
                minChoiceWidth="narrow"
                choices={yesNo}
                value={field.value ? "yes" : "no"}
                onChange={(v) => field.onChange(v === "yes")}
                onBlur={field.onBlur}
              />
            )}
          />
        </div>
      </SettingsSection>

      <SettingsSection id="settings-units" title="Units and place" summary="The units new people start with, and the shop's height above sea level: compression readings fall with altitude.">
        <ChoiceGroup id="settings-unit-system" name="defaultUnitSystem" legend="Units for new people" choices={systems} value={system} onChange={changeSystem} />
        <TextField
          id="settings-altitude"
          label="Altitude of the shop"
          hint={`Height above sea level, in ${system === "imperial" ? "feet" : "metres"}.`}
          inputMode="numeric"
          className="max-w-sm"
          error={err("altitude")}
          trailing={unitTag(altitudeUnit(system))}
          {...register("altitude")}
        />
      </SettingsSection>

      <SettingsSection id="settings-estimates" title="Estimates" summary="How long an estimate can be answered, when to suggest replacing the unit, and the shop's own warranty.">
        <div className="grid gap-5 landscape:grid-cols-2 landscape:items-start">
          <TextField id="settings-estimate-days" label="Estimate stays valid for" inputMode="numeric" error={err("estimateValidDays")} trailing={unitTag("days")} {...register("estimateValidDays")} />
          <TextField
            id="settings-replace-threshold"
            label="Suggest replacing at"
            hint="A repair costing this share of a new unit or more."
            inputMode="numeric"
            error={err("replaceThresholdPercent")}
            trailing={unitTag("%")}
            {...register("replaceThresholdPercent")}
          />
        </div>
        <TextArea id="settings-warranty" label="Warranty note" hint="Printed on the customer report, such as how many days work and parts are covered and what is left out." rows={4} error={err("warrantyNote")} {...register("warrantyNote")} />
      </SettingsSection>

      <SettingsSection id="settings-review" title="Review" summary="When a check is flagged for the shop lead to look at twice.">
        <TextField
          id="settings-open-hours"
          label="Flag a check still open after"
          inputMode="numeric"
          className="max-w-sm"
          error={err("reviewOpenHours")}
          trailing={unitTag("hours")}
          {...register("reviewOpenHours")}
        />
      </SettingsSection>

      {blocker.state === "blocked" && (
        <div role="alertdialog" aria-labelledby="settings-leave" className="flex flex-col gap-3 rounded-xl border-2 border-problem bg-problem-soft px-5 py-4">
          <p id="settings-leave" className="font-semibold">
            The changes here are not saved. Leave without saving them?
          </p>
          <div className="flex flex-wrap gap-3">
            <Button variant="primary" onClick={() => blocker.reset()}>
              Stay and save
            </Button>
            <Button onClick={() => blocker.proceed()}>Leave without saving</Button>
          </div>
        </div>
      )}
      <div className="sticky bottom-0 -mx-2 flex flex-wrap items-center justify-end gap-4 border-t-2 border-line bg-surface px-2 py-4">
        {isDirty && !isSubmitting && <p className="text-ink-muted">Changes not saved yet.</p>}
        <Button type="submit" variant="primary" size="main" disabled={isSubmitting} className="min-w-64">
          {isSubmitting ? "Saving…" : "Save settings"}
        </Button>
      </div>
    </form>
  );
}
