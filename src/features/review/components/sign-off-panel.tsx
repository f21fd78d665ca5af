import { useRef, useState } from "react";
import { z } from "zod";
import { REVIEW_COMMENT_MAX, reviewDecisionRequestSchema, type ReviewDecisionRequest } from "../../../../shared/schemas/review.ts";
import type { SessionDetail } from "../../../../shared/schemas/sessions.ts";
import { Button } from "../../../components/ui/button.tsx";
import { TextArea } from "../../../components/ui/text-area.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { useSignOff } from "../api/sign-off-session.ts";
import { localDayTime } from "../lib/review-words.ts";

type Decision = ReviewDecisionRequest["decision"];

/** The server's word on a sign-off, for the comment field: its own message for the comment, or the refusal's. */
function problemOf(error: unknown): string {
  if (isApiRequestError(error, "invalid_input")) {
    const comment = (error.details as { fieldErrors?: { comment?: string[] } } | undefined)?.fieldErrors?.comment?.[0];
    if (comment) return comment;
  }
  return error instanceof Error ? error.message : "The decision was not saved. Try again.";
}

/** The shop lead's decision on a completed check: approve it, or send it back with what to look at again. */
export function SignOffPanel({ detail }: { detail: SessionDetail }) {
  // Held here, not in the form: the form goes away as soon as the session shows the decision.
  const signOff = useSignOff(detail.id);
  const done = signOff.isSuccess ? signOff.variables.decision : null;
  const waiting = detail.status === "completed" && detail.reviewState === "waiting";
  return (
    <section id="sign-off" tabIndex={-1} aria-labelledby="sign-off-title" className="flex flex-col gap-4 rounded-xl border-2 border-line-strong bg-raised px-5 py-5">
      <h2 id="sign-off-title" className="text-2xl font-semibold">
        Sign-off
      </h2>
      {done && (
        <p role="status" className="rounded-lg border-l-8 border-accent bg-accent-soft px-4 py-3 text-lg font-semibold">
          {done === "approve" ? "Signed off. The check has left the list waiting for sign-off." : `Sent back to ${detail.techName}. Your comment shows on their bench.`}
        </p>
      )}
      {signOff.isError && !waiting && (
        <p role="alert" className="text-lg font-semibold">
          {problemOf(signOff.error)}
        </p>
      )}
      {waiting ? (
        <DecisionForm detail={detail} signOff={signOff} />
      ) : detail.reviewState === "approved" || detail.reviewState === "returned" ? (
        <Decided detail={detail} />
      ) : (
        <p>{detail.status === "abandoned" ? "This check was abandoned: there is nothing to sign off." : `${detail.techName} has not completed this check yet: it can be signed off once it reaches a finding and is completed.`}</p>
      )}
    </section>
  );
}

function Decided({ detail }: { detail: SessionDetail }) {
  const by = detail.reviewerName ? ` by ${detail.reviewerName}` : "";
  const when = detail.reviewedAt ? ` on ${localDayTime(detail.reviewedAt)}` : "";
  return (
    <div className="flex flex-col gap-2">
      <p className="text-lg font-semibold">{detail.reviewState === "approved" ? `Signed off${by}${when}.` : `Sent back to ${detail.techName}${by}${when}.`}</p>
      {detail.reviewComment ? (
        <figure className="flex flex-col gap-1 border-l-8 border-accent pl-4">
          <figcaption className="text-base text-ink-muted">The comment</figcaption>
          <blockquote className="text-xl font-semibold whitespace-pre-line">{detail.reviewComment}</blockquote>
        </figure>
      ) : (
        <p className="text-ink-muted">No comment was left.</p>
      )}
    </div>
  );
}

function DecisionForm({ detail, signOff }: { detail: SessionDetail; signOff: ReturnType<typeof useSignOff> }) {
  const [comment, setComment] = useState("");
  const [error, setError] = useState<string | undefined>();
  const field = useRef<HTMLTextAreaElement>(null);
  const decide = (decision: Decision) => {
    const parsed = reviewDecisionRequestSchema.safeParse({ decision, comment });
    if (!parsed.success) {
      setError(z.flattenError(parsed.error).fieldErrors.comment?.[0] ?? parsed.error.issues[0]?.message);
      field.current?.focus();
      return;
    }
    setError(undefined);
    signOff.mutate(parsed.data, {
      onError: (e) => {
        setError(problemOf(e));
        field.current?.focus();
      },
    });
  };
  const busy = signOff.isPending;
  return (
    <form className="flex flex-col gap-4" onSubmit={(event) => event.preventDefault()} noValidate>
      <p className="max-w-[65ch]">Approve the check as it stands, or send it back to {detail.techName} saying what to look at again.</p>
      <TextArea
        id="sign-off-comment"
        ref={field}
        label="Comment for the tech"
        hint={`Needed to send it back; optional when you approve. Up to ${REVIEW_COMMENT_MAX} characters.`}
        value={comment}
        error={error}
        rows={4}
        onChange={(event) => setComment(event.currentTarget.value)}
      />
      <div className="flex flex-wrap items-center justify-between gap-6">
        <Button variant="primary" size="main" disabled={busy} onClick={() => decide("approve")} className="min-w-56">
          {busy && signOff.variables?.decision === "approve" ? "Signing off…" : "Approve"}
        </Button>
        <Button disabled={busy} onClick={() => decide("return")} className="min-h-14">
          {busy && signOff.variables?.decision === "return" ? "Sending back…" : "Return to the tech"}
        </Button>
      </div>
    </form>
  );
}
