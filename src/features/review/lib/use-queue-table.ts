import { useMemo } from "react";
import { useSearchParams } from "react-router";
import { functionalUpdate, useTable, type PaginationState, type SortingState } from "@tanstack/react-table";
import type { ReviewQueueRow, ReviewSort } from "../../../../shared/schemas/review.ts";
import { queueColumns, queueFeatures } from "../components/queue-columns.tsx";
import { readView, withFilters, withPage, withSort, type QueueView } from "./queue-params.ts";
import { columnFiltersOf, filtersOfColumns } from "./queue-table-state.ts";

const noRows: ReviewQueueRow[] = [];

/** The queue's view as the address gives it, and the way to write a new one. */
export function useQueueAddress() {
  const [params, setParams] = useSearchParams();
  const key = params.toString();
  // One view per address; the memos keep the table's inputs stable between renders of the same one.
  const view: QueueView = useMemo(() => readView(new URLSearchParams(key)), [key]);
  return { params, setParams, view };
}
export type QueueAddress = ReturnType<typeof useQueueAddress>;

/**
 * The queue's table with every slice of its state read from the address and written back to it:
 * the server pages, sorts and filters, the table only describes the page it was given.
 */
export function useQueueTable({ params, setParams, view }: QueueAddress, rows: ReviewQueueRow[] | undefined, total: number | undefined) {
  const sorting: SortingState = useMemo(() => [{ id: view.sort, desc: view.order === "desc" }], [view.sort, view.order]);
  const pagination: PaginationState = useMemo(() => ({ pageIndex: view.page - 1, pageSize: view.pageSize }), [view.page, view.pageSize]);
  const columnFilters = useMemo(() => columnFiltersOf(view.filters), [view.filters]);
  const search = view.filters.search ?? "";
  const table = useTable({
    features: queueFeatures,
    columns: queueColumns,
    data: rows ?? noRows,
    rowCount: total ?? 0,
    getRowId: (row) => row.sessionId,
    manualPagination: true,
    manualSorting: true,
    manualFiltering: true,
    autoResetPageIndex: false,
    enableMultiSort: false,
    enableSortingRemoval: false,
    state: { sorting, pagination, columnFilters, globalFilter: search },
    onSortingChange: (updater) => {
      const [next] = functionalUpdate(updater, sorting);
      if (next) setParams(withSort(params, next.id as ReviewSort, next.desc ? "desc" : "asc"));
    },
    onPaginationChange: (updater) => {
      const next = functionalUpdate(updater, pagination);
      setParams(withPage(params, next.pageIndex + 1, next.pageSize));
    },
    onColumnFiltersChange: (updater) => setParams(withFilters(params, filtersOfColumns(functionalUpdate(updater, columnFilters)))),
    // Typing waits for a pause before it gets here; replacing the entry keeps the back button useful.
    onGlobalFilterChange: (updater) => setParams(withFilters(params, { search: String(functionalUpdate(updater, search) ?? "") }), { replace: true }),
  });
  return table;
}

export type QueueTable = ReturnType<typeof useQueueTable>;
