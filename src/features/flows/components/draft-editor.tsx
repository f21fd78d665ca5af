import { useEffect, useEffectEvent, useRef, useState, type ReactNode } from "react";
import { Link, useSearchParams } from "react-router";
import { applyCheckOrder, checkChain } from "../../../../shared/flow/advice.ts";
import type { FlowDetail } from "../../../../shared/schemas/flows.ts";
import { Button, buttonClasses } from "../../../components/ui/button.tsx";
import { flowPath } from "../api/keys.ts";
import { addStep, renameStep, stepChoices, stepsLeadingTo, stepsOf, withStep, withoutStep } from "../lib/draft-edits.ts";
import { useDraftEditor, type ServerDraft } from "../lib/use-draft-editor.ts";
import type { BandCoverageProps, FlowGraphProps } from "../lib/view-slots.ts";
import { AddStepForm } from "./add-step-form.tsx";
import { CheckOrderAdvice } from "./check-order-advice.tsx";
import { ConflictPanel } from "./conflict-panel.tsx";
import { DraftToolbar } from "./draft-toolbar.tsx";
import { FlowDetailsForm, mergeDetails } from "./flow-details-form.tsx";
import { ProblemsPanel } from "./problems-panel.tsx";
import { StepEditor } from "./step-editor.tsx";
import { StepList } from "./step-list.tsx";

export interface DraftEditorProps {
  detail: FlowDetail;
  draft: ServerDraft;
  onPublished: (version: number) => void;
  renderGraph?: (props: FlowGraphProps) => ReactNode;
  renderBandCoverage?: (props: BandCoverageProps) => ReactNode;
}

/** Where the picked step's form begins, to bring it into view in portrait. */
const formTopId = "step-form-top";

/**
 * Ctrl/Cmd+Z undoes, Shift+Ctrl/Cmd+Z (or Ctrl+Y) redoes, wherever the focus is on the page, except in
 * fields that are not part of the draft (a new id, a publish note), marked `data-native-undo`.
 */
function useUndoKeys(undo: () => void, redo: () => void) {
  const onKey = useEffectEvent((event: KeyboardEvent) => {
    if (!(event.ctrlKey || event.metaKey) || event.altKey) return;
    if (event.target instanceof Element && event.target.closest("[data-native-undo]")) return;
    const key = event.key.toLowerCase();
    if (key === "z") {
      event.preventDefault();
      if (event.shiftKey) redo();
      else undo();
    } else if (key === "y" && event.ctrlKey) {
      event.preventDefault();
      redo();
    }
  });
  useEffect(() => {
    const listener = (event: KeyboardEvent) => onKey(event);
    document.addEventListener("keydown", listener);
    return () => document.removeEventListener("keydown", listener);
  }, []);
}

export function DraftEditor({ detail, draft, onPublished, renderGraph, renderBandCoverage }: DraftEditorProps) {
  const editor = useDraftEditor(detail.id, draft);
  const [params, setParams] = useSearchParams();
  const [view, setView] = useState<"steps" | "graph">("steps");
  const [showAdvice, setShowAdvice] = useState(false);
  const [adding, setAdding] = useState<string | null>(null);
  const [restoredShown, setRestoredShown] = useState(editor.restored);
  const refocus = useRef<string | null>(null);

  const { definition, generation, validation } = editor;
  const steps = stepsOf(definition);
  const choices = stepChoices(definition);
  const asked = params.get("step");
  const selected = asked !== null && Object.prototype.hasOwnProperty.call(steps, asked) ? asked : null;
  const problems = validation.problems;

  const select = (stepId: string | null) => {
    // Stacked (portrait), the form sits below the whole step list: bring it up to the one picked.
    if (window.matchMedia?.("(max-width: 1023px)").matches) requestAnimationFrame(() => document.getElementById(formTopId)?.scrollIntoView?.({ block: "start" }));
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        if (stepId === null) next.delete("step");
        else next.set("step", stepId);
        return next;
      },
      { replace: true },
    );
  };

  // Undo reloads the form; the field that had the focus gets it back.
  const travel = (move: () => void) => {
    const active = document.activeElement;
    refocus.current = active instanceof HTMLElement && active.id !== "" ? active.id : null;
    move();
  };
  const undo = () => travel(editor.undo);
  const redo = () => travel(editor.redo);
  useUndoKeys(undo, redo);
  useEffect(() => {
    const id = refocus.current;
    refocus.current = null;
    if (id) document.getElementById(id)?.focus();
  }, [generation]);

  const selectedStep = selected === null ? null : steps[selected];
  const stepProblems = problems.filter((p) => p.stepId === selected && selected !== null);

  const stepForm =
    selected !== null && selectedStep ? (
        <StepEditor
          key={`${selected}:${generation}`}
          stepId={selected}
          step={selectedStep}
          isStart={definition.start === selected}
          choices={choices}
          problems={stepProblems}
          leadingHere={stepsLeadingTo(definition, selected)}
          sections={definition.sections}
          onChange={(step, field) => editor.type((d) => withStep(d, selected, step), `${selected}:${field}`)}
          onReplace={(step) => editor.replace((d) => withStep(d, selected, step))}
          onRename={(to) => {
            editor.replace((d) => renameStep(d, selected, to));
            select(to);
          }}
          onDelete={() => {
            editor.replace((d) => withoutStep(d, selected));
            select(null);
          }}
          onAddStep={(id) => setAdding(id)}
          renderBandCoverage={renderBandCoverage}
        />
    ) : null;

  const editing = (
    <div className="grid gap-6 lg:grid-cols-[minmax(14rem,18rem)_minmax(0,1fr)]">
      <div className="flex flex-col gap-4">
        <StepList steps={steps} start={definition.start} problems={problems} selected={selected} onSelect={select} />
        {adding === null ? (
          <Button className="self-start" onClick={() => setAdding("")}>
            Add a step
          </Button>
        ) : (
          <AddStepForm
            key={adding}
            taken={Object.keys(steps)}
            initialId={adding}
            onCancel={() => setAdding(null)}
            onAdd={(id, kind) => {
              editor.replace((d) => addStep(d, id, kind));
              setAdding(null);
              select(id);
            }}
          />
        )}
      </div>
      <div id={formTopId} className="scroll-mt-4">
      {stepForm ?? (
        <FlowDetailsForm
          key={`details:${generation}`}
          definition={definition}
          choices={choices}
          onChange={(values, field) => editor.type((d) => mergeDetails(d, values), `flow:${field}`)}
        />
      )}
      </div>
    </div>
  );

  return (
    <div className="flex flex-col gap-5">
      <DraftToolbar flowId={detail.id} nextVersion={Math.max(0, ...detail.versions.map((v) => v.number)) + 1} editor={editor} errorCount={problems.filter((p) => p.severity === "error").length} onUndo={undo} onRedo={redo} onPublished={onPublished} />
      {restoredShown && (
        <div role="status" className="flex flex-wrap items-center justify-between gap-3 rounded-lg border-2 border-accent bg-accent-soft px-4 py-3">
          <p>
            <span className="font-semibold">Your unsaved changes were restored from this computer.</span> They had not reached the server yet; Benchpath saves them in a
            moment.
          </p>
          <Button onClick={() => setRestoredShown(false)}>Got it</Button>
        </div>
      )}
      {editor.conflict && <ConflictPanel conflict={editor.conflict} mine={definition} onLoadTheirs={editor.loadTheirs} onKeepMine={editor.keepMine} />}
      <ProblemsPanel problems={problems} onSelect={select} />
      <div className="flex flex-wrap gap-3">
        <Link to={flowPath(detail.id, "simulate")} className={buttonClasses()}>
          Try the draft
        </Link>
        <Button aria-expanded={showAdvice} onClick={() => setShowAdvice(!showAdvice)}>
          {showAdvice ? "Hide the check-order advice" : "Check-order advice"}
        </Button>
      </div>
      {showAdvice && <CheckOrderAdvice flowId={detail.id} currentOrder={checkChain(definition)} onApply={(order) => editor.replace((d) => applyCheckOrder(d, order))} />}
      {renderGraph && (
        <div role="group" aria-label="View" className="flex gap-2">
          <Button aria-pressed={view === "steps"} variant={view === "steps" ? "primary" : "secondary"} onClick={() => setView("steps")}>
            Steps and form
          </Button>
          <Button aria-pressed={view === "graph"} variant={view === "graph" ? "primary" : "secondary"} onClick={() => setView("graph")}>
            Graph
          </Button>
        </div>
      )}
      {renderGraph && view === "graph" ? (
        <div className="flex flex-col gap-3">
          {renderGraph({ definition, problems, selectedStepId: selected, onSelect: select })}
          {/* A node picked on the map opens its form right below it. */}
          {stepForm}
        </div>
      ) : (
        editing
      )}
    </div>
  );
}
