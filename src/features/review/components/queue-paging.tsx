import { Button } from "../../../components/ui/button.tsx";
import { SelectField } from "../../../components/ui/select-field.tsx";
import { pageSizes } from "../lib/queue-params.ts";
import type { QueueTable } from "../lib/use-queue-table.ts";

/** Where the page sits in the whole list, and the way to the pages either side. */
export function QueuePaging({ table, total }: { table: QueueTable; total: number }) {
  const { pageIndex, pageSize } = table.state.pagination;
  const pages = table.getPageCount();
  const first = pageIndex * pageSize + 1;
  const last = Math.min(total, (pageIndex + 1) * pageSize);
  return (
    <nav aria-label="Pages" className="flex flex-wrap items-end justify-between gap-4">
      <div className="flex flex-col gap-1">
        <p className="font-semibold tabular-figures" aria-live="polite">
          {total === 0 ? "No sessions" : first > total ? "Past the last page" : `${first}–${last} of ${total} sessions`}
        </p>
        {pages > 0 && (
          <p className="text-ink-muted tabular-figures">
            Page {pageIndex + 1} of {pages}
          </p>
        )}
      </div>
      <div className="flex flex-wrap items-end gap-3">
        <SelectField
          id="queue-page-size"
          label="Rows a page"
          value={String(pageSize)}
          onChange={(event) => table.setPageSize(Number(event.currentTarget.value))}
          className="w-40"
        >
          {(pageSizes as readonly number[]).includes(pageSize) ? null : <option value={String(pageSize)}>{pageSize}</option>}
          {pageSizes.map((size) => (
            <option key={size} value={String(size)}>
              {size}
            </option>
          ))}
        </SelectField>
        <Button onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()} className="min-h-14">
          Previous page
        </Button>
        <Button onClick={() => table.nextPage()} disabled={!table.getCanNextPage()} className="min-h-14">
          Next page
        </Button>
      </div>
    </nav>
  );
}
