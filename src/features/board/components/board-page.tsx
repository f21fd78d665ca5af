import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { Link } from "react-router";
import type { BoardTicket } from "../../../../shared/schemas/board.ts";
import type { WorkOrderState } from "../../../../shared/schemas/work-orders.ts";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { boardQueryOptions } from "../api/get-board.ts";
import { useMoveWorkOrder } from "../api/move-work-order.ts";
import { stateLabel, ticketNumber, ticketPath } from "../lib/board-words.ts";
import { BoardColumn, columnId } from "./board-column.tsx";

type Outcome = { kind: "moved"; text: string } | { kind: "refused"; title: string; text: string; ticket: BoardTicket };

/** Every work order by state, oldest in its state first; each card moves on with one tap. */
export function BoardPage({ canMove }: { canMove: boolean }) {
  const board = useQuery(boardQueryOptions());
  const move = useMoveWorkOrder();
  const [outcome, setOutcome] = useState<Outcome | null>(null);

  const onMove = (ticket: BoardTicket, to: WorkOrderState) => {
    setOutcome(null);
    move.mutate(
      { workOrderId: ticket.id, to, expectedFrom: ticket.state },
      {
        onSuccess: (moved) => setOutcome({ kind: "moved", text: `${ticketNumber(moved.number)} moved to ${stateLabel(moved.state)}.` }),
        onError: (error) =>
          setOutcome({
            kind: "refused",
            title: `${ticketNumber(ticket.number)} was not moved.`,
            text: isApiRequestError(error) && error.status === 409 ? error.message : "Benchpath could not reach the shop's server. Check the network, then try the move again.",
            ticket,
          }),
      },
    );
  };

  const jumpTo = (state: WorkOrderState) => document.getElementById(columnId(state))?.scrollIntoView({ behavior: "smooth", inline: "start", block: "nearest" });

  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-center justify-between gap-4">
        <h1 className="text-step font-semibold">Work-order board</h1>
        <Link to="/work-orders" className="inline-flex min-h-12 items-center font-semibold text-accent underline decoration-2 underline-offset-4">
          Work orders as a list
        </Link>
      </div>
      <div role="status" aria-live="polite" className={outcome?.kind === "moved" ? "rounded-lg border-2 border-accent bg-accent-soft px-4 py-3 font-semibold" : "sr-only"}>
        {outcome?.kind === "moved" ? outcome.text : ""}
      </div>
      {outcome?.kind === "refused" && (
        <FormProblem title={outcome.title}>
          <p>{outcome.text}</p>
          <Link to={ticketPath(outcome.ticket.id)} className="inline-flex min-h-12 items-center font-semibold text-accent underline decoration-2 underline-offset-4">
            Open {ticketNumber(outcome.ticket.number)}
          </Link>
        </FormProblem>
      )}
      {board.isError && !board.data ? (
        <FormProblem title="The board did not load.">Check that this tablet is on the shop's network, then reload.</FormProblem>
      ) : !board.data ? (
        <p className="text-ink-muted">Loading the board…</p>
      ) : (
        <>
          <nav aria-label="Jump to a state" className="-mx-1 flex gap-2 overflow-x-auto px-1 pb-1">
            {board.data.columns.map((column) => (
              <button
                key={column.state}
                type="button"
                onClick={() => jumpTo(column.state)}
                className="inline-flex min-h-12 shrink-0 items-center gap-2 rounded-full border-2 border-line-strong bg-raised px-4 text-base font-semibold whitespace-nowrap"
              >
                {stateLabel(column.state)}
                <span className="tabular-figures rounded-full bg-sunken px-2">{column.total}</span>
              </button>
            ))}
          </nav>
          <div
            role="region"
            aria-label="Board: scroll sideways for more states"
            tabIndex={0}
            className="max-h-[calc(100dvh-18rem)] min-h-[24rem] overflow-auto overscroll-contain rounded-xl border-2 border-line focus-visible:outline-3 focus-visible:outline-focus"
          >
            <div className="flex w-max items-start gap-3 p-2">
              {board.data.columns.map((column) => (
                <BoardColumn key={column.state} column={column} canMove={canMove} movingId={move.isPending ? (move.variables?.workOrderId ?? null) : null} onMove={onMove} />
              ))}
            </div>
          </div>
        </>
      )}
    </div>
  );
}
