import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { stepIdSchema } from "../../../../shared/flow/schema.ts";
import { Button } from "../../../components/ui/button.tsx";
import { SelectField } from "../../../components/ui/select-field.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { editorParse } from "../lib/form-messages.ts";
import { stepKindLabels } from "../lib/flow-words.ts";

const addableKinds = ["instruction", "choice", "reading", "finding"] as const;
export type AddableKind = (typeof addableKinds)[number];

interface AddStepFormProps {
  taken: readonly string[];
  /** An id typed as a target elsewhere, to start from. */
  initialId: string;
  onAdd: (id: string, kind: AddableKind) => void;
  onCancel: () => void;
}

export function AddStepForm({ taken, initialId, onAdd, onCancel }: AddStepFormProps) {
  const schema = z.object({
    kind: z.enum(addableKinds),
    id: stepIdSchema.refine((id) => !taken.includes(id), { error: "A step already has this id." }),
  });
  const { register, handleSubmit, formState: { errors } } = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema, editorParse),
    defaultValues: { kind: "instruction", id: initialId },
  });
  return (
    <form noValidate aria-label="Add a step" data-native-undo onSubmit={handleSubmit(({ id, kind }) => onAdd(id, kind))} className="flex flex-col gap-4 rounded-xl border-2 border-line px-4 py-4">
      <h2 className="text-xl font-semibold">Add a step</h2>
      <SelectField id="add-step-kind" label="Kind" autoFocus error={errors.kind?.message} {...register("kind")}>
        {addableKinds.map((kind) => (
          <option key={kind} value={kind}>
            {stepKindLabels[kind]}
          </option>
        ))}
      </SelectField>
      <TextField
        id="add-step-id"
        label="Id"
        hint="Lowercase words and hyphens, e.g. check-plug-gap"
        autoCapitalize="none"
        autoCorrect="off"
        spellCheck={false}
        autoComplete="off"
        error={errors.id?.message}
        {...register("id")}
      />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="primary">
          Add the step
        </Button>
        <Button onClick={onCancel}>Cancel</Button>
      </div>
    </form>
  );
}
