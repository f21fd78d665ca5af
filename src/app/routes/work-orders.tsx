import { IntakeForm } from "../../features/work-orders/components/intake-form.tsx";
import { WorkOrderDetailPage } from "../../features/work-orders/components/work-order-detail-page.tsx";
import { WorkOrderListPage } from "../../features/work-orders/components/work-order-list-page.tsx";

export function WorkOrderListRoute() {
  return <WorkOrderListPage />;
}

export function IntakeRoute() {
  return <IntakeForm />;
}

export function WorkOrderDetailRoute() {
  return <WorkOrderDetailPage />;
}
