import { useState } from "react";
import { sendEstimateRequestSchema, type EstimateView } from "../../../../shared/schemas/estimates.ts";
import { Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { whenWords } from "../lib/when.ts";

interface SendPanelProps {
  estimate: EstimateView;
  customerEmail: string;
  busy: boolean;
  /** The button's words when nothing has been tried yet. */
  label: string;
  size?: "main" | "regular";
  /** Resolves once the estimate is saved and the send answered; the problem, if any, is shown by the caller. */
  onSend: (to: string) => void;
}

/** Where the e-mail goes, the button, and how the last try went: sent to whom and when, or why it did not go. */
export function SendPanel({ estimate, customerEmail, busy, label, size = "main", onSend }: SendPanelProps) {
  const [to, setTo] = useState(estimate.lastSend?.to ?? customerEmail);
  const [error, setError] = useState<string | undefined>();
  const failed = estimate.lastSend?.status === "failed" ? estimate.lastSend : null;

  const send = () => {
    const parsed = sendEstimateRequestSchema.safeParse({ to });
    if (!parsed.success) return setError(parsed.error.issues[0]?.message);
    setError(undefined);
    onSend(parsed.data.to);
  };

  return (
    <div className="flex flex-col gap-4">
      {failed && (
        <FormProblem title={`The e-mail to ${failed.to} did not go out (${whenWords(failed.at)}).`}>
          <p>{failed.error}</p>
          <p>Nothing was sent to the customer. Check the address and the shop's mail settings, then send again.</p>
        </FormProblem>
      )}
      <TextField id={`send-to-${estimate.id}`} label="Customer's e-mail" type="email" autoComplete="off" value={to} error={error} onChange={(e) => setTo(e.target.value)} />
      <Button variant="primary" size={size} className="self-start" disabled={busy} onClick={send}>
        {busy ? "Sending…" : failed ? "Send again" : label}
      </Button>
    </div>
  );
}
