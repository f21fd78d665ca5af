import { useMemo } from "react";
import { useQuery } from "@tanstack/react-query";
import { Link, useParams } from "react-router";
import { buttonClasses } from "../../components/ui/button.tsx";
import { meQueryOptions } from "../../features/auth/api/get-me.ts";
import { flowQueryOptions } from "../../features/flows/api/get-flow.ts";
import { flowPath } from "../../features/flows/api/keys.ts";
import { BandCoverage } from "../../features/flows/components/band-coverage.tsx";
import { FlowEditorPage } from "../../features/flows/components/flow-editor-page.tsx";
import { FlowGraph } from "../../features/flows/components/flow-graph.tsx";
import { FlowHistoryPage } from "../../features/flows/components/flow-history-page.tsx";
import { FlowListPage } from "../../features/flows/components/flow-list-page.tsx";
import { readWorkingCopy } from "../../features/flows/lib/working-copy.ts";
import { SandboxSession } from "../../features/session/components/sandbox-session.tsx";

export function FlowListRoute() {
  return <FlowListPage />;
}

export function FlowEditorRoute() {
  return <FlowEditorPage renderGraph={(props) => <FlowGraph {...props} />} renderBandCoverage={(props) => <BandCoverage {...props} />} />;
}

export function FlowHistoryRoute() {
  return <FlowHistoryPage />;
}

/** The draft as the author left it (unsaved edits included) run in the bench's own screens, saving nothing. */
export function FlowSimulateRoute() {
  const { flowId = "" } = useParams();
  const flow = useQuery(flowQueryOptions(flowId));
  const me = useQuery(meQueryOptions());
  // Read once per answer from the server: the trial runs on one fixed copy of the draft.
  const definition = useMemo(() => (flow.data ? (readWorkingCopy(flowId)?.definition ?? flow.data.draft?.definition) : undefined), [flowId, flow.data]);
  const back = (
    <Link to={flowPath(flowId)} className={buttonClasses({ size: "main" })}>
      Back to the draft
    </Link>
  );
  if (flow.isPending) return <p className="text-lg">Opening the draft…</p>;
  if (flow.isError) {
    return (
      <div role="alert" className="flex flex-col gap-3">
        <p className="text-lg font-semibold">The flow could not be opened: {flow.error.message}</p>
        {back}
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-step font-semibold">Try “{flow.data.title}”</h1>
      {definition ? (
        <SandboxSession key={flowId} definition={definition} unitSystem={me.data?.user.unitSystem ?? "metric"} defaultAltitudeM={0} leave={back} />
      ) : (
        <div className="flex flex-col gap-3">
          <p className="text-lg">This flow has no draft to try. Start a draft from the flow's page first.</p>
          {back}
        </div>
      )}
    </div>
  );
}
