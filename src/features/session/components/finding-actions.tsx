import { Button } from "../../../components/ui/button.tsx";
import { FieldError } from "../../../components/ui/field-error.tsx";
import { useCompleteSession } from "../api/end-session.ts";
import type { SaveState } from "../lib/use-session-runner.ts";

/** Sends the finished check to the shop lead, once every answer has reached the server. */
export function FindingActions({ sessionId, save }: { sessionId: string; save: SaveState }) {
  const complete = useCompleteSession(sessionId);
  const unsaved = save.kind !== "saved";
  return (
    <div className="flex max-w-[70ch] flex-col gap-3">
      {unsaved && <p className="text-base">The check can be completed once every answer is saved.</p>}
      <Button variant="primary" size="main" className="self-start" disabled={unsaved || complete.isPending} onClick={() => complete.mutate()}>
        {complete.isPending ? "Completing…" : "Complete the check"}
      </Button>
      {complete.isError && <FieldError id={`${sessionId}-complete-error`} message={complete.error.message} />}
    </div>
  );
}
