import type { WorkOrderDetail } from "../../../../shared/schemas/work-orders.ts";

type Session = WorkOrderDetail["sessions"][number];

const statusWords: Record<Session["status"], string> = { open: "Open", completed: "Finished", abandoned: "Abandoned" };
const startedFormat = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });

/** The checks run on this unit so far, newest first. */
export function SessionList({ sessions }: { sessions: Session[] }) {
  const newestFirst = [...sessions].sort((a, b) => b.startedAt.localeCompare(a.startedAt));
  return (
    <section aria-labelledby="sessions" className="flex flex-col gap-4">
      <h2 id="sessions" className="text-2xl font-semibold">
        Checks on this unit
      </h2>
      {newestFirst.length === 0 ? (
        <p className="text-ink-muted">No check has been started yet.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {newestFirst.map((session) => (
            <li key={session.id} className="flex flex-col gap-2 rounded-xl border-2 border-line-strong bg-raised px-5 py-4">
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <p className="text-lg font-semibold">
                  {session.flowTitle} <span className="font-normal text-ink-muted">version {session.flowVersion}</span>
                </p>
                <p className="font-semibold">{statusWords[session.status]}</p>
              </div>
              <p>
                {session.techName}, started {startedFormat.format(new Date(session.startedAt))}
              </p>
              <p>{session.findingTitle ? `Finding: ${session.findingTitle}` : "No finding yet."}</p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
