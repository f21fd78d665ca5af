import { unitLabel, type Unit } from "../../../shared/calc/units.ts";

/** The units of the step's quantity as a row of big toggles; the chosen one is marked by a border and a tick. */
export function UnitSwitch({ units, value, onChange }: { units: readonly Unit[]; value: Unit; onChange: (unit: Unit) => void }) {
  return (
    <div role="group" aria-label="Unit" className="flex flex-wrap gap-3">
      {units.map((unit) => {
        const chosen = unit === value;
        return (
          <button
            key={unit}
            type="button"
            aria-pressed={chosen}
            onClick={() => onChange(unit)}
            className={
              "min-h-12 min-w-16 rounded-lg border-2 px-4 text-lg font-semibold " +
              (chosen ? "border-accent bg-accent-soft text-ink" : "border-line-strong bg-raised text-ink")
            }
          >
            {chosen && <span aria-hidden="true">✓ </span>}
            {unitLabel(unit)}
          </button>
        );
      })}
    </div>
  );
}
