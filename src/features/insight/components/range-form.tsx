import { TextField } from "../../../components/ui/text-field.tsx";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { quickRanges, type RangeCheck } from "../lib/range.ts";

interface RangeFormProps {
  from: string;
  to: string;
  today: string;
  errors: RangeCheck["errors"];
  onChange: (range: { from: string; to: string }) => void;
}

/** Quick ranges and the two days themselves; what is wrong with a day shows under its field. */
export function RangeForm({ from, to, today, errors, onChange }: RangeFormProps) {
  return (
    <form role="search" aria-label="Date range" className="flex flex-col gap-5" onSubmit={(event) => event.preventDefault()}>
      <div role="group" aria-label="Quick ranges" className="flex flex-wrap gap-3">
        {quickRanges.map((quick) => {
          const range = quick.range(today);
          const chosen = range.from === from && range.to === to;
          return (
            <button
              key={quick.id}
              type="button"
              aria-pressed={chosen}
              className={`${buttonClasses({ variant: chosen ? "primary" : "secondary" })} min-w-40`}
              onClick={() => onChange(range)}
            >
              {quick.label}
            </button>
          );
        })}
      </div>
      <div className="grid gap-5 sm:grid-cols-2 sm:items-start">
        <TextField id="insight-from" label="First day" hint="Days run midnight to midnight UTC." type="date" value={from} error={errors.from} onChange={(event) => onChange({ from: event.currentTarget.value, to })} />
        <TextField id="insight-to" label="Last day" hint="Included in the figures." type="date" value={to} error={errors.to} onChange={(event) => onChange({ from, to: event.currentTarget.value })} />
      </div>
    </form>
  );
}
