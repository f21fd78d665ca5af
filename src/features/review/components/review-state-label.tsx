import { StatePill, type StateShape } from "../../../components/ui/state-pill.tsx";
import { reviewStateWords, type ReviewState, type SessionStatus } from "../lib/review-words.ts";

function shapeOf(state: ReviewState, status: SessionStatus): StateShape {
  if (state === "waiting") return "waiting";
  if (state === "approved") return "signed";
  if (state === "returned") return "back";
  return status === "abandoned" ? "stopped" : "open";
}

/** Where a session stands for review: a word with its own shape, never colour alone. */
export function ReviewStateLabel({ state, status }: { state: ReviewState; status: SessionStatus }) {
  return <StatePill shape={shapeOf(state, status)}>{reviewStateWords(state, status)}</StatePill>;
}
