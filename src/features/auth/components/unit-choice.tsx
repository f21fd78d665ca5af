import type { UnitSystem } from "../../../../shared/equipment.ts";
import { useSetUnits } from "../api/set-units.ts";

const choices: { value: UnitSystem; label: string }[] = [
  { value: "imperial", label: "Imperial" },
  { value: "metric", label: "Metric" },
];

/** The signed-in person's own units, saved to their account; readings and figures follow at once. */
export function UnitChoice({ value }: { value: UnitSystem }) {
  const setUnits = useSetUnits();
  const shown = setUnits.isPending ? setUnits.variables.unitSystem : value;
  return (
    <div className="flex flex-col items-end gap-1">
      <div role="group" aria-label="Measurement system" className="flex items-center gap-2">
        <span className="text-base font-medium text-ink-muted" aria-hidden="true">
          Units
        </span>
        {choices.map((choice) => {
          const chosen = choice.value === shown;
          return (
            <button
              key={choice.value}
              type="button"
              aria-pressed={chosen}
              disabled={setUnits.isPending}
              onClick={() => !chosen && setUnits.mutate({ unitSystem: choice.value })}
              className={"min-h-12 rounded-lg border-2 px-3 text-base font-semibold whitespace-nowrap " + (chosen ? "border-accent bg-accent-soft text-ink" : "border-line-strong bg-raised text-ink")}
            >
              {chosen && <span aria-hidden="true">✓ </span>}
              {choice.label}
            </button>
          );
        })}
      </div>
      {setUnits.isError && (
        <p role="alert" className="text-sm font-medium text-problem">
          Not saved: check the connection and try again.
        </p>
      )}
    </div>
  );
}
