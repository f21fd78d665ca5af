import { useId, useState } from "react";
import { noteEventSchema } from "../../../../shared/schemas/sessions.ts";
import { Button } from "../../../components/ui/button.tsx";
import { TextArea } from "../../../components/ui/text-area.tsx";

/** An optional short note on the step, closed until asked for: typing at the bench is slow. */
export function StepNote({ stepId, notes, onAdd }: { stepId: string; notes: readonly string[]; onAdd: (text: string) => string | null }) {
  const id = useId();
  const [open, setOpen] = useState(false);
  const [text, setText] = useState("");
  const [error, setError] = useState<string | undefined>();
  const add = () => {
    const parsed = noteEventSchema.shape.text.safeParse(text);
    if (!parsed.success) return setError(text.trim() === "" ? "Write the note first, or close it." : "Keep the note under 500 characters.");
    const refused = onAdd(parsed.data);
    if (refused) return setError(refused);
    setText("");
    setError(undefined);
    setOpen(false);
  };
  return (
    <div className="flex max-w-[70ch] flex-col gap-3">
      {notes.map((note, index) => (
        <p key={`${stepId}-${index}`} className="rounded-lg bg-sunken px-4 py-2 text-base">
          Note: {note}
        </p>
      ))}
      {open ? (
        <>
          <TextArea id={id} label="Note on this step (optional)" value={text} onChange={(e) => setText(e.target.value)} error={error} rows={2} maxLength={500} />
          <div className="flex gap-3">
            <Button onClick={add}>Keep the note</Button>
            <Button variant="quiet" onClick={() => setOpen(false)}>
              Close
            </Button>
          </div>
        </>
      ) : (
        <Button className="self-start" onClick={() => setOpen(true)}>
          Add a note
        </Button>
      )}
    </div>
  );
}
