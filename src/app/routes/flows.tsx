import { FlowEditorPage } from "../../features/flows/components/flow-editor-page.tsx";
import { FlowHistoryPage } from "../../features/flows/components/flow-history-page.tsx";
import { FlowListPage } from "../../features/flows/components/flow-list-page.tsx";

export function FlowListRoute() {
  return <FlowListPage />;
}

// The graph and the band coverage drawings are not passed yet: the editor then shows its list and form.
export function FlowEditorRoute() {
  return <FlowEditorPage />;
}

export function FlowHistoryRoute() {
  return <FlowHistoryPage />;
}
