import { useId, useState } from "react";
import { unitLabel, type Unit } from "../../../../shared/calc/units.ts";
import { NumericKeypad, pressKey } from "../../../components/ui/numeric-keypad.tsx";
import { conversions, parseAmount, rounded } from "../lib/calculators.ts";
import { AmountEntry } from "./amount-entry.tsx";

/** A value in one unit, said in the others of its quantity as it is typed. */
export function Converter({ label, units, what }: { label: string; units: readonly Unit[]; what: string }) {
  const id = useId();
  const [text, setText] = useState("");
  const [unit, setUnit] = useState<Unit>(units[0]!);
  const amount = parseAmount(text, what);
  // A gap starts "0.0…": zero while typing is not yet a mistake.
  const error = amount.ok || text === "" || Number(text) === 0 ? null : amount.reason;
  return (
    <div className="grid items-start gap-6 md:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]">
      <NumericKeypad onKey={(key) => setText(pressKey(text, key))} />
      <div className="flex flex-col gap-5">
        <AmountEntry id={id} label={label} text={text} unit={unit} units={units} active error={error} onFocus={() => {}} onText={setText} onUnit={setUnit} />
        <section aria-labelledby={`${id}-result`} aria-live="polite" className="flex flex-col gap-2 rounded-lg border-2 border-line bg-raised px-5 py-4">
          <h3 id={`${id}-result`} className="text-base font-semibold text-ink-muted">
            The same in
          </h3>
          {amount.ok ? (
            <ul className="flex flex-col gap-1">
              {conversions(amount.value, unit).map((c) => (
                <li key={c.unit} className="tabular-figures text-3xl font-semibold">
                  {rounded(c.value, c.unit)} {unitLabel(c.unit)}
                </li>
              ))}
            </ul>
          ) : (
            <p className="text-lg">Type a value on the keypad.</p>
          )}
        </section>
      </div>
    </div>
  );
}
