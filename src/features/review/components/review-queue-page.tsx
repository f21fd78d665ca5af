import { useState } from "react";
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { Link } from "react-router";
import { reviewOptionsQueryOptions } from "../api/get-review-options.ts";
import { reviewQueueQueryOptions } from "../api/list-review-sessions.ts";
import { extraFilterCount, queueRequest, withoutFilters } from "../lib/queue-params.ts";
import { allSessionsSearch, flaggedWaitingSearch, waitingSearch } from "../lib/queue-views.ts";
import { queueRefusalOf } from "../lib/queue-refusal.ts";
import { useQueueAddress, useQueueTable } from "../lib/use-queue-table.ts";
import { QueueFilters } from "./queue-filters.tsx";
import { QueuePaging } from "./queue-paging.tsx";
import { QueueSearch } from "./queue-search.tsx";
import { EmptyQueue, PastTheEnd, QueueFailed, QueueRefused } from "./queue-states.tsx";
import { QueueTable } from "./queue-table.tsx";

/** The shop lead's home: finished checks to go through, a page at a time, with the whole view in the address. */
export function ReviewQueuePage() {
  const options = useQuery(reviewOptionsQueryOptions());
  const address = useQueueAddress();
  const { view, params, setParams } = address;
  // While another page loads, the last one stays up rather than flashing an empty list.
  const queue = useQuery({ ...reviewQueueQueryOptions(queueRequest(params)), placeholderData: keepPreviousData });
  const table = useQueueTable(address, queue.data?.rows, queue.data?.total);
  const refusal = queue.isError ? queueRefusalOf(queue.error) : null;
  const errors = refusal?.byParam ?? {};
  // The filters behind the button that are on (the search has its own box).
  const panelFilters = extraFilterCount(view.filters) - (view.filters.search ? 1 : 0);
  const [showFilters, setShowFilters] = useState(panelFilters > 0);
  const waitingOnly = view.filters.reviewState === "waiting" && extraFilterCount(view.filters) === 0;
  const flaggedWaiting = view.filters.reviewState === "waiting" && view.filters.flagged === "true" && extraFilterCount(view.filters) === 1;
  const clear = () => setParams(withoutFilters(params));
  return (
    <div className="flex max-w-6xl flex-col gap-6">
      <div className="flex flex-col gap-1">
        <h1 className="text-step font-semibold">Review</h1>
        <p className="max-w-[65ch] text-ink-muted">Go through each finished check step by step, then sign it off or send it back to the tech with a comment.</p>
      </div>
      <Presets reviewState={view.filters.reviewState} waitingOnly={waitingOnly} flaggedWaiting={flaggedWaiting} />
      <div role="search" aria-label="Sessions" className="flex flex-col gap-4">
        <div className="grid grid-cols-[1fr_auto] items-end gap-4">
          <QueueSearch value={view.filters.search ?? ""} error={errors.search} onSearch={(text) => table.setGlobalFilter(text)} />
          <button type="button" aria-expanded={showFilters} aria-controls="queue-filters" className="inline-flex min-h-14 items-center gap-2 rounded-lg border-2 border-line-strong bg-raised px-5 font-semibold" onClick={() => setShowFilters(!showFilters)}>
            {showFilters ? "Hide filters" : "Filters"}
            {panelFilters > 0 && <span className="rounded-full bg-ink px-2 text-base text-surface tabular-figures">{panelFilters} on</span>}
          </button>
        </div>
        {showFilters && (
          <div id="queue-filters" className="flex flex-col gap-3">
            <QueueFilters table={table} filters={view.filters} options={options.data} errors={errors} />
            {extraFilterCount(view.filters) > 0 && (
              <button type="button" className="self-start font-semibold text-accent underline decoration-2 underline-offset-4 min-h-12" onClick={clear}>
                Clear filters
              </button>
            )}
          </div>
        )}
      </div>
      {refusal ? (
        <QueueRefused messages={refusal.messages} />
      ) : queue.isError ? (
        <QueueFailed message={queue.error.message} onRetry={() => void queue.refetch()} />
      ) : queue.isPending ? (
        <p className="text-ink-muted">Loading sessions…</p>
      ) : queue.data.total === 0 ? (
        <EmptyQueue waitingOnly={waitingOnly} onClear={clear} />
      ) : queue.data.rows.length === 0 ? (
        <PastTheEnd page={view.page} pages={table.getPageCount()} onLast={() => table.lastPage()} onFirst={() => table.firstPage()} />
      ) : (
        <QueueTable table={table} busy={queue.isPlaceholderData} />
      )}
      {queue.data && !refusal && queue.data.total > 0 && <QueuePaging table={table} total={queue.data.total} />}
    </div>
  );
}

/** The views a shop lead goes between most: what waits for them, what of it is flagged, and everything. */
function Presets({ reviewState, waitingOnly, flaggedWaiting }: { reviewState: string | undefined; waitingOnly: boolean; flaggedWaiting: boolean }) {
  const views = [
    { search: waitingSearch, label: "Waiting for sign-off", on: waitingOnly },
    { search: flaggedWaitingSearch, label: "Flagged, waiting", on: flaggedWaiting },
    { search: allSessionsSearch, label: "All sessions", on: reviewState === undefined },
  ];
  return (
    <nav aria-label="Views" className="flex flex-wrap gap-3">
      {views.map((view) => (
        <Link
          key={view.search}
          to={{ search: view.search }}
          aria-current={view.on ? "page" : undefined}
          className={`inline-flex min-h-14 items-center rounded-lg border-2 px-5 font-semibold ${view.on ? "border-accent bg-accent text-accent-ink" : "border-line-strong bg-raised text-ink"}`}
        >
          {view.label}
        </Link>
      ))}
    </nav>
  );
}
