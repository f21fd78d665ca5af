import type { ReactNode } from "react";
import type { RawStep } from "../lib/draft-edits.ts";
import type { StepChange } from "../lib/use-step-form.ts";
import type { BandCoverageProps } from "../lib/view-slots.ts";
import type { StepChoice } from "./target-field.tsx";

export interface StepFormProps {
  step: RawStep;
  /** The steps a target can name. */
  choices: readonly StepChoice[];
  /** A change typed into the form. */
  onChange: StepChange;
  /** A change that reshapes the step (a reading's outcome, its quantity): the form reloads from it. */
  onReplace: (step: RawStep) => void;
  /** Opens "add a step" with an id typed as a target. */
  onAddStep: (id: string) => void;
  renderBandCoverage?: (props: BandCoverageProps) => ReactNode;
}
