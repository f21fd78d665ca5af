import { useCallback, useMemo, useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { Link } from "react-router";
import type { UnitSystem } from "../../../../shared/equipment.ts";
import { sessionTimeline } from "../../../../shared/review/timeline.ts";
import type { SessionDetail } from "../../../../shared/schemas/sessions.ts";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { compiledVersionOf } from "../../../lib/compiled-version.ts";
import { reviewSessionQueryOptions } from "../api/get-review-session.ts";
import { sessionFlagsQueryOptions } from "../api/get-session-flags.ts";
import { FlagsPanel } from "./flags-panel.tsx";
import { PhotoViewer, type ViewerPhoto } from "./photo-viewer.tsx";
import { SessionFacts } from "./session-facts.tsx";
import { SignOffPanel } from "./sign-off-panel.tsx";
import { entryAnchor, TimelineEntryView } from "./timeline-entry.tsx";

interface SessionReviewPageProps {
  sessionId: string;
  unitSystem: UnitSystem;
  /** The queue as the shop lead left it. */
  queuePath: string;
}

export function SessionReviewPage({ sessionId, unitSystem, queuePath }: SessionReviewPageProps) {
  const session = useQuery(reviewSessionQueryOptions(sessionId));
  const back = (
    <Link to={queuePath} className={`${buttonClasses()} self-start`}>
      Back to the queue
    </Link>
  );
  if (session.isPending) return <p className="text-lg">Opening the session…</p>;
  if (session.isError) {
    const missing = isApiRequestError(session.error) && session.error.status === 404;
    return (
      <div role="alert" className="flex max-w-[70ch] flex-col gap-3">
        <h1 className="text-step font-semibold">{missing ? "No such session" : "The session could not be opened"}</h1>
        <p>{missing ? "It may have been typed wrong, or the link is old." : `${session.error.message} Check the connection, then open it again.`}</p>
        {back}
      </div>
    );
  }
  return <SessionReview detail={session.data} unitSystem={unitSystem} back={back} />;
}

function SessionReview({ detail, unitSystem, back }: { detail: SessionDetail; unitSystem: UnitSystem; back: React.ReactNode }) {
  const flags = useQuery(sessionFlagsQueryOptions(detail.id));
  const entries = useMemo(
    () => sessionTimeline({ flow: compiledVersionOf(detail), input: detail.input, events: detail.events, startedAt: detail.startedAt, status: detail.status, abandonReason: detail.abandonReason }, unitSystem),
    [detail, unitSystem],
  );
  const photos: ViewerPhoto[] = useMemo(() => entries.flatMap((e) => (e.kind === "step" || e.kind === "finding" ? e.photos.map((p) => ({ attachmentId: p.attachmentId, at: p.at, stepTitle: e.title })) : [])), [entries]);
  const anchors = useMemo(() => {
    const byStep = new Map<string, string>();
    // The last visit of a step is the one its answer stands in.
    for (const e of entries) if (e.kind === "step" || e.kind === "finding") byStep.set(e.stepId, entryAnchor(e.key));
    return byStep;
  }, [entries]);
  const [viewing, setViewing] = useState<number | null>(null);
  const photoNumber = useCallback((attachmentId: string) => photos.findIndex((p) => p.attachmentId === attachmentId), [photos]);
  const closeViewer = useCallback(() => setViewing(null), []);
  const waiting = detail.status === "completed" && detail.reviewState === "waiting";
  return (
    <div className="flex max-w-5xl flex-col gap-8">
      {back}
      <SessionFacts detail={detail} />
      {waiting && (
        <button type="button" className="self-start font-semibold text-accent underline decoration-2 underline-offset-4 min-h-12" onClick={() => document.getElementById("sign-off")?.focus()}>
          Go to the sign-off
        </button>
      )}
      <FlagsPanel flags={flags.data?.flags} failed={flags.isError ? flags.error.message : null} anchorOf={(stepId) => anchors.get(stepId) ?? null} />
      <section aria-labelledby="timeline-title" className="flex flex-col gap-3">
        <h2 id="timeline-title" className="text-2xl font-semibold">
          Step by step
        </h2>
        <ol className="flex flex-col gap-3">
          {entries.map((entry) => (
            <TimelineEntryView key={entry.key} entry={entry} photoNumber={photoNumber} photoCount={photos.length} onOpenPhoto={setViewing} stillOpen={detail.status === "open"} />
          ))}
        </ol>
      </section>
      <SignOffPanel detail={detail} />
      {viewing !== null && <PhotoViewer photos={photos} index={viewing} onIndex={setViewing} onClose={closeViewer} />}
    </div>
  );
}
