// The boxes of the flow map: a step, a target no step answers to, a way out not written yet, a hand-back.
import { createContext, use, useId } from "react";
import { Handle, Position, type Node, type NodeProps } from "@xyflow/react";
import { ProblemGlyph } from "../../../components/ui/problem-glyph.tsx";
import type { StepNodeData, StepStatus } from "../lib/flow-layout.ts";

/** How a step box tells the editor it was picked. */
export const SelectStepContext = createContext<(stepId: string) => void>(() => {});

export type StepFlowNode = Node<{ step: StepNodeData; selected: boolean }, "step">;
export type MissingFlowNode = Node<{ target: string }, "missing">;
export type PlainFlowNode = Node<Record<string, never>, "unset" | "hand-back">;

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;

/** The step's state in words, the way the box says it. */
export function statusWords(step: StepNodeData): string {
  const errors = step.problems.filter((p) => p.severity === "error").length;
  const warnings = step.problems.length - errors;
  if (errors > 0) return warnings > 0 ? `${plural(errors, "error")}, ${plural(warnings, "warning")}` : plural(errors, "error");
  return warnings > 0 ? plural(warnings, "warning") : "No problems";
}

function WarningGlyph() {
  return (
    <svg viewBox="0 0 24 24" className="size-6 shrink-0" aria-hidden="true" focusable="false">
      <path d="M12 2.5L22.5 21h-21z" className="fill-raised stroke-ink" strokeWidth="2" strokeLinejoin="round" />
      <rect x="11" y="9" width="2" height="6.5" rx="0.5" className="fill-ink" />
      <circle cx="12" cy="18" r="1.2" className="fill-ink" />
    </svg>
  );
}

function FineGlyph() {
  return (
    <svg viewBox="0 0 24 24" className="size-6 shrink-0" aria-hidden="true" focusable="false">
      <circle cx="12" cy="12" r="10.5" className="fill-accent" />
      <path d="M7 12.5l3.2 3.2L17 9" fill="none" strokeWidth="2.6" strokeLinecap="round" strokeLinejoin="round" className="stroke-accent-ink" />
    </svg>
  );
}

const glyphs: Record<StepStatus, () => React.JSX.Element> = { error: () => <ProblemGlyph />, warning: WarningGlyph, fine: FineGlyph };

// Errors take the problem colour and a solid edge, warnings a dashed edge: the words and glyphs say it too.
const frames: Record<StepStatus, string> = {
  error: "border-problem bg-problem-soft",
  warning: "border-dashed border-line-strong bg-raised",
  fine: "border-line-strong bg-raised",
};

const hidden = "opacity-0";

export function StepNode({ data }: NodeProps<StepFlowNode>) {
  const { step, selected } = data;
  const onSelect = use(SelectStepContext);
  const messageId = useId();
  const Glyph = glyphs[step.status];
  const first = step.problems[0];
  const kind = step.kindWord.charAt(0).toLowerCase() + step.kindWord.slice(1);
  const name = `${step.title ?? "Untitled step"}, ${kind}${step.isStart ? ", start step" : ""}: ${statusWords(step)}`;
  return (
    <>
      <Handle type="target" position={Position.Top} isConnectable={false} className={hidden} />
      <button
        type="button"
        aria-label={name}
        aria-pressed={selected}
        aria-describedby={first ? messageId : undefined}
        onClick={() => onSelect(step.stepId)}
        className={`flex size-full flex-col gap-1 overflow-hidden rounded-lg border-2 p-3 text-left text-ink ${frames[step.status]} ${selected ? "ring-4 ring-accent ring-offset-4 ring-offset-surface" : ""}`}
      >
        <span className="flex items-center gap-2 text-sm text-ink-muted">
          <span className="font-semibold">{step.kindWord}</span>
          <span className="min-w-0 flex-1 truncate">{step.stepId}</span>
          {step.isStart && <span className="rounded-md border-2 border-accent bg-accent px-2 font-semibold text-accent-ink">Start</span>}
        </span>
        <span className={`line-clamp-2 font-semibold ${step.title ? "" : "italic text-ink-muted"}`}>{step.title ?? "Untitled step"}</span>
        <span className={`flex items-center gap-2 text-sm font-semibold ${step.status === "error" ? "text-problem" : ""}`}>
          <Glyph />
          {statusWords(step)}
        </span>
        {first && (
          <span id={messageId} className="line-clamp-1 text-sm text-ink-muted">
            {first.message}
          </span>
        )}
      </button>
      <Handle type="source" position={Position.Bottom} isConnectable={false} className={hidden} />
    </>
  );
}

export function MissingNode({ data }: NodeProps<MissingFlowNode>) {
  return (
    <div role="note" aria-label={`Missing step "${data.target}"`} className="flex size-full flex-col gap-1 rounded-lg border-2 border-dashed border-problem bg-problem-soft p-3 text-ink">
      <Handle type="target" position={Position.Top} isConnectable={false} className={hidden} />
      <span className="flex items-center gap-2 font-semibold text-problem">
        <ProblemGlyph />
        Missing step
      </span>
      <span className="truncate text-sm font-semibold">“{data.target}”</span>
      <span className="text-sm text-ink-muted">No step has this id</span>
    </div>
  );
}

export function UnsetNode() {
  return (
    <div role="note" className="flex size-full flex-col justify-center rounded-lg border-2 border-dashed border-line-strong bg-sunken p-3 text-ink">
      <Handle type="target" position={Position.Top} isConnectable={false} className={hidden} />
      <span className="font-semibold">Next step not chosen</span>
      <span className="text-sm text-ink-muted">Pick where this leads</span>
    </div>
  );
}

export function HandBackNode() {
  return (
    <div role="note" className="flex size-full flex-col items-center justify-center rounded-full border-2 border-line-strong bg-sunken px-4 text-center text-ink">
      <Handle type="target" position={Position.Top} isConnectable={false} className={hidden} />
      <span className="font-semibold">Back to the calling flow</span>
      <span className="text-sm text-ink-muted">Goes on at its next step</span>
    </div>
  );
}

export const nodeTypes = { step: StepNode, missing: MissingNode, unset: UnsetNode, "hand-back": HandBackNode };
