import { useState } from "react";
import { Link } from "react-router";
import type { WorkOrderSummary } from "../../../../shared/schemas/work-orders.ts";
import { ageInShop, unitName, workOrderNumber, workOrderPath } from "../lib/work-order-words.ts";
import { WorkOrderStateLabel } from "../../../components/ui/work-order-state-label.tsx";

/** Work orders as big rows: the whole row opens the work order. */
export function WorkOrderRows({ workOrders }: { workOrders: WorkOrderSummary[] }) {
  // Ages are read once when the list opens; a list left up all day is refreshed by navigating.
  const [now] = useState(() => Date.now());
  return (
    <ul className="flex flex-col gap-3">
      {workOrders.map((order) => (
        <li key={order.id}>
          <Link
            to={workOrderPath(order.id)}
            className="grid min-h-16 gap-x-5 gap-y-1 rounded-xl border-2 border-line-strong bg-raised px-5 py-3 text-ink landscape:grid-cols-[7rem_1fr_auto] portrait:grid-cols-[6.5rem_1fr]"
          >
            <span className="text-xl font-semibold tabular-figures">{workOrderNumber(order.number)}</span>
            <span className="flex min-w-0 flex-col">
              <span className="truncate text-lg font-semibold">{order.customerName}</span>
              <span className="truncate">{unitName(order)}</span>
              <span className="truncate text-base text-ink-muted">“{order.complaint}”</span>
            </span>
            <span className="flex flex-col items-start gap-1 landscape:items-end portrait:col-start-2">
              <WorkOrderStateLabel state={order.state} />
              <span className="text-base text-ink-muted tabular-figures">{ageInShop(order.createdAt, now)}</span>
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
