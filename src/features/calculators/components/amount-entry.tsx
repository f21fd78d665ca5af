import { unitLabel, type Unit } from "../../../../shared/calc/units.ts";
import { FieldError } from "../../../components/ui/field-error.tsx";
import { UnitSwitch } from "../../../components/ui/unit-switch.tsx";

interface AmountEntryProps {
  id: string;
  label: string;
  text: string;
  unit?: Unit;
  units?: readonly Unit[];
  /** The field the keypad types into. */
  active: boolean;
  error: string | null;
  onFocus: () => void;
  onText: (text: string) => void;
  onUnit?: (unit: Unit) => void;
}

/** One amount of a calculator: a big field the keypad types into, and its unit. */
export function AmountEntry({ id, label, text, unit, units, active, error, onFocus, onText, onUnit }: AmountEntryProps) {
  const errorId = `${id}-error`;
  return (
    <div className="flex flex-col gap-3">
      <label htmlFor={id} className="text-base font-semibold">
        {label}
      </label>
      <div className="flex items-baseline gap-3">
        {/* inputMode none keeps the tablet's keyboard away; the keypad beside it types here. */}
        <input
          id={id}
          inputMode="none"
          autoComplete="off"
          value={text}
          onFocus={onFocus}
          onClick={onFocus}
          onChange={(e) => onText(e.target.value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? errorId : undefined}
          className={`tabular-figures min-h-16 w-full min-w-0 rounded-lg border-2 bg-raised px-4 text-right text-4xl font-semibold ${active ? "border-accent" : "border-line-strong"}`}
        />
        {unit && <span className="text-2xl font-semibold">{unitLabel(unit)}</span>}
      </div>
      {units && unit && onUnit && <UnitSwitch units={units} value={unit} onChange={onUnit} />}
      {error && <FieldError id={errorId} message={error} />}
    </div>
  );
}
