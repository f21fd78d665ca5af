import type { TimelineAnswer } from "../../../../shared/review/timeline.ts";
import { VerdictMark } from "../../../components/ui/verdict-mark.tsx";
import { amountWords } from "../lib/review-words.ts";

/** An answer in a few words, as it stands in "changed from …". */
export function answerWords(answer: TimelineAnswer) {
  switch (answer.kind) {
    case "done":
      return "Done";
    case "choice":
      return answer.label;
    case "reading":
      return amountWords(answer.entered);
  }
}

/** What the tech answered: the choice's label, or the reading as entered and in the viewer's units with its verdict. */
export function AnswerView({ answer }: { answer: TimelineAnswer }) {
  if (answer.kind !== "reading") {
    return (
      <p className="text-lg">
        <span className="text-ink-muted">Answer: </span>
        <span className="font-semibold">{answerWords(answer)}</span>
      </p>
    );
  }
  return (
    <div className="flex flex-col gap-1">
      <p className="flex flex-wrap items-baseline gap-x-3 text-lg">
        <span className="text-ink-muted">Reading:</span>
        <span className="text-2xl font-semibold tabular-figures">{amountWords(answer.entered)}</span>
        {answer.converted && <span className="font-semibold tabular-figures">({amountWords(answer.converted)})</span>}
      </p>
      <div className="flex flex-wrap items-center gap-x-4 gap-y-1">
        <VerdictMark verdict={answer.verdict} size="small" />
        {answer.band && <span className="font-semibold">“{answer.band}”</span>}
      </div>
      <p className="max-w-[70ch] text-ink-muted">{answer.reason}</p>
    </div>
  );
}
