import { useEffect } from "react";
import { useQuery, useQueryClient, type QueryKey } from "@tanstack/react-query";
import type { WorkOrderDetail } from "../../../../shared/schemas/work-orders.ts";
import { Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { useCreateEstimate } from "../api/create-estimate.ts";
import { estimatesQueryOptions } from "../api/list-estimates.ts";
import { EstimateBuilder } from "./estimate-builder.tsx";
import { EstimateSheet } from "./estimate-sheet.tsx";
import { problemWords } from "./problem-words.ts";

/** The work order's estimate: started from the check's finding, priced, sent, answered, revised. */
export function EstimateSection({ workOrder, workOrderKey }: { workOrder: WorkOrderDetail; workOrderKey: QueryKey }) {
  const { data, error } = useQuery(estimatesQueryOptions(workOrder.id));
  const create = useCreateEstimate(workOrder.id);
  const queryClient = useQueryClient();
  const answered = data?.estimates[0]?.status;
  // The customer answers from their phone: once the estimate shows it, the work order's state is asked again too.
  const stale = (answered === "approved" || answered === "declined") && workOrder.state === "waiting_for_approval";
  const keyText = JSON.stringify(workOrderKey);
  useEffect(() => {
    if (stale) void queryClient.invalidateQueries({ queryKey: JSON.parse(keyText) as QueryKey });
  }, [stale, keyText, queryClient]);
  const finding = [...workOrder.sessions].reverse().find((s) => s.status === "completed" && s.findingTitle);

  let body: React.ReactNode;
  if (error) body = <FormProblem title="The estimate could not be loaded.">{problemWords(error)}</FormProblem>;
  else if (!data) body = <p className="text-ink-muted">Loading the estimate…</p>;
  else if (data.estimates.length === 0) {
    body = finding ? (
      <div className="flex flex-col gap-4">
        <p>
          The check found: <strong>{finding.findingTitle}</strong>. Start the estimate from its repairs, then price the parts.
        </p>
        {create.isError && !isApiRequestError(create.error, "estimate_exists") && <FormProblem title="The estimate did not start.">{problemWords(create.error)}</FormProblem>}
        <Button variant="primary" size="main" className="self-start" disabled={create.isPending} onClick={() => create.mutate()}>
          {create.isPending ? "Starting the estimate…" : "Write the estimate from the finding"}
        </Button>
      </div>
    ) : (
      <p className="text-ink-muted">An estimate starts from a finished check with a finding. Finish a check on this unit first.</p>
    );
  } else {
    const [current, ...older] = data.estimates;
    const approvedOrDeclined = older.find((e) => e.status === "approved" || e.status === "declined");
    body = (
      <div className="flex flex-col gap-6">
        {current!.status === "draft" ? (
          <EstimateBuilder key={current!.id} estimate={current!} customerEmail={workOrder.customer.email} workOrderKey={workOrderKey} />
        ) : (
          <EstimateSheet estimate={current!} customerEmail={workOrder.customer.email} workOrderKey={workOrderKey} />
        )}
        {current!.status === "draft" && approvedOrDeclined === undefined && older[0] && (
          <p className="text-ink-muted">Revision {older[0].revision} stays with the customer until this revision is sent.</p>
        )}
      </div>
    );
  }

  return (
    <section aria-labelledby="estimate" className="flex flex-col gap-4 border-t-2 border-line pt-6">
      <h2 id="estimate" className="text-2xl font-semibold">
        Estimate
      </h2>
      {body}
    </section>
  );
}
