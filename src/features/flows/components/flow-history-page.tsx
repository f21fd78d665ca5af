import { useEffect, useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { useParams, useSearchParams } from "react-router";
import { diffFlows } from "../../../../shared/flow/diff.ts";
import type { FlowDetail } from "../../../../shared/schemas/flows.ts";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { SelectField } from "../../../components/ui/select-field.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { flowQueryOptions } from "../api/get-flow.ts";
import { flowVersionQueryOptions } from "../api/get-version.ts";
import { FlowComparison } from "./flow-comparison.tsx";
import { FlowHeader } from "./flow-header.tsx";
import { VersionTable } from "./version-table.tsx";

type Side = number | "draft";

const sideWords = (side: Side) => (side === "draft" ? "the draft" : `version ${side}`);

function sidesOf(detail: FlowDetail): Side[] {
  return [...(detail.draft ? (["draft"] as const) : []), ...detail.versions.map((v) => v.number)];
}

function readSide(value: string | null, sides: readonly Side[]): Side | null {
  if (value === null) return null;
  const side: Side = value === "draft" ? "draft" : Number(value);
  return sides.includes(side) ? side : null;
}

export function FlowHistoryPage() {
  const { flowId = "" } = useParams();
  const { data: detail, error } = useQuery(flowQueryOptions(flowId));
  if (!detail) {
    if (isApiRequestError(error) && error.status === 404) return <FormProblem title={`There is no flow “${flowId}”.`}>Go back to the list of flows and pick another.</FormProblem>;
    if (error) return <FormProblem title="This flow did not load.">Check that this computer is on the shop's network, then reload the page.</FormProblem>;
    return <p className="text-ink-muted">Loading the flow…</p>;
  }
  return (
    <div className="flex max-w-6xl flex-col gap-6">
      <FlowHeader detail={detail} screen="history" />
      <section aria-labelledby="versions-title" className="flex flex-col gap-3">
        <h2 id="versions-title" className="text-2xl font-semibold">
          Versions
        </h2>
        {detail.versions.length === 0 && !detail.draft ? <p>Nothing published yet.</p> : <VersionTable detail={detail} />}
      </section>
      <Comparison detail={detail} />
    </div>
  );
}

function Comparison({ detail }: { detail: FlowDetail }) {
  const [params, setParams] = useSearchParams();
  const sides = sidesOf(detail);
  // The pick lives here and the address follows it, so two quick picks never overwrite each other.
  const [picked, setPicked] = useState(() => ({ from: params.get("from"), to: params.get("to") }));
  useEffect(() => {
    if (picked.from === null && picked.to === null) return;
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        if (picked.from !== null) next.set("from", picked.from);
        if (picked.to !== null) next.set("to", picked.to);
        return next;
      },
      { replace: true },
    );
  }, [picked, setParams]);
  // By default: what the draft changes on the latest version, else what the latest changed on the one before.
  const from = readSide(picked.from, sides) ?? sides[1] ?? null;
  const to = readSide(picked.to, sides) ?? sides[0] ?? null;
  const setSide = (key: "from" | "to", value: string) => setPicked((current) => ({ ...current, [key]: value }));

  const older = useDefinition(detail, from);
  const newer = useDefinition(detail, to);

  if (sides.length < 2 || from === null || to === null) {
    return (
      <section aria-labelledby="compare-title" className="flex flex-col gap-3">
        <h2 id="compare-title" className="text-2xl font-semibold">
          Compare
        </h2>
        <p>There is only one version of this flow, so there is nothing to compare it with yet.</p>
      </section>
    );
  }
  const options = sides.map((side) => (
    <option key={String(side)} value={String(side)}>
      {side === "draft" ? "The draft" : `Version ${side}`}
    </option>
  ));
  return (
    <section aria-labelledby="compare-title" className="flex flex-col gap-4">
      <h2 id="compare-title" className="text-2xl font-semibold">
        Compare
      </h2>
      <div className="grid gap-4 landscape:grid-cols-2">
        <SelectField id="compare-from" label="From" value={String(from)} onChange={(event) => setSide("from", event.currentTarget.value)}>
          {options}
        </SelectField>
        <SelectField id="compare-to" label="To" value={String(to)} onChange={(event) => setSide("to", event.currentTarget.value)}>
          {options}
        </SelectField>
      </div>
      <div className="flex flex-col gap-3 rounded-xl border-2 border-line bg-raised px-5 py-4">
        <h3 className="text-xl font-semibold">
          From {sideWords(from)} to {sideWords(to)}
        </h3>
        {older.error || newer.error ? (
          <FormProblem title="A version did not load.">Reload the page to try again.</FormProblem>
        ) : older.definition && newer.definition ? (
          from === to ? <p>Pick two different versions to see what changed.</p> : <FlowComparison diff={diffFlows(older.definition, newer.definition)} headingLevel={4} />
        ) : (
          <p className="text-ink-muted">Loading the versions…</p>
        )}
      </div>
    </section>
  );
}

function useDefinition(detail: FlowDetail, side: Side | null) {
  const number = typeof side === "number" ? side : 0;
  const version = useQuery({ ...flowVersionQueryOptions(detail.id, number), enabled: typeof side === "number" });
  if (side === "draft") return { definition: detail.draft?.definition ?? null, error: null };
  return { definition: version.data?.definition ?? null, error: version.error };
}
