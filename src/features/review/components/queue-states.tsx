import { Link } from "react-router";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { allSessionsSearch } from "../lib/queue-views.ts";

const frame = "flex flex-col items-start gap-3 rounded-xl border-2 border-dashed border-line-strong px-5 py-4";

/** Nothing matches: on the waiting view that is good news; otherwise the filters are too narrow. */
export function EmptyQueue({ waitingOnly, onClear }: { waitingOnly: boolean; onClear: () => void }) {
  if (waitingOnly) {
    return (
      <div className={frame}>
        <p className="font-semibold">Nothing is waiting for sign-off.</p>
        <p>When a tech completes a check, it shows up here for you to go through.</p>
        <Link to={{ search: allSessionsSearch }} className={buttonClasses()}>
          See all sessions
        </Link>
      </div>
    );
  }
  return (
    <div className={frame}>
      <p className="font-semibold">No session matches these filters.</p>
      <p>Take a filter off, or clear them all to see every session.</p>
      <button type="button" className={buttonClasses()} onClick={onClear}>
        Clear filters
      </button>
    </div>
  );
}

/** A page number beyond the last page (an old link, or fewer sessions than before). */
export function PastTheEnd({ page, pages, onLast, onFirst }: { page: number; pages: number; onLast: () => void; onFirst: () => void }) {
  return (
    <div className={frame}>
      <p className="font-semibold">
        There is no page {page}: these filters give {pages} {pages === 1 ? "page" : "pages"}.
      </p>
      <div className="flex flex-wrap gap-3">
        <button type="button" className={buttonClasses()} onClick={onLast}>
          Go to the last page
        </button>
        <button type="button" className={buttonClasses({ variant: "quiet" })} onClick={onFirst}>
          Back to the first page
        </button>
      </div>
    </div>
  );
}

/** The server refused the address (a hand-edited link): say what it said, and offer a clean start. */
export function QueueRefused({ messages }: { messages: string[] }) {
  return (
    <FormProblem title="This view of the queue cannot be shown.">
      <ul className="flex list-disc flex-col gap-1 pl-5">
        {messages.map((message) => (
          <li key={message}>{message}</li>
        ))}
      </ul>
      <Link to={{ search: allSessionsSearch }} className={`${buttonClasses()} mt-3`}>
        Clear filters
      </Link>
    </FormProblem>
  );
}

export function QueueFailed({ message, onRetry }: { message: string; onRetry: () => void }) {
  return (
    <FormProblem title="The sessions did not load.">
      <p>{message} Check that this tablet is on the shop's network, then try again.</p>
      <button type="button" className={`${buttonClasses()} mt-3`} onClick={onRetry}>
        Try again
      </button>
    </FormProblem>
  );
}
