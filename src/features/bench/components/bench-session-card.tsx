import type { ReactNode } from "react";
import { Link } from "react-router";
import type { BenchSession } from "../../../../shared/schemas/sessions.ts";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { sessionPath, startedWords, unitName, workOrderNumber, workOrderPath } from "../lib/bench-words.ts";

export type BenchSessionKind = "open" | "waiting" | "returned";

/** One of the tech's checks: which unit, which check, where it stands, and what to do with it. */
export function BenchSessionCard({ session, kind, now }: { session: BenchSession; kind: BenchSessionKind; now: number }) {
  const number = workOrderNumber(session.workOrderNumber);
  const titleId = `bench-session-${session.sessionId}`;
  return (
    <article aria-labelledby={titleId} className="flex flex-col gap-4 rounded-xl border-2 border-line-strong bg-raised px-5 py-4">
      {(kind === "returned" || session.reviewComment !== null) && <LeadComment sessionId={session.sessionId} comment={session.reviewComment} />}
      <div className="flex flex-col gap-4 landscape:flex-row landscape:items-center">
        <div className="flex min-w-0 flex-1 flex-col gap-1">
          <h3 id={titleId} className="flex flex-wrap items-baseline gap-x-4">
            <span className="text-xl font-semibold tabular-figures">{number}</span>{" "}
            <span className="text-lg font-semibold">{unitName(session.unit)}</span>
          </h3>
          <p>{session.flowTitle}</p>
          <p>
            <span className="text-ink-muted">{kind === "open" ? "At step: " : "Your finding: "}</span>
            <span className="font-semibold">{session.currentStepTitle}</span>
          </p>
          <p className="text-base text-ink-muted tabular-figures">{startedWords(session.startedAt, now)}</p>
        </div>
        <div className="flex flex-col gap-3 portrait:w-full landscape:w-72 landscape:shrink-0">
          <SessionActions session={session} kind={kind} number={number} />
        </div>
      </div>
    </article>
  );
}

function SessionActions({ session, kind, number }: { session: BenchSession; kind: BenchSessionKind; number: string }) {
  // The visible words stay short; a screen reader also hears which work order each button is for.
  const forNumber = (
    <>
      {" "}
      <span className="sr-only">{number}</span>
    </>
  );
  const seeCheck = (
    <Link to={sessionPath(session.sessionId)} className={`${buttonClasses({ variant: "secondary" })} w-full`}>
      See the check{forNumber}
    </Link>
  );
  switch (kind) {
    case "open":
      return (
        <Link to={sessionPath(session.sessionId)} className={`${buttonClasses({ variant: "primary", size: "main" })} w-full`}>
          Carry on{forNumber}
          <ArrowGlyph />
        </Link>
      );
    case "waiting":
      return seeCheck;
    case "returned":
      // A sent-back check is revised where it stands: the check's page opens it again at its finding.
      return (
        <>
          <Link to={sessionPath(session.sessionId)} className={`${buttonClasses({ variant: "primary", size: "main" })} w-full`}>
            Revise the check{forNumber}
            <ArrowGlyph />
          </Link>
          <Link to={workOrderPath(session.workOrderId)} className={`${buttonClasses({ variant: "secondary" })} w-full`}>
            Open the work order{forNumber}
          </Link>
        </>
      );
  }
}

function LeadComment({ sessionId, comment }: { sessionId: string; comment: string | null }): ReactNode {
  const captionId = `bench-comment-${sessionId}`;
  return (
    <figure aria-labelledby={captionId} className="flex flex-col gap-1 rounded-lg border-l-8 border-accent bg-accent-soft px-5 py-4">
      <figcaption id={captionId} className="text-base font-semibold">
        The shop lead says
      </figcaption>
      {comment === null || comment.trim() === "" ? (
        <p className="text-lg">No comment was left. Ask the shop lead what to change before you check it again.</p>
      ) : (
        <blockquote className="text-xl font-semibold whitespace-pre-line">{comment}</blockquote>
      )}
    </figure>
  );
}

function ArrowGlyph() {
  return (
    <svg viewBox="0 0 24 24" className="size-8 shrink-0" aria-hidden="true" focusable="false">
      <path d="M9 5l7 7-7 7" fill="none" strokeWidth="3" strokeLinecap="round" strokeLinejoin="round" className="stroke-current" />
    </svg>
  );
}
