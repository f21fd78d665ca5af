import { IntakeForm } from "../../features/work-orders/components/intake-form.tsx";
import { WorkOrderDetailPage } from "../../features/work-orders/components/work-order-detail-page.tsx";
import { WorkOrderListPage } from "../../features/work-orders/components/work-order-list-page.tsx";
import { EstimateSection } from "../../features/estimates/components/estimate-section.tsx";

export function WorkOrderListRoute() {
  return <WorkOrderListPage />;
}

export function IntakeRoute() {
  return <IntakeForm />;
}

export function WorkOrderDetailRoute() {
  return <WorkOrderDetailPage renderEstimate={(props) => <EstimateSection {...props} />} />;
}
