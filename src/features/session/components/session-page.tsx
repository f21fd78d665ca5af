import { useMemo } from "react";
import { Link } from "react-router";
import { useQuery } from "@tanstack/react-query";
import type { SessionDetail } from "../../../../shared/schemas/sessions.ts";
import { Button, buttonClasses } from "../../../components/ui/button.tsx";
import { FieldError } from "../../../components/ui/field-error.tsx";
import { compiledVersionOf } from "../../../lib/compiled-version.ts";
import { useReopenSession } from "../api/end-session.ts";
import { sessionQueryOptions } from "../api/get-session.ts";
import { SessionRunner } from "./session-runner.tsx";
import { FindingSummary } from "./finding-screen.tsx";
import { replaySession } from "../../../../shared/flow/session-log.ts";

const closedWords: Record<SessionDetail["reviewState"], string> = {
  not_submitted: "This check is closed.",
  waiting: "Completed: the check now waits for the shop lead's review.",
  approved: "Completed and approved by the shop lead.",
  returned: "The shop lead sent this check back.",
};

function LeadComment({ comment }: { comment: string }) {
  return (
    <section aria-labelledby="lead-comment" className="flex max-w-[70ch] flex-col gap-2 rounded-lg border-2 border-accent bg-accent-soft px-5 py-4">
      <h2 id="lead-comment" className="text-lg font-semibold">
        The shop lead says
      </h2>
      <p className="text-xl font-semibold whitespace-pre-line">{comment}</p>
    </section>
  );
}

/** A returned check goes back on the bench where it stood; the tech steps back from the finding to redo what was asked. */
function ReviseActions({ sessionId }: { sessionId: string }) {
  const reopen = useReopenSession(sessionId);
  return (
    <div className="flex max-w-[70ch] flex-col gap-3">
      <div className="flex flex-wrap items-center gap-3">
        <Button variant="primary" size="main" disabled={reopen.isPending} onClick={() => reopen.mutate()}>
          {reopen.isPending ? "Opening…" : "Open the check again to revise it"}
        </Button>
        <Link to="/bench" className={buttonClasses({ size: "main" })}>
          Back to the bench
        </Link>
      </div>
      <p className="text-base">Every answer stays on record; going back and answering again shows as a revision.</p>
      {reopen.isError && <FieldError id={`${sessionId}-reopen-error`} message={reopen.error.message} />}
    </div>
  );
}

function ClosedSession({ detail }: { detail: SessionDetail }) {
  const compiled = compiledVersionOf(detail);
  const replayed = useMemo(() => replaySession(compiled, detail.input, detail.events.map((e) => e.event)), [compiled, detail]);
  const step = replayed.ok ? compiled.steps[replayed.stepId] : undefined;
  return (
    <div className="flex flex-col gap-6">
      <p role="status" className="max-w-[70ch] rounded-lg border-2 border-line-strong bg-raised px-5 py-4 text-lg font-semibold">
        {detail.status === "abandoned" ? "This check was abandoned." : closedWords[detail.reviewState]}
      </p>
      {detail.reviewState === "returned" && detail.reviewComment && <LeadComment comment={detail.reviewComment} />}
      {detail.status === "completed" && detail.reviewState === "returned" ? (
        <ReviseActions sessionId={detail.id} />
      ) : (
        <Link to="/bench" className={`${buttonClasses({ variant: "primary", size: "main" })} self-start`}>
          Back to the bench
        </Link>
      )}
      {replayed.ok && step?.kind === "finding" && <FindingSummary compiled={compiled} step={step} context={replayed.context} />}
    </div>
  );
}

function OpenSession({ detail, unitSystem }: { detail: SessionDetail; unitSystem: "imperial" | "metric" }) {
  const compiled = compiledVersionOf(detail);
  return (
    <div className="flex flex-col gap-4">
      {detail.reviewState === "returned" && detail.reviewComment && <LeadComment comment={detail.reviewComment} />}
      <SessionRunner detail={detail} compiled={compiled} unitSystem={unitSystem} />
    </div>
  );
}

export function SessionPage({ sessionId, unitSystem }: { sessionId: string; unitSystem: "imperial" | "metric" }) {
  // Opening a check always asks the server: the copy kept on the tablet may be a save or two behind.
  const session = useQuery({ ...sessionQueryOptions(sessionId), refetchOnMount: "always" });
  if (session.isPending) return <p className="text-lg">Opening the check…</p>;
  if (session.isError && !session.data) {
    return (
      <div role="alert" className="flex max-w-[70ch] flex-col gap-3">
        <h1 className="text-step font-semibold">The check could not be opened</h1>
        <p>{session.error.message} Check the connection, then open it again from the bench.</p>
        <Link to="/bench" className={`${buttonClasses({ variant: "primary", size: "main" })} self-start`}>
          Back to the bench
        </Link>
      </div>
    );
  }
  const detail = session.data;
  if (detail.status !== "open") return <ClosedSession detail={detail} />;
  // Keyed by id: a different session starts from its own log.
  return <OpenSession key={detail.id} detail={detail} unitSystem={unitSystem} />;
}
