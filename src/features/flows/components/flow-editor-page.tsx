import { useState, type ReactNode } from "react";
import { useQuery } from "@tanstack/react-query";
import { useParams } from "react-router";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { flowQueryOptions } from "../api/get-flow.ts";
import type { BandCoverageProps, FlowGraphProps } from "../lib/view-slots.ts";
import { DraftEditor } from "./draft-editor.tsx";
import { FlowHeader } from "./flow-header.tsx";
import { StartDraftPanel } from "./start-draft-panel.tsx";

export interface FlowEditorPageProps {
  /** Draws the whole flow; without it the editor offers the step list and form only. */
  renderGraph?: (props: FlowGraphProps) => ReactNode;
  /** Draws a reading's bands on the number line, above the band rows. */
  renderBandCoverage?: (props: BandCoverageProps) => ReactNode;
}

export function FlowEditorPage({ renderGraph, renderBandCoverage }: FlowEditorPageProps) {
  const { flowId = "" } = useParams();
  const { data: detail, error } = useQuery(flowQueryOptions(flowId));
  const [published, setPublished] = useState<number | null>(null);

  if (!detail) {
    if (isApiRequestError(error) && error.status === 404) return <FormProblem title={`There is no flow “${flowId}”.`}>Go back to the list of flows and pick another.</FormProblem>;
    if (error) return <FormProblem title="This flow did not load.">Check that this computer is on the shop's network, then reload the page.</FormProblem>;
    return <p className="text-ink-muted">Loading the flow…</p>;
  }
  const draft = detail.draft;
  return (
    <div className="flex max-w-7xl flex-col gap-6">
      <FlowHeader detail={detail} screen="draft" />
      {published !== null && !draft && (
        <p role="status" className="rounded-lg border-2 border-accent bg-accent-soft px-4 py-3 font-semibold">
          Published version {published}: new bench sessions start on it.
        </p>
      )}
      {draft ? (
        <DraftEditor
          key={`${detail.id}:${draft.basedOnVersion ?? "new"}`}
          detail={detail}
          draft={draft}
          onPublished={setPublished}
          renderGraph={renderGraph}
          renderBandCoverage={renderBandCoverage}
        />
      ) : (
        <StartDraftPanel detail={detail} />
      )}
    </div>
  );
}
