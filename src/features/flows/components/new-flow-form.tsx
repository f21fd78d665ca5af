import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { useNavigate } from "react-router";
import type { z } from "zod";
import { createFlowRequestSchema } from "../../../../shared/schemas/flows.ts";
import { Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { useCreateFlow } from "../api/create-flow.ts";
import { flowPath } from "../api/keys.ts";
import { editorParse } from "../lib/form-messages.ts";

type Fields = z.input<typeof createFlowRequestSchema>;
type Values = z.output<typeof createFlowRequestSchema>;

const resolver = zodResolver(createFlowRequestSchema, editorParse);

export function NewFlowForm({ onCancel }: { onCancel: () => void }) {
  const navigate = useNavigate();
  const create = useCreateFlow();
  const { register, handleSubmit, setError, formState } = useForm<Fields, unknown, Values>({ resolver, defaultValues: { id: "", title: "" } });
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (values) => {
    try {
      await navigate(flowPath(await create.mutateAsync(values)));
    } catch (error) {
      if (isApiRequestError(error, "flow_exists")) setError("id", { message: error.message }, { shouldFocus: true });
      else if (isApiRequestError(error, "invalid_input")) showFieldErrors(error.details, setError);
    }
  });
  const other = create.error && !isApiRequestError(create.error, "flow_exists") && !isApiRequestError(create.error, "invalid_input");

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="new-flow-title" className="flex flex-col gap-5 rounded-xl border-2 border-line bg-raised/60 px-5 py-5">
      <h2 id="new-flow-title" className="text-2xl font-semibold">
        New flow
      </h2>
      {other && <FormProblem title="The flow was not made.">{create.error.message}</FormProblem>}
      <div className="grid gap-5 landscape:grid-cols-2">
        <TextField
          id="new-flow-id"
          label="Id"
          hint="Lowercase words joined by hyphens, e.g. tiller-no-start; it cannot change later"
          needed
          autoCapitalize="none"
          autoCorrect="off"
          spellCheck={false}
          autoComplete="off"
          error={errors.id?.message}
          {...register("id")}
        />
        <TextField id="new-flow-title-field" label="Title" hint="What the check is for, e.g. Tiller: will not start" needed autoComplete="off" error={errors.title?.message} {...register("title")} />
      </div>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="primary" disabled={isSubmitting}>
          {isSubmitting ? "Making the flow…" : "Make the flow"}
        </Button>
        <Button onClick={onCancel}>Cancel</Button>
      </div>
    </form>
  );
}

function showFieldErrors(details: unknown, setError: (name: keyof Fields, error: { message: string }) => void) {
  const fieldErrors = (details as { fieldErrors?: Record<string, string[] | undefined> } | null)?.fieldErrors ?? {};
  for (const name of ["id", "title"] as const) {
    const message = fieldErrors[name]?.[0];
    if (message) setError(name, { message });
  }
}
