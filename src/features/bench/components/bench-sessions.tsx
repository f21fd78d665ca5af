import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import type { BenchSession } from "../../../../shared/schemas/sessions.ts";
import { Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { benchHomeQueryOptions } from "../api/get-bench-home.ts";
import { BenchSessionCard, type BenchSessionKind } from "./bench-session-card.tsx";

const headingId = "bench-checks";

/** The tech's own checks in three groups: going on, waiting for the shop lead, and sent back. */
export function BenchSessions() {
  const home = useQuery(benchHomeQueryOptions());
  // Start times are read against the moment the bench opened; opening it again refreshes them.
  const [now] = useState(() => Date.now());

  if (home.isPending) {
    return (
      <section aria-labelledby={headingId} className="flex flex-col gap-4">
        <h2 id={headingId} className="text-2xl font-semibold">
          Your checks
        </h2>
        <p role="status">Loading your checks…</p>
      </section>
    );
  }

  const tryAgain = (
    <Button onClick={() => void home.refetch()} disabled={home.isFetching} className="mt-2">
      {home.isFetching ? "Trying again…" : "Try again"}
    </Button>
  );

  if (home.isError && !home.data) {
    return (
      <section aria-labelledby={headingId} className="flex flex-col gap-4">
        <h2 id={headingId} className="text-2xl font-semibold">
          Your checks
        </h2>
        <FormProblem title="Your checks did not load.">
          <p>Check that this tablet is on the shop's network, then try again. Nothing you saved is lost.</p>
          {tryAgain}
        </FormProblem>
      </section>
    );
  }

  const { open, waitingForReview, returned } = home.data;
  return (
    <>
      {home.isError && (
        <FormProblem title="Your checks could not be brought up to date.">
          <p>These are the checks as they stood when the bench last loaded. Check the shop's network, then try again.</p>
          {tryAgain}
        </FormProblem>
      )}
      <SessionGroup id="bench-open" kind="open" title="Your open checks" sessions={open} now={now} empty="No check in progress. Start one on a unit that is waiting below, or check in a new unit." />
      <SessionGroup id="bench-returned" kind="returned" title="Sent back by the shop lead" sessions={returned} now={now} empty="Nothing has been sent back to you." />
      <SessionGroup id="bench-review" kind="waiting" title="Waiting for the shop lead's review" sessions={waitingForReview} now={now} empty="None of your finished checks is waiting for review." />
    </>
  );
}

interface SessionGroupProps {
  id: string;
  kind: BenchSessionKind;
  title: string;
  sessions: BenchSession[];
  now: number;
  empty: string;
}

function SessionGroup({ id, kind, title, sessions, now, empty }: SessionGroupProps) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-4">
      <h2 id={id} className="text-2xl font-semibold">
        {title} ({sessions.length})
      </h2>
      {sessions.length === 0 ? (
        <p>{empty}</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {sessions.map((session) => (
            <li key={session.sessionId}>
              <BenchSessionCard session={session} kind={kind} now={now} />
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
