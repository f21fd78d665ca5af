import { get, type FieldErrors } from "react-hook-form";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { fieldId, intakeFields, type IntakeFieldName, type IntakeFields } from "../lib/intake-fields.ts";

interface IntakeSummaryProps {
  errors: FieldErrors<IntakeFields>;
  onGoTo: (name: IntakeFieldName) => void;
}

/** At the top of a long form: how many answers need fixing, and a way straight to the first. */
export function IntakeSummary({ errors, onGoTo }: IntakeSummaryProps) {
  const bad = intakeFields.filter(([name]) => Boolean((get(errors, name) as { message?: string } | undefined)?.message));
  const first = bad[0];
  if (!first) return null;
  const [name, label] = first;
  const count = bad.length === 1 ? "One answer needs" : `${bad.length} answers need`;
  return (
    <FormProblem title={`${count} fixing before this unit can be checked in.`}>
      <a
        href={`#${fieldId(name)}`}
        onClick={(event) => {
          event.preventDefault();
          onGoTo(name);
        }}
        className="inline-flex min-h-12 items-center font-semibold text-accent underline decoration-2 underline-offset-4"
      >
        Go to the first: {label}
      </a>
    </FormProblem>
  );
}
