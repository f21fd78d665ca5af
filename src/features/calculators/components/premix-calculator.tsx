import { useId, useState } from "react";
import { unitLabel, type Unit } from "../../../../shared/calc/units.ts";
import { NumericKeypad, pressKey } from "../../../components/ui/numeric-keypad.tsx";
import { SafetyPanel } from "../../../components/ui/safety-panel.tsx";
import { commonRatios, fuelUnits, parseAmount, premixOil, rounded } from "../lib/calculators.ts";
import { AmountEntry } from "./amount-entry.tsx";

type Field = "fuel" | "ratio";

/** Oil for an amount of fuel at a ratio: both typed on one keypad, the ratio also a tap away. */
export function PremixCalculator() {
  const id = useId();
  const [field, setField] = useState<Field>("fuel");
  const [fuelText, setFuelText] = useState("");
  const [fuelUnit, setFuelUnit] = useState<Unit>(fuelUnits[0]);
  const [ratioText, setRatioText] = useState("50");
  const fuel = parseAmount(fuelText, "amount of fuel");
  const ratio = parseAmount(ratioText, "ratio");
  const shown = (text: string, result: ReturnType<typeof parseAmount>) => (result.ok || text === "" || Number(text) === 0 ? null : result.reason);
  const type = (key: string) => (field === "fuel" ? setFuelText(pressKey(fuelText, key)) : setRatioText(pressKey(ratioText, key)));
  return (
    <div className="flex flex-col gap-6">
      <SafetyPanel signal="caution">
        Fuel is highly flammable. Mix it outdoors, away from sparks and flames, in a container made for fuel. Use the ratio in the engine maker's manual; it may not be the one on the oil.
      </SafetyPanel>
      <div className="grid items-start gap-6 md:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]">
        <NumericKeypad onKey={type} />
        <div className="flex flex-col gap-5">
          <AmountEntry id={`${id}-fuel`} label="Fuel" text={fuelText} unit={fuelUnit} units={fuelUnits} active={field === "fuel"} error={shown(fuelText, fuel)} onFocus={() => setField("fuel")} onText={setFuelText} onUnit={setFuelUnit} />
          <div className="flex flex-col gap-3">
            <AmountEntry id={`${id}-ratio`} label="Ratio (fuel to 1 part oil)" text={ratioText} active={field === "ratio"} error={shown(ratioText, ratio)} onFocus={() => setField("ratio")} onText={setRatioText} />
            <div role="group" aria-label="Common ratios" className="flex flex-wrap gap-3">
              {commonRatios.map((r) => (
                <button
                  key={r}
                  type="button"
                  aria-pressed={ratioText === String(r)}
                  onClick={() => setRatioText(String(r))}
                  className={`min-h-12 min-w-20 rounded-lg border-2 px-4 text-lg font-semibold ${ratioText === String(r) ? "border-accent bg-accent-soft" : "border-line-strong bg-raised"}`}
                >
                  {r}:1
                </button>
              ))}
            </div>
          </div>
          <section aria-labelledby={`${id}-result`} aria-live="polite" className="flex flex-col gap-2 rounded-lg border-2 border-line bg-raised px-5 py-4">
            <h3 id={`${id}-result`} className="text-base font-semibold text-ink-muted">
              2-stroke oil to add
            </h3>
            {fuel.ok && ratio.ok ? (
              <>
                <ul className="flex flex-col gap-1">
                  {premixOil(fuel.value, fuelUnit, ratio.value).map((o) => (
                    <li key={o.unit} className="tabular-figures text-3xl font-semibold">
                      {rounded(o.value, o.unit)} {unitLabel(o.unit)}
                    </li>
                  ))}
                </ul>
                <p className="text-base">
                  to {rounded(fuel.value, fuelUnit)} {unitLabel(fuelUnit)} of fuel at {ratio.value}:1.
                </p>
              </>
            ) : (
              <p className="text-lg">Type the amount of fuel, then check the ratio.</p>
            )}
          </section>
        </div>
      </div>
    </div>
  );
}
