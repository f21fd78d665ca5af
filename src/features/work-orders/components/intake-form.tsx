import { useState } from "react";
import { useForm } from "react-hook-form";
import { useNavigate } from "react-router";
import { Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { useCreateWorkOrder } from "../api/create-work-order.ts";
import { useUploadIntakePhoto } from "../api/upload-intake-photo.ts";
import { emptyIntake, isIntakeField, type IntakeFieldName, type IntakeFields, type IntakeValues } from "../lib/intake-fields.ts";
import { describeIntakeProblem, invalidInputDetails } from "../lib/intake-problem.ts";
import { intakeResolver } from "../lib/intake-resolver.ts";
import { workOrderPath } from "../lib/work-order-words.ts";
import { CustomerSection, EquipmentSection } from "./intake-customer-unit.tsx";
import { ComplaintSection, EngineSection } from "./intake-engine-complaint.tsx";
import { IntakeSection } from "./intake-section.tsx";
import { IntakeSummary } from "./intake-summary.tsx";
import { PhotoPicker } from "./photo-picker.tsx";

/** Said on the detail screen when the work order was made but its photo did not arrive. */
export interface IntakeArrival {
  photoNotSaved: boolean;
}

export function IntakeForm() {
  const navigate = useNavigate();
  const create = useCreateWorkOrder();
  const upload = useUploadIntakePhoto();
  const [photo, setPhoto] = useState<File | null>(null);
  const form = useForm<IntakeFields, unknown, IntakeValues>({
    resolver: intakeResolver,
    defaultValues: emptyIntake,
  });
  const { handleSubmit, setError, setFocus, formState } = form;
  const [serverFieldsShown, setServerFieldsShown] = useState(false);

  const onSubmit = handleSubmit(async (values) => {
    setServerFieldsShown(false);
    let detail;
    try {
      detail = await create.mutateAsync(values);
    } catch (error) {
      if (isApiRequestError(error, "invalid_input")) setServerFieldsShown(showServerFieldErrors(error.details, setError));
      return;
    }
    let photoNotSaved = false;
    if (photo) photoNotSaved = await upload.mutateAsync({ workOrderId: detail.id, photo }).then(() => false, () => true);
    const arrival: IntakeArrival = { photoNotSaved };
    await navigate(workOrderPath(detail.id), { state: arrival });
  });

  const busy = formState.isSubmitting;
  const problem = create.error ? describeIntakeProblem(create.error, serverFieldsShown) : null;

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="intake-title" className="flex max-w-5xl flex-col gap-6">
      <div className="flex flex-col gap-2">
        <h1 id="intake-title" className="text-step font-semibold">
          Check in a unit
        </h1>
        <p className="max-w-[65ch] text-ink-muted">Ask the customer, then read the unit. Answers marked “needed” must be filled in.</p>
      </div>
      <IntakeSummary errors={formState.errors} onGoTo={(name: IntakeFieldName) => setFocus(name)} />
      {problem && <FormProblem title={problem.title}>{problem.body}</FormProblem>}
      <CustomerSection form={form} />
      <EquipmentSection form={form} />
      <EngineSection form={form} />
      <ComplaintSection form={form} />
      <IntakeSection id="intake-photo" title="Photo of the unit as received">
        <PhotoPicker
          label="Take a photo"
          hint="One photo of the whole unit before anyone touches it: it records damage and missing parts. You can leave it out."
          photo={photo}
          onChange={setPhoto}
          disabled={busy}
        />
      </IntakeSection>
      <div className="sticky bottom-0 -mx-2 flex flex-wrap items-center justify-end gap-4 border-t-2 border-line bg-surface px-2 py-4">
        {busy && <p className="text-ink-muted">{create.isPending ? "Saving the work order…" : "Saving the photo…"}</p>}
        <Button type="submit" variant="primary" size="main" disabled={busy} className="min-w-64">
          {busy ? "Checking in…" : "Check in"}
        </Button>
      </div>
    </form>
  );
}

// The server names fields by dotted path; only paths the form shows can be marked beside a field.
function showServerFieldErrors(details: unknown, setError: (name: IntakeFieldName, error: { message: string }, options: { shouldFocus: boolean }) => void) {
  const { fieldErrors } = invalidInputDetails(details);
  let shown = false;
  for (const [path, messages] of Object.entries(fieldErrors)) {
    const message = messages[0];
    if (!message || !isIntakeField(path)) continue;
    setError(path, { message }, { shouldFocus: !shown });
    shown = true;
  }
  return shown;
}
