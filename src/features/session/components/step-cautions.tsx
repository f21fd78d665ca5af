import type { CompiledStep } from "../../../../shared/flow/compile.ts";
import type { SignalWord } from "../../../../shared/flow/schema.ts";
import { SafetyPanel } from "../../../components/ui/safety-panel.tsx";

interface StepCautionsProps {
  step: CompiledStep;
  acknowledged: readonly SignalWord[];
  onAcknowledge: (signal: SignalWord) => void;
}

/** The step's safety panels, in the flow's order, before anything the tech can press. */
export function StepCautions({ step, acknowledged, onAcknowledge }: StepCautionsProps) {
  const cautions = step.cautions ?? [];
  if (cautions.length === 0) return null;
  return (
    <div className="flex max-w-[70ch] flex-col gap-4">
      {cautions.map((caution, index) => {
        const key = `${caution.signal}-${index}`;
        const text = caution.text ?? "";
        if (caution.signal === "DANGER" || caution.signal === "WARNING") {
          const signal = caution.signal === "DANGER" ? "danger" : "warning";
          // One acknowledgement covers a signal word on the step, as the shared rules count it.
          return (
            <SafetyPanel key={key} signal={signal} acknowledged={acknowledged.includes(caution.signal)} onAcknowledge={() => onAcknowledge(caution.signal)}>
              {text}
            </SafetyPanel>
          );
        }
        return (
          <SafetyPanel key={key} signal={caution.signal === "CAUTION" ? "caution" : "notice"}>
            {text}
          </SafetyPanel>
        );
      })}
    </div>
  );
}
