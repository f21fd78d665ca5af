import { LaterReleasePanel } from "../../components/ui/later-release-panel.tsx";
import { BenchHome } from "../../features/bench/components/bench-home.tsx";
import { WorkOrderQueue } from "../../features/work-orders/components/work-order-queue.tsx";

export function BenchHomeRoute() {
  return <BenchHome waiting={<WorkOrderQueue headingId="bench-waiting" />} />;
}

export function SessionRoute() {
  return (
    <LaterReleasePanel
      title="Guided check"
      summary="The guided step screen comes next: it will walk through this check one step at a time, with readings, photos and safety panels."
    />
  );
}
