import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { stepIdSchema } from "../../../../shared/flow/schema.ts";
import { Button } from "../../../components/ui/button.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { editorParse } from "../lib/form-messages.ts";

interface RenameStepFormProps {
  currentId: string;
  taken: readonly string[];
  onRename: (to: string) => void;
  onCancel: () => void;
}

export function RenameStepForm({ currentId, taken, onRename, onCancel }: RenameStepFormProps) {
  const schema = z.object({
    id: stepIdSchema.refine((id) => id === currentId || !taken.includes(id), { error: "Another step already has this id." }),
  });
  const { register, handleSubmit, formState: { errors } } = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema, editorParse),
    defaultValues: { id: currentId },
  });
  return (
    <form
      noValidate
      aria-label="Rename the step"
      data-native-undo
      onSubmit={handleSubmit(({ id }) => (id === currentId ? onCancel() : onRename(id)))}
      className="flex flex-col gap-3 rounded-lg border-2 border-line px-4 py-4"
    >
      <TextField
        id="rename-step-id"
        label="New id"
        hint="Every step that leads here, and the start, follow the new id"
        autoCapitalize="none"
        autoCorrect="off"
        spellCheck={false}
        autoComplete="off"
        autoFocus
        error={errors.id?.message}
        {...register("id")}
      />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="primary">
          Rename
        </Button>
        <Button onClick={onCancel}>Cancel</Button>
      </div>
    </form>
  );
}
