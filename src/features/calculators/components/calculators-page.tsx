import { useSearchParams } from "react-router";
import { SafetyPanel } from "../../../components/ui/safety-panel.tsx";
import { calculatorIds, calculatorNames, converterUnits, type CalculatorId } from "../lib/calculators.ts";
import { Converter } from "./converter.tsx";
import { PremixCalculator } from "./premix-calculator.tsx";

const isCalculator = (value: string | null): value is CalculatorId => calculatorIds.includes(value as CalculatorId);

/** The bench's conversions and mixes, one at a time; the one shown is in the address (`?calc=`). */
export function CalculatorsPage() {
  const [params, setParams] = useSearchParams();
  const wanted = params.get("calc");
  const current: CalculatorId = isCalculator(wanted) ? wanted : "premix";
  return (
    <div className="flex max-w-5xl flex-col gap-6">
      <div className="flex flex-col gap-1">
        <h1 className="text-step font-semibold">Bench calculators</h1>
        <p className="max-w-[65ch] text-ink-muted">Mix fuel and oil, and turn the manual's figures into the units on your tools.</p>
      </div>
      <nav aria-label="Calculators" className="flex flex-wrap gap-3">
        {calculatorIds.map((id) => (
          <button
            key={id}
            type="button"
            aria-pressed={id === current}
            onClick={() => setParams({ calc: id }, { replace: true })}
            className={`inline-flex min-h-14 items-center rounded-lg border-2 px-5 font-semibold ${id === current ? "border-accent bg-accent text-accent-ink" : "border-line-strong bg-raised text-ink"}`}
          >
            {calculatorNames[id]}
          </button>
        ))}
      </nav>
      <section aria-labelledby="calculator-title" className="flex flex-col gap-5">
        <h2 id="calculator-title" className="text-2xl font-semibold">
          {calculatorNames[current]}
        </h2>
        {current === "premix" && <PremixCalculator />}
        {current === "oil" && <Converter key="oil" label="Oil amount" what="oil amount" units={converterUnits.oil} />}
        {current === "gap" && <Converter key="gap" label="Gap" what="gap" units={converterUnits.gap} />}
        {current === "torque" && (
          <>
            <SafetyPanel signal="notice">Tighten to the figure and in the order the engine maker's manual gives, with a checked torque wrench.</SafetyPanel>
            <Converter key="torque" label="Torque" what="torque" units={converterUnits.torque} />
          </>
        )}
      </section>
    </div>
  );
}
