import { CustomerReportPage } from "../../features/reports/components/customer-report-page.tsx";

export function CustomerReportRoute() {
  return <CustomerReportPage />;
}
