import { InsightPage } from "../../features/insight/components/insight-page.tsx";

export function Component() {
  return <InsightPage />;
}
