import { useState } from "react";
import type { QueryKey } from "@tanstack/react-query";
import type { EstimateView } from "../../../../shared/schemas/estimates.ts";
import { Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { StatePill, type StateShape } from "../../../components/ui/state-pill.tsx";
import { useReviseEstimate } from "../api/revise-estimate.ts";
import { useSendEstimate } from "../api/send-estimate.ts";
import { formatMoney } from "../lib/money.ts";
import { dayWords, whenWords } from "../lib/when.ts";
import { OptionTotals } from "./option-totals.tsx";
import { problemWords } from "./problem-words.ts";
import { SendPanel } from "./send-panel.tsx";

const statusWords: Record<Exclude<EstimateView["status"], "draft">, [StateShape, string]> = {
  sent: ["waiting", "Sent, waiting for the customer"],
  approved: ["yes", "Approved by the customer"],
  declined: ["no", "Declined by the customer"],
  superseded: ["gone", "Replaced by a revision"],
};

/** A sent estimate as it went out: frozen, with what happened to it and what can be done next. */
export function EstimateSheet({ estimate, customerEmail, workOrderKey }: { estimate: EstimateView; customerEmail: string; workOrderKey: QueryKey }) {
  const revise = useReviseEstimate(estimate.workOrderId, estimate.id);
  const send = useSendEstimate(estimate.workOrderId, estimate.id, workOrderKey);
  const [resending, setResending] = useState(false);
  const [shape, words] = statusWords[estimate.status as keyof typeof statusWords];
  const approved = estimate.options.find((o) => o.id === estimate.approvedOptionId);

  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-col gap-2">
        <div className="flex flex-wrap items-center gap-3">
          <StatePill shape={shape}>{words}</StatePill>
          <span className="text-ink-muted">Revision {estimate.revision}</span>
        </div>
        {estimate.sentAt && (
          <p>
            Sent to {estimate.lastSend?.status === "sent" ? estimate.lastSend.to : "the customer"} at {whenWords(estimate.sentAt)}
            {estimate.sentByName ? ` by ${estimate.sentByName}` : ""}.
            {estimate.status === "sent" && estimate.validUntil ? ` The customer can answer until ${dayWords(estimate.validUntil)}.` : ""}
          </p>
        )}
        {estimate.status === "approved" && approved && (
          <p className="text-lg">
            The customer approved <strong>{approved.title}</strong> for {formatMoney(approved.totals.totalCents, estimate.currency)}
            {estimate.decidedAt ? ` on ${whenWords(estimate.decidedAt)}` : ""}.
          </p>
        )}
        {estimate.status === "declined" && (
          <p className="text-lg">
            The customer declined{estimate.decidedAt ? ` on ${whenWords(estimate.decidedAt)}` : ""}.{estimate.customerComment ? ` They wrote: “${estimate.customerComment}”` : ""}
          </p>
        )}
      </div>

      <ul className="flex flex-col gap-4">
        {estimate.options.map((option, i) => (
          <li key={option.id} className={`flex flex-col gap-3 rounded-xl border-2 bg-raised px-5 py-4 ${option.id === estimate.approvedOptionId ? "border-accent" : "border-line-strong"}`}>
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h3 className="text-lg font-semibold">
                Option {i + 1}: {option.title}
              </h3>
              {option.id === estimate.approvedOptionId && <StatePill shape="yes">Approved</StatePill>}
            </div>
            {option.parts.length > 0 && (
              <ul className="flex flex-col gap-1 tabular-figures">
                {option.parts.map((p, j) => (
                  <li key={j}>
                    {p.quantity} × {p.partNumber ? `${p.partNumber} ` : ""}
                    {p.description} at {formatMoney(p.unitPriceCents, estimate.currency)}
                  </li>
                ))}
              </ul>
            )}
            <OptionTotals estimate={estimate} totals={option.totals} labourHours={String(option.labourHours)} />
            {option.repairOrReplace && <p className="font-medium">{option.repairOrReplace.sentence}</p>}
          </li>
        ))}
      </ul>
      {estimate.note && <p>Note for the customer: {estimate.note}</p>}

      {revise.isError && <FormProblem title="The revision did not start.">{problemWords(revise.error)}</FormProblem>}
      {send.isError && <FormProblem title="The estimate was not sent.">{problemWords(send.error)}</FormProblem>}
      {(estimate.status === "sent" || estimate.status === "declined") && (
        <div className="flex flex-wrap gap-4">
          <Button variant="primary" disabled={revise.isPending} onClick={() => revise.mutate()}>
            {revise.isPending ? "Starting the revision…" : "Revise the estimate"}
          </Button>
          {estimate.status === "sent" && !resending && <Button onClick={() => setResending(true)}>Send the e-mail again</Button>}
        </div>
      )}
      {estimate.status === "sent" && (resending || estimate.lastSend?.status === "failed") && (
        <SendPanel estimate={estimate} customerEmail={customerEmail} busy={send.isPending} size="regular" label="Send again with a new link" onSend={(to) => send.mutate(to)} />
      )}
    </div>
  );
}
