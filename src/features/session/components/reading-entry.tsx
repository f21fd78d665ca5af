import { useId, useState } from "react";
import { checkReading, preferredUnit, unitLabel, unitsByQuantity, type Unit } from "../../../../shared/calc/units.ts";
import type { CompiledStep } from "../../../../shared/flow/compile.ts";
import type { StepRecordEvent } from "../../../../shared/flow/schema.ts";
import { Button } from "../../../components/ui/button.tsx";
import { FieldError } from "../../../components/ui/field-error.tsx";
import { NumericKeypad, pressKey } from "../../../components/ui/numeric-keypad.tsx";
import { UnitSwitch } from "../../../components/ui/unit-switch.tsx";

type ReadingStep = Extract<CompiledStep, { kind: "reading" }>;

interface ReadingEntryProps {
  step: ReadingStep;
  unitSystem: "imperial" | "metric";
  blocked: boolean;
  can: (event: StepRecordEvent) => boolean;
  /** Sends the reading; answers the refusal, or null when it was taken. */
  onRecord: (event: StepRecordEvent) => string | null;
}

export function ReadingEntry({ step, unitSystem, blocked, can, onRecord }: ReadingEntryProps) {
  const [text, setText] = useState("");
  const [unit, setUnit] = useState<Unit>(() => preferredUnit(step.quantity, unitSystem));
  const [refusal, setRefusal] = useState<string | null>(null);
  const displayId = useId();
  const errorId = `${displayId}-error`;

  const edit = (next: string) => {
    setText(next);
    setRefusal(null);
  };
  const record = () => {
    const value = text.trim() === "" ? Number.NaN : Number(text);
    const check = checkReading({ quantity: step.quantity, value, unit });
    if (!check.ok) return setRefusal(check.reason);
    const event: StepRecordEvent = { type: "step.record", stepId: step.id, value, unit };
    if (!can(event)) return setRefusal("This reading does not fit any outcome of this step; check the entry.");
    setRefusal(onRecord(event));
  };

  return (
    <div className="grid items-start gap-6 md:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]">
      <NumericKeypad onKey={(key) => edit(pressKey(text, key))} />
      <div className="flex flex-col gap-4">
        <label htmlFor={displayId} className="text-base font-semibold">
          Reading in {unitLabel(unit)}
        </label>
        <div className="flex items-baseline gap-3">
          {/* inputMode none keeps the phone keyboard away; a workshop keyboard can still type here. */}
          <input
            id={displayId}
            inputMode="none"
            autoComplete="off"
            value={text}
            onChange={(e) => edit(e.target.value)}
            aria-invalid={refusal ? true : undefined}
            aria-describedby={refusal ? errorId : undefined}
            className="tabular-figures min-h-16 w-full min-w-0 rounded-lg border-2 border-line-strong bg-raised px-4 text-right text-4xl font-semibold"
          />
          <span className="text-2xl font-semibold">{unitLabel(unit)}</span>
        </div>
        <UnitSwitch units={unitsByQuantity[step.quantity]} value={unit} onChange={(u) => { setUnit(u); setRefusal(null); }} />
        {refusal && <FieldError id={errorId} message={refusal} />}
        <Button variant="primary" size="main" onClick={record} disabled={blocked}>
          Record the reading
        </Button>
      </div>
    </div>
  );
}
