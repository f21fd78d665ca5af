// What the flow editor hands to its two drawings: the whole-flow graph and a reading's band line.
import type { Problem } from "../../../../shared/flow/problems.ts";
import type { Band } from "../../../../shared/flow/schema.ts";

export interface FlowGraphProps {
  /** The draft as it stands; it may be unfinished or invalid. */
  definition: Record<string, unknown>;
  /** The validator's problems for that draft; each node shows those of its step. */
  problems: readonly Problem[];
  selectedStepId: string | null;
  onSelect: (stepId: string) => void;
}

export interface BandCoverageProps {
  bands: readonly Band[];
  /** The reading's unit, for the scale's labels. */
  unit: string;
  /** Called with the index of the band the tech picks on the line, to open its row. */
  onPick?: (index: number) => void;
}
