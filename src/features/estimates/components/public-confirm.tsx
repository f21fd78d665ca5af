import { useState } from "react";
import type { PublicEstimate } from "../../../../shared/schemas/estimates.ts";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { TextArea } from "../../../components/ui/text-area.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { formatMoney } from "../lib/money.ts";

export type Pending = { kind: "approve"; option: PublicEstimate["options"][number] } | { kind: "decline" };

interface PublicConfirmProps {
  pending: Pending;
  currency: string;
  busy: boolean;
  error: unknown;
  onConfirm: (comment: string) => void;
  onBack: () => void;
}

/** The step before the answer is sent: what it means, an optional word to the shop, yes or go back. */
export function PublicConfirm({ pending, currency, busy, error, onConfirm, onBack }: PublicConfirmProps) {
  const [comment, setComment] = useState("");
  const approving = pending.kind === "approve";
  return (
    <section aria-labelledby="confirm-answer" className="flex flex-col gap-5 rounded-xl border-2 border-accent bg-raised px-4 py-5">
      <h2 id="confirm-answer" className="text-2xl font-semibold">
        {approving ? "Approve this repair?" : "Decline the estimate?"}
      </h2>
      {approving ? (
        <p className="text-lg">
          <strong>{pending.option.title}</strong> for <strong className="tabular-figures">{formatMoney(pending.option.totals.totalCents, currency)}</strong>, tax included. The shop starts once you confirm.
        </p>
      ) : (
        <p className="text-lg">The shop will not do the repair, and will be in touch about picking up the unit.</p>
      )}
      <TextArea id="answer-comment" label="A word for the shop (optional)" maxLength={1000} value={comment} onChange={(e) => setComment(e.target.value)} />
      {error !== null && error !== undefined && (
        <FormProblem title="Your answer did not reach the shop.">{isApiRequestError(error) && error.status !== 0 && error.id !== "unexpected_response" ? error.message : "Check your connection and press the button again."}</FormProblem>
      )}
      <button type="button" disabled={busy} onClick={() => onConfirm(comment.trim())} className="min-h-16 w-full rounded-lg border-2 border-accent bg-accent px-6 text-xl font-semibold text-accent-ink disabled:opacity-70">
        {busy ? "Sending your answer…" : approving ? "Yes, approve" : "Yes, decline"}
      </button>
      <button type="button" disabled={busy} onClick={onBack} className="min-h-14 w-full rounded-lg border-2 border-line-strong bg-raised px-6 text-lg font-semibold">
        Go back
      </button>
    </section>
  );
}
