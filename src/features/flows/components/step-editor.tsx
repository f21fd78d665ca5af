import { useState, type ReactNode } from "react";
import type { Problem } from "../../../../shared/flow/problems.ts";
import { stepKinds, type StepKind } from "../../../../shared/flow/schema.ts";
import { Button } from "../../../components/ui/button.tsx";
import { kindOf, titleOf, type RawStep } from "../lib/draft-edits.ts";
import { countInWords, listInWords, stepKindLabels } from "../lib/flow-words.ts";
import type { StepChange } from "../lib/use-step-form.ts";
import type { BandCoverageProps } from "../lib/view-slots.ts";
import { ChoiceForm } from "./choice-form.tsx";
import { FindingForm } from "./finding-form.tsx";
import { InstructionForm } from "./instruction-form.tsx";
import { ProblemList } from "./problem-list.tsx";
import { ReadingForm } from "./reading-form.tsx";
import { RenameStepForm } from "./rename-step-form.tsx";
import { SectionStepView } from "./section-step-view.tsx";
import type { StepFormProps } from "./step-form-props.ts";
import type { StepChoice } from "./target-field.tsx";

export interface StepEditorProps {
  stepId: string;
  step: RawStep;
  isStart: boolean;
  choices: readonly StepChoice[];
  /** The validator's problems for this step. */
  problems: readonly Problem[];
  /** Steps that lead here, named when it is deleted. */
  leadingHere: readonly string[];
  sections: unknown;
  onChange: StepChange;
  onReplace: (step: RawStep) => void;
  onRename: (to: string) => void;
  onDelete: () => void;
  onAddStep: (id: string) => void;
  renderBandCoverage?: (props: BandCoverageProps) => ReactNode;
}

const forms: Record<Exclude<StepKind, "section">, (props: StepFormProps) => ReactNode> = {
  instruction: InstructionForm,
  choice: ChoiceForm,
  reading: ReadingForm,
  finding: FindingForm,
};

const isKind = (kind: string): kind is StepKind => (stepKinds as readonly string[]).includes(kind);

/** The selected step: what it is, its problems, and the form for its kind. */
export function StepEditor(props: StepEditorProps) {
  const { stepId, step, isStart, choices, problems, leadingHere, onRename, onDelete } = props;
  const [mode, setMode] = useState<"edit" | "rename" | "delete">("edit");
  const kind = kindOf(step);
  const title = titleOf(step);
  const Form = isKind(kind) && kind !== "section" ? forms[kind] : null;
  return (
    <section aria-labelledby="step-editor-title" className="flex flex-col gap-5 rounded-xl border-2 border-line bg-raised/60 px-5 py-5">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="flex min-w-0 flex-col gap-1">
          <p className="font-semibold text-ink-muted">
            {isKind(kind) ? stepKindLabels[kind] : `Unknown kind “${kind}”`}
            {isStart && " · the flow starts here"}
          </p>
          <h2 id="step-editor-title" className="text-2xl font-semibold break-words">
            {title === "" ? "Untitled step" : title}
          </h2>
          <p className="text-base text-ink-muted">
            Id <code className="font-semibold text-ink">{stepId}</code>
          </p>
        </div>
        {mode === "edit" && (
          <div className="flex flex-wrap gap-3">
            <Button onClick={() => setMode("rename")}>Rename id</Button>
            <Button onClick={() => setMode("delete")}>Delete step</Button>
          </div>
        )}
      </div>
      {mode === "rename" && <RenameStepForm currentId={stepId} taken={choices.map((c) => c.id)} onRename={onRename} onCancel={() => setMode("edit")} />}
      {mode === "delete" && (
        <div role="alert" className="flex flex-col gap-3 rounded-lg border-2 border-problem bg-problem-soft px-4 py-3">
          <p className="font-semibold">Delete step “{stepId}”?</p>
          <p>
            {leadingHere.length === 0
              ? "No other step leads here."
              : `${countInWords(leadingHere.length, "step")} lead${leadingHere.length === 1 ? "s" : ""} here (${listInWords(leadingHere.map((id) => `“${id}”`))}) and will need a new target.`}{" "}
            Undo brings the step back.
          </p>
          <div className="flex flex-wrap gap-3">
            <Button variant="primary" onClick={onDelete}>
              Delete the step
            </Button>
            <Button onClick={() => setMode("edit")}>Keep it</Button>
          </div>
        </div>
      )}
      {problems.length > 0 && (
        <div className="rounded-lg border-2 border-line bg-raised px-4 py-3">
          <p className="mb-2 font-semibold">{countInWords(problems.length, "problem")} in this step</p>
          <ProblemList problems={problems} named={false} />
        </div>
      )}
      {Form ? (
        <Form step={step} choices={choices} onChange={props.onChange} onReplace={props.onReplace} onAddStep={props.onAddStep} renderBandCoverage={props.renderBandCoverage} />
      ) : kind === "section" ? (
        <SectionStepView step={step} sections={props.sections} choices={choices} />
      ) : (
        <p className="max-w-[65ch]">Benchpath cannot edit a step of this kind. Delete it, or fix it in the file and import it again.</p>
      )}
    </section>
  );
}
