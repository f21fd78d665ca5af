import type { CompiledStep } from "../../../../shared/flow/compile.ts";
import { DONE, type StepAnswerEvent } from "../../../../shared/flow/schema.ts";
import { Button } from "../../../components/ui/button.tsx";

interface StepAnswersProps {
  step: Extract<CompiledStep, { kind: "choice" | "instruction" }>;
  blocked: boolean;
  can: (event: StepAnswerEvent) => boolean;
  onAnswer: (event: StepAnswerEvent) => void;
}

/** A choice's options as big tiles, or an instruction's single "done" action; the machine says which are open. */
export function StepAnswers({ step, blocked, can, onAnswer }: StepAnswersProps) {
  if (step.kind === "instruction") {
    const event: StepAnswerEvent = { type: "step.answer", stepId: step.id, value: DONE };
    return (
      <Button variant="primary" size="main" className="self-start" disabled={blocked || !can(event)} onClick={() => onAnswer(event)}>
        I have done this
      </Button>
    );
  }
  return (
    <div role="group" aria-label="Answers" className="grid max-w-4xl gap-3 sm:grid-cols-2">
      {step.options.map((option) => {
        const event: StepAnswerEvent = { type: "step.answer", stepId: step.id, value: option.value };
        return (
          <Button key={option.value} variant="secondary" size="main" className="justify-start text-left" disabled={blocked || !can(event)} onClick={() => onAnswer(event)}>
            {option.label}
          </Button>
        );
      })}
    </div>
  );
}
