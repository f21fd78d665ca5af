import { useId, useState } from "react";
import { abandonSessionRequestSchema } from "../../../../shared/schemas/sessions.ts";
import { Button } from "../../../components/ui/button.tsx";
import { TextArea } from "../../../components/ui/text-area.tsx";
import { useAbandonSession } from "../api/end-session.ts";

/** Stopping a check for good: a small action that asks why, in a dialog of its own. */
export function AbandonCheck({ sessionId }: { sessionId: string }) {
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | undefined>();
  const abandon = useAbandonSession(sessionId);
  const titleId = useId();
  const fieldId = useId();
  const submit = () => {
    const parsed = abandonSessionRequestSchema.safeParse({ reason });
    if (!parsed.success) return setError(parsed.error.issues[0]?.message);
    setError(undefined);
    abandon.mutate(parsed.data.reason, { onError: (e) => setError(e instanceof Error ? e.message : "The check could not be stopped. Try again.") });
  };
  if (!open) {
    return (
      <Button variant="quiet" onClick={() => setOpen(true)}>
        Abandon this check
      </Button>
    );
  }
  return (
    <div className="fixed inset-0 z-20 flex items-center justify-center bg-ink/50 p-4">
      <div role="dialog" aria-modal="true" aria-labelledby={titleId} className="flex w-full max-w-xl flex-col gap-4 rounded-xl bg-raised p-6">
        <h2 id={titleId} className="text-2xl font-semibold">Abandon this check?</h2>
        <p className="text-base">The answers so far are kept for the shop lead. Say why the check stops here.</p>
        <TextArea id={fieldId} label="Why it stops" value={reason} onChange={(e) => setReason(e.target.value)} error={error} rows={2} autoFocus />
        <div className="flex flex-wrap justify-between gap-4">
          <Button variant="primary" onClick={() => setOpen(false)}>
            Keep going with the check
          </Button>
          <Button onClick={submit} disabled={abandon.isPending}>
            {abandon.isPending ? "Abandoning…" : "Abandon the check"}
          </Button>
        </div>
      </div>
    </div>
  );
}
