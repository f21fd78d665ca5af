import { useEffect, useRef, type ReactNode } from "react";
import { useQuery, type QueryKey } from "@tanstack/react-query";
import type { WorkOrderDetail } from "../../../../shared/schemas/work-orders.ts";
import { Link, useLocation, useParams } from "react-router";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { ScreenProblemText } from "./screen-problem-text.tsx";
import { workOrderQueryOptions } from "../api/get-work-order.ts";
import { unitName, workOrderNumber } from "../lib/work-order-words.ts";
import type { IntakeArrival } from "./intake-form.tsx";
import { IntakePhoto } from "./intake-photo.tsx";
import { SessionList } from "./session-list.tsx";
import { StartCheck } from "./start-check.tsx";
import { WorkOrderStateLabel } from "../../../components/ui/work-order-state-label.tsx";
import { TestRunChecklist } from "./test-run-checklist.tsx";
import { WorkOrderFacts } from "./work-order-facts.tsx";

/** The estimate section is drawn by the estimates feature and passed in by the route. */
export type RenderEstimate = (props: { workOrder: WorkOrderDetail; workOrderKey: QueryKey }) => ReactNode;

export function WorkOrderDetailPage({ renderEstimate }: { renderEstimate?: RenderEstimate } = {}) {
  const { workOrderId = "" } = useParams();
  const arrival = useLocation().state as IntakeArrival | null;
  const { data: workOrder, error } = useQuery(workOrderQueryOptions(workOrderId));
  const top = useRef<HTMLDivElement>(null);
  // Arriving from the long intake form leaves the page scrolled down: start at the top.
  const loaded = workOrder !== undefined;
  useEffect(() => {
    if (!loaded) return;
    top.current?.focus({ preventScroll: true });
    document.documentElement.scrollTop = 0;
  }, [loaded, workOrderId]);
  if (!workOrder) return error ? <ScreenProblemText /> : <p className="text-ink-muted">Loading the work order…</p>;

  return (
    <div ref={top} tabIndex={-1} className="flex max-w-6xl flex-col gap-7 focus:outline-none">
      <Link to="/work-orders" className="inline-flex min-h-12 items-center self-start font-semibold text-accent underline decoration-2 underline-offset-4">
        All work orders
      </Link>
      <div className="flex flex-col gap-2">
        <p className="text-xl font-semibold tabular-figures text-ink-muted">{workOrderNumber(workOrder.number)}</p>
        <h1 id="work-order-title" className="text-step font-semibold">
          {unitName(workOrder)}
        </h1>
        <div className="flex flex-wrap items-center gap-3">
          <WorkOrderStateLabel state={workOrder.state} />
          <span>for {workOrder.customer.name}</span>
        </div>
        <Link to={`/work-orders/${encodeURIComponent(workOrder.id)}/report`} className="inline-flex min-h-12 items-center self-start font-semibold text-accent underline decoration-2 underline-offset-4">
          Customer report
        </Link>
      </div>
      {arrival?.photoNotSaved && !workOrder.intakePhotoId && (
        <FormProblem title="Checked in, but the photo of the unit did not save.">Take it again under “As received”.</FormProblem>
      )}
      <div className="grid gap-8 landscape:grid-cols-2">
        <div className="flex flex-col gap-8 landscape:order-2">
          <TestRunChecklist workOrder={workOrder} />
          <StartCheck workOrder={workOrder} />
          <SessionList sessions={workOrder.sessions} />
        </div>
        <div className="flex flex-col gap-8">
          <WorkOrderFacts workOrder={workOrder} />
          <IntakePhoto workOrderId={workOrder.id} photoId={workOrder.intakePhotoId} notSaved={arrival?.photoNotSaved ?? false} />
        </div>
      </div>
      {renderEstimate?.({ workOrder, workOrderKey: workOrderQueryOptions(workOrder.id).queryKey })}
    </div>
  );
}
