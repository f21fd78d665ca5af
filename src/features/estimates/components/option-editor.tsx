import type { EstimateView } from "../../../../shared/schemas/estimates.ts";
import { Button } from "../../../components/ui/button.tsx";
import { emptyPart, fieldName, optionFigures, type FieldErrors, type OptionDraft, type PartDraft } from "../lib/estimate-form.ts";
import { formatMoney, parseAmount, parsePrice } from "../lib/money.ts";
import { CellInput } from "./cell-input.tsx";
import { OptionTotals } from "./option-totals.tsx";

interface OptionEditorProps {
  index: number;
  option: OptionDraft;
  estimate: EstimateView;
  replacementPrice: string;
  errors: FieldErrors;
  onChange: (option: OptionDraft) => void;
  onRemove?: () => void;
}

const partColumns = "grid grid-cols-[7rem_minmax(0,1fr)_5rem_6.5rem_5.5rem_3rem] items-start gap-2";

/** One option put to the customer: its name, labour hours and parts lines, and its total as it is typed. */
export function OptionEditor({ index, option, estimate, replacementPrice, errors, onChange, onRemove }: OptionEditorProps) {
  const id = `option-${option.key}`;
  const figures = optionFigures(estimate, option, replacementPrice);
  const setPart = (p: number, patch: Partial<PartDraft>) => onChange({ ...option, parts: option.parts.map((part, i) => (i === p ? { ...part, ...patch } : part)) });

  return (
    <fieldset aria-label={`Option ${index + 1}`} className="flex flex-col gap-4 rounded-xl border-2 border-line-strong bg-raised px-5 py-4">
      <legend className="px-1 text-lg font-semibold text-ink-muted">Option {index + 1}</legend>
      <div className="grid grid-cols-[minmax(0,1fr)_10rem] items-start gap-4">
        <CellInput id={`${id}-title`} label="What the repair is" showLabel value={option.title} error={errors[fieldName.title(index)]} onChange={(e) => onChange({ ...option, title: e.target.value })} />
        <CellInput
          id={`${id}-hours`}
          label="Labour hours"
          showLabel
          inputMode="decimal"
          value={option.labourHours}
          error={errors[fieldName.labourHours(index)]}
          onChange={(e) => onChange({ ...option, labourHours: e.target.value })}
        />
      </div>

      <div className="flex flex-col gap-2">
        <h3 className="font-semibold">Parts</h3>
        {option.parts.length === 0 ? (
          <p className="text-ink-muted">No parts on this option.</p>
        ) : (
          <>
            <div aria-hidden="true" className={`${partColumns} text-base text-ink-muted`}>
              <span>Part number</span>
              <span>Description</span>
              <span>Quantity</span>
              <span>Unit price</span>
              <span className="text-right">Amount</span>
              <span />
            </div>
            {option.parts.map((part, p) => {
              const quantity = parseAmount(part.quantity, "quantity").value;
              const price = parsePrice(part.price).value;
              const amount = quantity !== undefined && price !== undefined && quantity > 0 ? Math.round(quantity * price) : null;
              const pid = `${id}-part-${part.key}`;
              return (
                <div key={part.key} role="group" aria-label={`Part ${p + 1}`} className={partColumns}>
                  <CellInput id={`${pid}-number`} label="Part number" value={part.partNumber} error={errors[fieldName.part(index, p, "partNumber")]} onChange={(e) => setPart(p, { partNumber: e.target.value })} />
                  <CellInput id={`${pid}-description`} label="Description" value={part.description} error={errors[fieldName.part(index, p, "description")]} onChange={(e) => setPart(p, { description: e.target.value })} />
                  <CellInput id={`${pid}-quantity`} label="Quantity" inputMode="decimal" value={part.quantity} error={errors[fieldName.part(index, p, "quantity")]} onChange={(e) => setPart(p, { quantity: e.target.value })} />
                  <CellInput id={`${pid}-price`} label="Unit price" inputMode="decimal" value={part.price} error={errors[fieldName.part(index, p, "unitPriceCents")]} onChange={(e) => setPart(p, { price: e.target.value })} />
                  <span className="flex min-h-12 items-center justify-end tabular-figures">{amount === null ? "—" : formatMoney(amount, estimate.currency)}</span>
                  <Button aria-label={`Remove part ${p + 1}`} className="px-0" onClick={() => onChange({ ...option, parts: option.parts.filter((_, i) => i !== p) })}>
                    <span aria-hidden="true">×</span>
                  </Button>
                </div>
              );
            })}
          </>
        )}
        <Button className="self-start" onClick={() => onChange({ ...option, parts: [...option.parts, emptyPart()] })}>
          Add a part
        </Button>
      </div>

      <OptionTotals estimate={estimate} totals={figures.totals} labourHours={option.labourHours} />
      {figures.sentence && <p className="font-medium">{figures.sentence}</p>}
      {onRemove && (
        <Button variant="quiet" className="self-end" onClick={onRemove}>
          Remove option {index + 1}
        </Button>
      )}
    </fieldset>
  );
}
