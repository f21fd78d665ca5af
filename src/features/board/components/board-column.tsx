import type { BoardResponse, BoardTicket } from "../../../../shared/schemas/board.ts";
import type { WorkOrderState } from "../../../../shared/schemas/work-orders.ts";
import { WorkOrderStateLabel } from "../../../components/ui/work-order-state-label.tsx";
import { TicketCard } from "./ticket-card.tsx";

type Column = BoardResponse["columns"][number];

interface BoardColumnProps {
  column: Column;
  canMove: boolean;
  movingId: string | null;
  onMove: (ticket: BoardTicket, to: WorkOrderState) => void;
}

export const columnId = (state: WorkOrderState) => `board-column-${state}`;

export function BoardColumn({ column, canMove, movingId, onMove }: BoardColumnProps) {
  const headingId = `${columnId(column.state)}-heading`;
  const more = column.total - column.tickets.length;
  return (
    <section id={columnId(column.state)} aria-labelledby={headingId} className="flex w-72 shrink-0 scroll-ml-2 flex-col rounded-xl bg-sunken">
      {/* Sticks to the top of the board while its cards scroll under it. */}
      <h2 id={headingId} className="sticky top-0 z-10 flex items-center justify-between gap-2 rounded-t-xl border-b-2 border-line bg-sunken px-3 py-3 text-lg">
        <WorkOrderStateLabel state={column.state} />
        <span className="tabular-figures font-semibold" aria-label={`${column.total} ${column.total === 1 ? "work order" : "work orders"}`}>
          {column.total}
        </span>
      </h2>
      <div className="flex flex-col gap-3 p-3">
        {column.tickets.length === 0 ? (
          <p className="px-1 text-base text-ink-muted">Nothing here.</p>
        ) : (
          column.tickets.map((ticket) => <TicketCard key={ticket.id} ticket={ticket} canMove={canMove} busy={movingId === ticket.id} onMove={onMove} />)
        )}
        {more > 0 && <p className="px-1 text-base text-ink-muted">The latest {column.tickets.length} of {column.total}. The rest are in the list of all work orders.</p>}
      </div>
    </section>
  );
}
