import { Link, useLocation } from "react-router";
import {
  columnFilteringFeature,
  createColumnHelper,
  filterFn_equalsString,
  filterFn_inDateRange,
  globalFilteringFeature,
  metaHelper,
  rowPaginationFeature,
  rowSortingFeature,
  tableFeatures,
} from "@tanstack/react-table";
import type { ReviewQueueRow } from "../../../../shared/schemas/review.ts";
import { kindLabel, localDay, localTime, makeModel, reviewSessionPath, workOrderNumber } from "../lib/review-words.ts";
import { FlagCount } from "./flag-mark.tsx";
import { ReviewStateLabel } from "./review-state-label.tsx";

export interface QueueColumnMeta {
  /** Where the cell sits in a row's three-line grid (header and body alike). */
  place: string;
  /** How the order reads when sorted on this column, ascending then descending. */
  orderWords?: [string, string];
}

// The server pages, sorts and filters (the table runs manual); the named filter functions only say what each filter means.
export const queueFeatures = tableFeatures({
  rowSortingFeature,
  rowPaginationFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  filterFns: { equalsString: filterFn_equalsString, inDateRange: filterFn_inDateRange },
  columnMeta: metaHelper<QueueColumnMeta>(),
});

const helper = createColumnHelper<typeof queueFeatures, ReviewQueueRow>();
const fixed = { enableSorting: false, enableColumnFilter: false } as const;
const oldestFirst: [string, string] = ["oldest first", "newest first"];
const alphabetical: [string, string] = ["A to Z", "Z to A"];

/** The stored time in the tablet's zone, the day over the time of day. */
function When({ iso, none }: { iso: string | null; none: string }) {
  if (iso === null) return <span className="text-ink-muted">{none}</span>;
  return (
    <time dateTime={iso} className="flex flex-col tabular-figures">
      <span>{localDay(iso)}</span>
      <span className="text-ink-muted">{localTime(iso)}</span>
    </time>
  );
}

/** The work order number opens the session; its hit area covers the whole row. */
function RowLink({ row }: { row: ReviewQueueRow }) {
  const { search } = useLocation();
  return (
    <Link
      to={reviewSessionPath(row.sessionId)}
      state={{ queueSearch: search }}
      className="text-xl font-semibold text-ink tabular-figures underline decoration-2 underline-offset-4 after:absolute after:inset-0 after:rounded-lg focus-visible:outline-none focus-visible:after:outline-3 focus-visible:after:outline-focus"
    >
      {workOrderNumber(row.workOrderNumber)}
    </Link>
  );
}

export const queueColumns = helper.columns([
  helper.accessor("workOrderNumber", { id: "workOrder", header: "Work order", ...fixed, cell: ({ row }) => <RowLink row={row.original} />, meta: { place: "col-start-1 row-start-1 row-span-3" } }),
  helper.accessor("customer", { id: "customer", header: "Customer", ...fixed, cell: ({ row }) => <span className="font-semibold">{row.original.customer}</span>, meta: { place: "col-start-2 row-start-1" } }),
  helper.accessor((r) => r.unit.equipmentKind, {
    id: "unit",
    header: "Unit",
    enableSorting: false,
    filterFn: "equalsString",
    cell: ({ row }) => (
      <span>
        {makeModel(row.original.unit)} <span className="text-ink-muted">{kindLabel(row.original.unit.equipmentKind).toLowerCase()}</span>
      </span>
    ),
    meta: { place: "col-start-2 row-start-2" },
  }),
  helper.accessor("techName", {
    id: "tech",
    header: "Tech",
    sortDescFirst: false,
    filterFn: "equalsString",
    cell: ({ row }) => (
      <span>
        <span className="text-ink-muted">by </span>
        <span>{row.original.techName}</span>
      </span>
    ),
    meta: { place: "col-start-2 row-start-3", orderWords: alphabetical },
  }),
  helper.accessor((r) => r.flow.title, {
    id: "flow",
    header: "Flow",
    sortDescFirst: false,
    filterFn: "equalsString",
    cell: ({ row }) => `${row.original.flow.title} v.${row.original.flow.version}`,
    meta: { place: "col-start-3 row-start-1", orderWords: alphabetical },
  }),
  helper.accessor("findingStepTitle", {
    id: "finding",
    header: "Finding",
    enableSorting: false,
    filterFn: "equalsString",
    cell: ({ row }) => row.original.findingStepTitle ?? <span className="text-ink-muted">No finding yet</span>,
    meta: { place: "col-start-3 row-start-2" },
  }),
  helper.accessor("startedAt", { id: "startedAt", header: "Started", sortDescFirst: true, filterFn: "inDateRange", cell: ({ row }) => <When iso={row.original.startedAt} none="" />, meta: { place: "col-start-3 row-start-3", orderWords: oldestFirst } }),
  helper.accessor("completedAt", {
    id: "completedAt",
    header: "Completed",
    sortDescFirst: true,
    enableColumnFilter: false,
    cell: ({ row }) => <When iso={row.original.completedAt} none="Not completed" />,
    meta: { place: "col-start-4 row-start-3", orderWords: oldestFirst },
  }),
  helper.accessor("reviewState", {
    id: "reviewState",
    header: "Review",
    enableSorting: false,
    filterFn: "equalsString",
    cell: ({ row }) => <ReviewStateLabel state={row.original.reviewState} status={row.original.status} />,
    meta: { place: "col-start-4 row-start-1" },
  }),
  helper.accessor("flagCount", { id: "flags", header: "Flags", enableSorting: false, filterFn: "equalsString", cell: ({ row }) => <FlagCount count={row.original.flagCount} />, meta: { place: "col-start-4 row-start-2" } }),
]);
