import { useQueries } from "@tanstack/react-query";
import { Link } from "react-router";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { workOrderListQueryOptions } from "../api/list-work-orders.ts";
import { WorkOrderRows } from "./work-order-rows.tsx";

const queueStates = ["waiting_for_diagnosis", "diagnosing"] as const;

/** Units on the shelf for the bench: waiting for a check or being checked, oldest first. */
export function WorkOrderQueue({ headingId }: { headingId: string }) {
  const results = useQueries({ queries: queueStates.map((state) => workOrderListQueryOptions({ search: "", state })) });
  const failed = results.some((result) => result.isError);
  const loading = results.some((result) => result.isPending);
  const workOrders = results.flatMap((result) => result.data ?? []).sort((a, b) => a.createdAt.localeCompare(b.createdAt));

  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-4">
      <h2 id={headingId} className="text-2xl font-semibold">
        Waiting for diagnosis{!loading && !failed ? ` (${workOrders.length})` : ""}
      </h2>
      {failed ? (
        <FormProblem title="The waiting units did not load.">
          Check that this tablet is on the shop's network, then open Bench again. Work orders are also under Work orders.
        </FormProblem>
      ) : loading ? (
        <p className="text-ink-muted">Loading the waiting units…</p>
      ) : workOrders.length === 0 ? (
        <div className="flex flex-col items-start gap-3 rounded-xl border-2 border-dashed border-line-strong px-5 py-4">
          <p>Nothing is waiting for a check. When a unit comes across the counter, check it in first.</p>
          <Link to="/work-orders" className={buttonClasses({ variant: "secondary" })}>
            See all work orders
          </Link>
        </div>
      ) : (
        <WorkOrderRows workOrders={workOrders} />
      )}
    </section>
  );
}
