import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { Button } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { PlusGlyph } from "../../../components/ui/plus-glyph.tsx";
import { flowListQueryOptions } from "../api/list-flows.ts";
import { FlowRows } from "./flow-rows.tsx";
import { ImportFlow } from "./import-flow.tsx";
import { NewFlowForm } from "./new-flow-form.tsx";

export function FlowListPage() {
  const list = useQuery(flowListQueryOptions());
  const [creating, setCreating] = useState(false);
  return (
    <div className="flex max-w-5xl flex-col gap-6">
      <div className="flex flex-wrap items-center justify-between gap-4">
        <h1 className="text-step font-semibold">Flows</h1>
        {!creating && (
          <Button variant="primary" size="main" onClick={() => setCreating(true)}>
            <PlusGlyph />
            New flow
          </Button>
        )}
      </div>
      <p className="max-w-[65ch] text-ink-muted">The guided checks apprentices follow at the bench. Open one to edit its draft; a draft reaches the bench when it is published.</p>
      {creating && <NewFlowForm onCancel={() => setCreating(false)} />}
      <ImportFlow />
      {list.isError ? (
        <FormProblem title="The flows did not load.">Check that this computer is on the shop's network, then reload the page.</FormProblem>
      ) : list.isPending ? (
        <p className="text-ink-muted">Loading flows…</p>
      ) : list.data.length === 0 ? (
        <p className="rounded-xl border-2 border-dashed border-line-strong px-5 py-4">No flows yet. Make one, or import a flow file.</p>
      ) : (
        <FlowRows flows={list.data} />
      )}
    </div>
  );
}
