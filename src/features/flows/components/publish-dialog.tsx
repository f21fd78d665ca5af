import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { publishRequestSchema } from "../../../../shared/schemas/flows.ts";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog } from "../../../components/ui/dialog.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { TextArea } from "../../../components/ui/text-area.tsx";
import { publishProblemsOf, usePublishFlow } from "../api/publish-flow.ts";
import { editorParse } from "../lib/form-messages.ts";
import { ProblemList } from "./problem-list.tsx";

const noteSchema = publishRequestSchema.pick({ note: true });
const resolver = zodResolver(noteSchema, editorParse);

interface PublishDialogProps {
  flowId: string;
  /** The number the published version will have. */
  nextVersion: number;
  /** Saves what is unsaved first; null when the draft could not be saved. */
  flush: () => Promise<number | null>;
  onClose: () => void;
  onPublished: (version: number) => void;
}

export function PublishDialog({ flowId, nextVersion, flush, onClose, onPublished }: PublishDialogProps) {
  const publish = usePublishFlow(flowId);
  const [notSaved, setNotSaved] = useState(false);
  const { register, handleSubmit, formState } = useForm<z.input<typeof noteSchema>, unknown, z.output<typeof noteSchema>>({ resolver, defaultValues: { note: "" } });

  const onSubmit = handleSubmit(async ({ note }) => {
    setNotSaved(false);
    publish.reset();
    const revision = await flush();
    if (revision === null) {
      setNotSaved(true);
      return;
    }
    try {
      const version = await publish.mutateAsync({ revision, note });
      onPublished(version.number);
    } catch {
      // Shown below from the mutation's error.
    }
  });

  const refused = publishProblemsOf(publish.error);
  return (
    <Dialog title={`Publish this draft as version ${nextVersion}`} onClose={onClose}>
      <p className="max-w-[65ch]">Publishing makes the draft version {nextVersion} of the flow: new bench sessions start on it. Sessions already running keep the version they began on.</p>
      <form noValidate onSubmit={onSubmit} data-native-undo className="flex flex-col gap-5">
        {notSaved && <FormProblem title="Not published: the draft could not be saved first.">Your changes are kept; see the save status, then try again.</FormProblem>}
        {publish.error && (
          <FormProblem title="The server did not publish the draft.">
            <p>{publish.error.message}</p>
            {refused && refused.length > 0 && <ProblemList problems={refused} />}
          </FormProblem>
        )}
        <TextArea id="publish-note" label="What changed in this version" hint="Techs and the shop lead read this in the history" needed autoFocus error={formState.errors.note?.message} {...register("note")} />
        <div className="flex flex-wrap gap-3">
          <Button type="submit" variant="primary" disabled={formState.isSubmitting}>
            {formState.isSubmitting ? "Publishing…" : "Publish"}
          </Button>
          <Button onClick={onClose}>Cancel</Button>
        </div>
      </form>
    </Dialog>
  );
}
