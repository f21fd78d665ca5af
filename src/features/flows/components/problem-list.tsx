import type { Problem } from "../../../../shared/flow/problems.ts";
import { ProblemGlyph } from "../../../components/ui/problem-glyph.tsx";

type ProblemLike = Pick<Problem, "stepId" | "message" | "severity">;

/** A warning is marked by an outline, an error by the filled problem diamond. */
export function SeverityMark({ severity }: { severity: "error" | "warning" }) {
  if (severity === "error") return <ProblemGlyph className="mt-0.5 size-6 shrink-0" />;
  return (
    <svg viewBox="0 0 24 24" className="mt-0.5 size-6 shrink-0" aria-hidden="true" focusable="false">
      <path d="M12 2.5L21.5 12 12 21.5 2.5 12z" fill="none" strokeWidth="2.2" className="stroke-ink-muted" />
      <rect x="10.9" y="7" width="2.2" height="6.5" rx="0.5" className="fill-ink-muted" />
      <circle cx="12" cy="16.6" r="1.3" className="fill-ink-muted" />
    </svg>
  );
}

export function problemWhere(problem: Pick<Problem, "stepId">) {
  return problem.stepId === null ? "The flow" : `Step “${problem.stepId}”`;
}

/** Problems, read-only (an import, a refused publish, one step's own); `named` says where each one is. */
export function ProblemList({ problems, named = true }: { problems: readonly ProblemLike[]; named?: boolean }) {
  return (
    <ul className="flex flex-col gap-2">
      {problems.map((problem, index) => (
        <li key={index} className="flex items-start gap-2">
          <SeverityMark severity={problem.severity} />
          <span>
            <span className="font-semibold">
              {named ? `${problemWhere(problem)} (${problem.severity}):` : `${problem.severity === "error" ? "Error" : "Warning"}:`}
            </span>{" "}
            {problem.message}
          </span>
        </li>
      ))}
    </ul>
  );
}
