import { Link } from "react-router";
import type { BoardTicket } from "../../../../shared/schemas/board.ts";
import type { WorkOrderState } from "../../../../shared/schemas/work-orders.ts";
import { movedWords, ticketNumber, ticketPath, timeInState, unitWords } from "../lib/board-words.ts";
import { MoveControl } from "./move-control.tsx";

interface TicketCardProps {
  ticket: BoardTicket;
  canMove: boolean;
  busy: boolean;
  onMove: (ticket: BoardTicket, to: WorkOrderState) => void;
}

export function TicketCard({ ticket, canMove, busy, onMove }: TicketCardProps) {
  const number = ticketNumber(ticket.number);
  const headingId = `ticket-${ticket.id}`;
  return (
    <article aria-labelledby={headingId} className="flex flex-col gap-1.5 rounded-xl border-2 border-line-strong bg-raised px-4 pt-2 pb-4">
      <h3 id={headingId} className="text-xl font-semibold tabular-figures">
        <Link to={ticketPath(ticket.id)} className="inline-flex min-h-12 items-center text-accent underline decoration-2 underline-offset-4">
          {number}
        </Link>
      </h3>
      <p className="font-semibold">{ticket.customerName}</p>
      <p className="leading-snug">{unitWords(ticket)}</p>
      <p className="text-base text-ink-muted">{timeInState(ticket.secondsInState)}</p>
      <p className="text-base text-ink-muted">{movedWords(ticket.movedBy, ticket.movedAt)}</p>
      {ticket.state === "test_run" && (
        <p className="text-base">
          <Link to={ticketPath(ticket.id)} className="font-semibold text-accent underline decoration-2 underline-offset-4">
            Record the test run
          </Link>{" "}
          before it is ready for pick-up.
        </p>
      )}
      {canMove && (
        <div className="pt-2">
          <MoveControl number={number} state={ticket.state} busy={busy} onMove={(to) => onMove(ticket, to)} />
        </div>
      )}
    </article>
  );
}
