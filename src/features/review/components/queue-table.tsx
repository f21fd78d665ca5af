import type { Header } from "@tanstack/react-table";
import type { ReviewQueueRow } from "../../../../shared/schemas/review.ts";
import type { QueueTable as Table } from "../lib/use-queue-table.ts";
import type { queueFeatures } from "./queue-columns.tsx";

// Three lines a row, four columns wide: fits 704 px (1024 landscape beside the rail) and 772 px (820 portrait).
const rowGrid = "grid grid-cols-[6.5rem_minmax(0,1.15fr)_minmax(0,1fr)_minmax(10.5rem,0.85fr)] gap-x-4 gap-y-1 px-4";

/** The page of sessions; explicit roles keep it a table for readers although its rows are laid out as grids. */
export function QueueTable({ table, busy }: { table: Table; busy: boolean }) {
  return (
    <table role="table" aria-label="Sessions" aria-busy={busy || undefined} className="flex w-full flex-col gap-2">
      <thead role="rowgroup" className="block">
        {table.getHeaderGroups().map((group) => (
          <tr role="row" key={group.id} className={`${rowGrid} items-end border-b-2 border-line-strong pb-2`}>
            {group.headers.map((header) => (
              <th
                role="columnheader"
                scope="col"
                key={header.id}
                aria-sort={sortState(header)}
                className={`${header.column.columnDef.meta?.place ?? ""} text-left text-base font-semibold text-ink-muted`}
              >
                <HeaderLabel header={header} table={table} />
              </th>
            ))}
          </tr>
        ))}
      </thead>
      <tbody role="rowgroup" className="flex flex-col gap-2">
        {table.getRowModel().rows.map((row) => (
          <tr role="row" key={row.id} className={`${rowGrid} relative min-h-16 items-start rounded-lg border-2 border-line-strong bg-raised py-3 has-focus-visible:border-focus`}>
            {row.getAllCells().map((cell) => (
              <td role="cell" key={cell.id} className={`${cell.column.columnDef.meta?.place ?? ""} min-w-0 break-words`}>
                <table.FlexRender cell={cell} />
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

type QueueHeader = Header<typeof queueFeatures, ReviewQueueRow, unknown>;

function sortState(header: QueueHeader): "ascending" | "descending" | undefined {
  const sorted = header.column.getIsSorted();
  return sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined;
}

function HeaderLabel({ header, table }: { header: QueueHeader; table: Table }) {
  const label = <table.FlexRender header={header} />;
  if (!header.column.getCanSort()) return <span className="flex min-h-12 items-end">{label}</span>;
  const sorted = header.column.getIsSorted();
  const [up, down] = header.column.columnDef.meta?.orderWords ?? ["ascending", "descending"];
  return (
    <button
      type="button"
      onClick={header.column.getToggleSortingHandler()}
      className={`inline-flex min-h-12 items-center gap-1 rounded-md px-1 text-left underline-offset-4 ${sorted ? "text-ink underline decoration-2" : ""}`}
    >
      <span>{label}</span>
      {sorted && <span className="sr-only">, sorted {sorted === "asc" ? up : down}</span>}
      <SortGlyph sorted={sorted} />
    </button>
  );
}

function SortGlyph({ sorted }: { sorted: false | "asc" | "desc" }) {
  return (
    <svg viewBox="0 0 24 24" className="size-6 shrink-0" aria-hidden="true" focusable="false">
      <path d="M8 10l4-4 4 4" fill="none" strokeWidth="2.4" strokeLinecap="round" strokeLinejoin="round" className={sorted === "asc" ? "stroke-ink" : "stroke-line-strong"} />
      <path d="M8 14l4 4 4-4" fill="none" strokeWidth="2.4" strokeLinecap="round" strokeLinejoin="round" className={sorted === "desc" ? "stroke-ink" : "stroke-line-strong"} />
    </svg>
  );
}
