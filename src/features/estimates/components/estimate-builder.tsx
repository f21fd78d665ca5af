import { useState } from "react";
import type { QueryKey } from "@tanstack/react-query";
import type { EstimateView } from "../../../../shared/schemas/estimates.ts";
import { Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { TextArea } from "../../../components/ui/text-area.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { useSaveEstimate } from "../api/save-estimate.ts";
import { useSendEstimate } from "../api/send-estimate.ts";
import { draftFrom, emptyOption, fieldName, readDraft, type EstimateDraft } from "../lib/estimate-form.ts";
import { formatMoney } from "../lib/money.ts";
import { OptionEditor } from "./option-editor.tsx";
import { problemWords } from "./problem-words.ts";
import { SendPanel } from "./send-panel.tsx";

interface EstimateBuilderProps {
  estimate: EstimateView;
  customerEmail: string;
  workOrderKey: QueryKey;
}

/** The draft's working copy: options with parts and labour, live totals, saved on request and saved again before it is sent. */
export function EstimateBuilder({ estimate, customerEmail, workOrderKey }: EstimateBuilderProps) {
  const [draft, setDraft] = useState<EstimateDraft>(() => draftFrom(estimate));
  const [dirty, setDirty] = useState(false);
  const [tried, setTried] = useState(false);
  const save = useSaveEstimate(estimate.workOrderId, estimate.id);
  const send = useSendEstimate(estimate.workOrderId, estimate.id, workOrderKey);
  const { request, errors } = readDraft(draft);
  // A field's message shows once it has been typed in, or once a save was tried.
  const [touched, setTouched] = useState<Set<string>>(new Set());
  const shown = Object.fromEntries(Object.entries(errors).filter(([name]) => tried || touched.has(name)));

  const change = (next: EstimateDraft) => {
    const before = readDraft(draft).errors;
    const after = readDraft(next).errors;
    const names = new Set([...Object.keys(before), ...Object.keys(after)].filter((name) => before[name] !== after[name]));
    if (names.size > 0) setTouched((t) => new Set([...t, ...names]));
    setDraft(next);
    setDirty(true);
  };

  const saveNow = async (): Promise<boolean> => {
    setTried(true);
    if (!request) return false;
    if (!dirty) return true;
    try {
      const saved = await save.mutateAsync(request);
      setDraft(draftFrom(saved));
      setDirty(false);
      return true;
    } catch {
      return false;
    }
  };

  const sendNow = async (to: string) => {
    if (!(await saveNow())) return;
    send.mutate(to);
  };

  const serverFieldProblems = isApiRequestError(save.error, "invalid_input") ? Object.values((save.error.details as { fieldErrors?: Record<string, string[]> } | undefined)?.fieldErrors ?? {}).flat() : [];
  const setOption = (i: number, option: EstimateDraft["options"][number]) => change({ ...draft, options: draft.options.map((o, j) => (j === i ? option : o)) });

  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-col gap-1">
        <p className="text-lg">
          Draft, revision {estimate.revision}
          {estimate.findingTitle && (
            <>
              {" "}
              — from the finding <strong>{estimate.findingTitle}</strong>
            </>
          )}
        </p>
        <p className="text-ink-muted tabular-figures">
          Labour {formatMoney(estimate.rates.labourRateCents, estimate.currency)} an hour; diagnostic fee {formatMoney(estimate.rates.diagnosticFeeCents, estimate.currency)}
          {estimate.rates.creditDiagnosticFee ? ", credited to the repair" : ""}. Rates as set when the estimate was started.
        </p>
      </div>

      {draft.options.map((option, i) => (
        <OptionEditor
          key={option.key}
          index={i}
          option={option}
          estimate={estimate}
          replacementPrice={draft.replacementPrice}
          errors={shown}
          onChange={(next) => setOption(i, next)}
          onRemove={draft.options.length > 1 ? () => change({ ...draft, options: draft.options.filter((_, j) => j !== i) }) : undefined}
        />
      ))}
      <Button className="self-start" onClick={() => change({ ...draft, options: [...draft.options, emptyOption()] })} disabled={draft.options.length >= 10}>
        Add another option
      </Button>

      <div className="grid gap-5 landscape:grid-cols-2">
        <TextField
          id={`replacement-${estimate.id}`}
          label="Price of a new unit"
          hint="Leave empty to skip the repair-or-replace line."
          inputMode="decimal"
          value={draft.replacementPrice}
          error={shown[fieldName.replacementPrice]}
          onChange={(e) => change({ ...draft, replacementPrice: e.target.value })}
        />
        <TextArea id={`note-${estimate.id}`} label="Note for the customer" value={draft.note} error={shown[fieldName.note]} onChange={(e) => change({ ...draft, note: e.target.value })} />
      </div>

      {tried && !request && <FormProblem title="Some fields need attention.">Each one says what is wrong beside it.</FormProblem>}
      {save.isError && (
        <FormProblem title="The estimate was not saved.">{serverFieldProblems.length > 0 ? serverFieldProblems.join(" ") : problemWords(save.error)}</FormProblem>
      )}
      {send.isError && <FormProblem title="The estimate was not sent.">{problemWords(send.error)}</FormProblem>}

      <div className="flex flex-wrap items-center gap-4">
        <Button disabled={save.isPending} onClick={() => void saveNow()}>
          {save.isPending ? "Saving…" : "Save the draft"}
        </Button>
        <p role="status" className="text-ink-muted">
          {dirty ? "Changes not saved yet." : "Saved."}
        </p>
      </div>
      <div className="flex flex-col gap-3 border-t-2 border-line pt-5">
        <h3 className="text-xl font-semibold">Send to the customer</h3>
        <p>The customer gets the options and totals by e-mail, with a link to approve one or decline.</p>
        <SendPanel estimate={estimate} customerEmail={customerEmail} busy={save.isPending || send.isPending} label="Save and send the estimate" onSend={(to) => void sendNow(to)} />
      </div>
    </div>
  );
}
