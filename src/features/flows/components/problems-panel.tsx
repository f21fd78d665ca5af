import type { Problem } from "../../../../shared/flow/problems.ts";
import { countInWords } from "../lib/flow-words.ts";
import { problemWhere, SeverityMark } from "./problem-list.tsx";

interface ProblemsPanelProps {
  problems: readonly Problem[];
  /** Null selects the flow's own details. */
  onSelect: (stepId: string | null) => void;
}

/** Every problem the validator finds in the draft as it stands; each one opens its step. */
export function ProblemsPanel({ problems, onSelect }: ProblemsPanelProps) {
  const errors = problems.filter((p) => p.severity === "error").length;
  const warnings = problems.length - errors;
  const summary =
    problems.length === 0 ? "No problems: the flow can be published." : [errors > 0 && countInWords(errors, "error"), warnings > 0 && countInWords(warnings, "warning")].filter(Boolean).join(" and ");
  return (
    <section aria-labelledby="problems-title" className="flex flex-col gap-2 rounded-xl border-2 border-line bg-raised px-4 py-3">
      <h2 id="problems-title" className="text-xl font-semibold">
        Problems
      </h2>
      <p role="status" className={errors > 0 ? "font-semibold text-problem" : "text-ink-muted"}>
        {summary}
      </p>
      {problems.length > 0 && (
        <ul className="flex max-h-72 flex-col gap-1 overflow-y-auto">
          {problems.map((problem, index) => (
            <li key={`${problem.stepId}-${problem.code}-${index}`}>
              <button type="button" onClick={() => onSelect(problem.stepId)} className="flex w-full items-start gap-2 rounded-lg px-2 py-2 text-left hover:bg-sunken">
                <SeverityMark severity={problem.severity} />
                <span>
                  <span className="font-semibold">{problemWhere(problem)}:</span> {problem.message}
                  <span className="sr-only"> ({problem.severity})</span>
                </span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
