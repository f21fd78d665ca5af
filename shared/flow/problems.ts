// The one shape a validation problem takes, shared by flows, sections, the editor and flows-check.
import type { BandIssueCode } from "./bands.ts";

export type ProblemCode =
  | "schema_invalid"
  | "step_id_invalid"
  | "too_many_steps"
  | "start_missing"
  | "target_unknown"
  | "continue_in_flow"
  | "step_unreachable"
  | "no_finding_reachable"
  | "option_duplicate"
  | "caution_text_missing"
  | "finding_without_repairs"
  | "unit_unknown"
  | "unit_quantity_mismatch"
  | "reading_outcome_missing"
  | "reading_outcome_conflict"
  | "evaluation_quantity_mismatch"
  | "section_missing"
  | "section_cycle"
  | "section_never_continues"
  | BandIssueCode;

export interface Problem {
  /** The step at fault; for a problem inside a section, the step of this document that calls it. */
  stepId: string | null;
  code: ProblemCode;
  message: string;
  severity: "error" | "warning";
}

export const error = (stepId: string | null, code: ProblemCode, message: string): Problem => ({ stepId, code, message, severity: "error" });
export const warning = (stepId: string | null, code: ProblemCode, message: string): Problem => ({ stepId, code, message, severity: "warning" });

export const hasErrors = (problems: readonly Problem[]) => problems.some((p) => p.severity === "error");

/** Thrown by compileFlow: a flow with errors never becomes a machine. */
export class FlowInvalidError extends Error {
  override name = "FlowInvalidError";
  readonly problems: Problem[];
  constructor(problems: Problem[]) {
    const errors = problems.filter((p) => p.severity === "error");
    const first = errors[0];
    super(`The flow has ${errors.length} error${errors.length === 1 ? "" : "s"}${first ? `; first: ${first.stepId ? `step "${first.stepId}": ` : ""}${first.message}` : ""}.`);
    this.problems = problems;
  }
}
