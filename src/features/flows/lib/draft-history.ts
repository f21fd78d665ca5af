// Undo and redo over whole drafts: every edit, from a form field to a renamed step, is one entry.
import { sameValue } from "../../../../shared/flow/diff.ts";
import type { DraftDefinition } from "../api/save-draft.ts";

const LIMIT = 200;
/** Keystrokes in one field this close together are one edit, so undo takes back a word, not a letter. */
const MERGE_MS = 1000;

export interface DraftHistory {
  past: DraftDefinition[];
  present: DraftDefinition;
  future: DraftDefinition[];
  /** Goes up with every change that did not come from the open form, so the form reloads its values. */
  generation: number;
  /** The last edit that may absorb the next one. */
  open: { key: string; at: number } | null;
}

/** A pure change to the draft as it stands when the change lands. */
export type Update = (present: DraftDefinition) => DraftDefinition;

export type HistoryAction =
  /** From the open form: `key` names the field, for merging keystrokes. */
  | { type: "type"; update: Update; key: string; at: number }
  /** From anywhere else: add, delete or rename a step, load theirs, switch a reading's outcome. */
  | { type: "replace"; update: Update }
  | { type: "undo" }
  | { type: "redo" };

export function startHistory(definition: DraftDefinition): DraftHistory {
  return { past: [], present: definition, future: [], generation: 0, open: null };
}

export function historyReducer(state: DraftHistory, action: HistoryAction): DraftHistory {
  switch (action.type) {
    case "type": {
      const definition = action.update(state.present);
      if (sameValue(definition, state.present)) return state;
      const merge = state.open !== null && state.open.key === action.key && action.at - state.open.at < MERGE_MS;
      const past = merge ? state.past : [...state.past, state.present].slice(-LIMIT);
      return { ...state, past, present: definition, future: [], open: { key: action.key, at: action.at } };
    }
    case "replace": {
      const definition = action.update(state.present);
      if (sameValue(definition, state.present)) return state;
      return { past: [...state.past, state.present].slice(-LIMIT), present: definition, future: [], generation: state.generation + 1, open: null };
    }
    case "undo": {
      const previous = state.past.at(-1);
      if (previous === undefined) return state;
      return { past: state.past.slice(0, -1), present: previous, future: [state.present, ...state.future], generation: state.generation + 1, open: null };
    }
    case "redo": {
      const next = state.future[0];
      if (next === undefined) return state;
      return { past: [...state.past, state.present], present: next, future: state.future.slice(1), generation: state.generation + 1, open: null };
    }
  }
}
