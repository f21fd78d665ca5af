import { useQuery } from "@tanstack/react-query";
import { useLocation, useParams } from "react-router";
import { meQueryOptions } from "../../features/auth/api/get-me.ts";
import { ReviewQueuePage } from "../../features/review/components/review-queue-page.tsx";
import { SessionReviewPage } from "../../features/review/components/session-review-page.tsx";

export function ReviewQueueRoute() {
  return <ReviewQueuePage />;
}

/** A session opened from the queue goes back to that same view of it. */
export function ReviewSessionRoute() {
  const { sessionId = "" } = useParams();
  const { state } = useLocation() as { state: { queueSearch?: unknown } | null };
  // The shell has already loaded the signed-in user; their unit system is the one readings are shown in.
  const me = useQuery(meQueryOptions());
  const queueSearch = typeof state?.queueSearch === "string" ? state.queueSearch : "";
  return <SessionReviewPage key={sessionId} sessionId={sessionId} unitSystem={me.data?.user.unitSystem ?? "metric"} queuePath={`/review${queueSearch}`} />;
}
