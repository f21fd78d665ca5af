// Drafts of a flow: the definition a new flow starts from, and a draft's problems as the editor and
// the server both name them (the validator's, plus a definition whose id is not the flow's).
import { equipmentKinds } from "../equipment.ts";
import { hasErrors, type Problem } from "./problems.ts";
import type { FlowDefinition } from "./schema.ts";
import { validateFlow, type SectionLibrary } from "./validate.ts";

/** The format version written into every flow file. */
export const FORMAT_VERSION = 1;

/** A draft problem's code: the validator's, or the one a draft adds. */
export type DraftProblem = Omit<Problem, "code"> & { code: Problem["code"] | "flow_id_mismatch" };

/** Where a new flow starts: one finding step, valid apart from the warning that it lists no repairs. */
export function starterDefinition(id: string, title: string): FlowDefinition {
  return {
    formatVersion: FORMAT_VERSION,
    id,
    title,
    appliesTo: { equipment: [equipmentKinds[0]], cycle: "any" },
    start: "finding",
    steps: {
      finding: {
        kind: "finding",
        title: "Name the fault found",
        certainty: "likely",
        explanation: "Say what the checks showed and why it explains the complaint.",
        repairs: [],
      },
    },
  };
}

/** Every problem of a draft of flow `flowId`; a definition naming another id is an error. */
export function draftProblems(flowId: string, definition: unknown, sections: SectionLibrary): DraftProblem[] {
  const problems: DraftProblem[] = validateFlow(definition, sections).problems;
  const id = typeof definition === "object" && definition !== null ? (definition as { id?: unknown }).id : undefined;
  if (id !== flowId) {
    problems.unshift({
      stepId: null,
      code: "flow_id_mismatch",
      message: `the definition's id is ${typeof id === "string" ? `"${id}"` : "missing"}, but this is the flow "${flowId}"; a flow's id never changes`,
      severity: "error",
    });
  }
  return problems;
}

export const errorCount = (problems: readonly DraftProblem[]) => problems.filter((p) => p.severity === "error").length;
export const draftHasErrors = (problems: readonly DraftProblem[]) => hasErrors(problems as Problem[]);
