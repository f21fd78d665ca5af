import type { Problem } from "../../../../shared/flow/problems.ts";
import { stepKinds, type StepKind } from "../../../../shared/flow/schema.ts";
import { kindOf, titleOf, type RawStep } from "../lib/draft-edits.ts";
import { countInWords, stepKindLabels } from "../lib/flow-words.ts";
import { stepOrder } from "../lib/step-order.ts";
import { SeverityMark } from "./problem-list.tsx";

interface StepListProps {
  steps: Record<string, RawStep>;
  start: unknown;
  problems: readonly Problem[];
  /** Null is the flow's own details. */
  selected: string | null;
  onSelect: (stepId: string | null) => void;
}

const kindWords = (kind: string) => ((stepKinds as readonly string[]).includes(kind) ? stepKindLabels[kind as StepKind] : "Unknown kind");

function markOf(problems: readonly Problem[]) {
  const errors = problems.filter((p) => p.severity === "error").length;
  const warnings = problems.length - errors;
  if (errors > 0) return { severity: "error" as const, words: countInWords(errors, "error") };
  if (warnings > 0) return { severity: "warning" as const, words: countInWords(warnings, "warning") };
  return null;
}

/** The flow's details, then every step: title, kind and a mark when it has problems. */
export function StepList({ steps, start, problems, selected, onSelect }: StepListProps) {
  const flowMark = markOf(problems.filter((p) => p.stepId === null));
  return (
    <nav aria-label="Steps" className="flex flex-col gap-2">
      <ul className="flex flex-col gap-2">
        <li>
          <ListButton current={selected === null} onClick={() => onSelect(null)} title="Flow details" detail="Title, equipment, start" mark={flowMark} />
        </li>
        {stepOrder(steps, start).map((id) => [id, steps[id]!] as const).map(([id, step]) => (
          <li key={id}>
            <ListButton
              current={selected === id}
              onClick={() => onSelect(id)}
              title={titleOf(step) === "" ? `Untitled (${id})` : titleOf(step)}
              detail={`${kindWords(kindOf(step))} · ${id}${start === id ? " · start" : ""}`}
              mark={markOf(problems.filter((p) => p.stepId === id))}
            />
          </li>
        ))}
      </ul>
    </nav>
  );
}

interface ListButtonProps {
  current: boolean;
  onClick: () => void;
  title: string;
  detail: string;
  mark: ReturnType<typeof markOf>;
}

function ListButton({ current, onClick, title, detail, mark }: ListButtonProps) {
  return (
    <button
      type="button"
      aria-current={current ? "step" : undefined}
      onClick={onClick}
      className={
        "flex w-full items-start gap-3 rounded-lg border-2 px-3 py-2 text-left " +
        (current ? "border-accent bg-accent-soft" : "border-line bg-raised")
      }
    >
      <span className="flex min-w-0 flex-1 flex-col">
        <span className="font-semibold break-words">{title}</span>
        <span className="text-base break-words text-ink-muted">{detail}</span>
      </span>
      {mark && (
        <span className="flex shrink-0 items-center gap-1 text-base font-semibold">
          <SeverityMark severity={mark.severity} />
          <span className="sr-only">{mark.words}</span>
          <span aria-hidden="true">{mark.words.split(" ")[0]}</span>
        </span>
      )}
    </button>
  );
}
