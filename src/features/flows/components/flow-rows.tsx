import { Link } from "react-router";
import type { FlowListItem } from "../../../../shared/schemas/flows.ts";
import { flowPath } from "../api/keys.ts";
import { appliesToWords, authorName, countInWords } from "../lib/flow-words.ts";

export function RetiredMark() {
  return <span className="rounded border-2 border-line-strong px-2 text-base font-semibold text-ink-muted">Retired</span>;
}

function draftWords(draft: FlowListItem["draft"]) {
  if (!draft) return "None";
  return draft.errorCount === 0 ? "Yes, no errors" : `Yes, ${countInWords(draft.errorCount, "error")}`;
}

/** One big row per flow; the whole row opens the flow's draft editor. */
export function FlowRows({ flows }: { flows: FlowListItem[] }) {
  return (
    <ul className="flex flex-col gap-3">
      {flows.map((flow) => (
        <li key={flow.id}>
          <Link
            to={flowPath(flow.id)}
            className={"flex flex-col gap-2 rounded-xl border-2 bg-raised px-5 py-4 text-ink " + (flow.retired ? "border-dashed border-line-strong" : "border-line-strong")}
          >
            <span className="flex flex-wrap items-center gap-3">
              <span className="text-xl font-semibold">{flow.title}</span>
              {flow.retired && <RetiredMark />}
            </span>
            <span>{appliesToWords(flow.appliesTo)}</span>
            <dl className="grid gap-x-6 gap-y-1 text-base landscape:grid-cols-4 portrait:grid-cols-2">
              <Fact term="Published">{flow.published ? `Version ${flow.published.number}` : "Not yet"}</Fact>
              <Fact term="Draft">{draftWords(flow.draft)}</Fact>
              <Fact term="Last edited by">{flow.lastEditedBy || flow.draft || flow.published ? authorName(flow.lastEditedBy) : "Nobody yet"}</Fact>
              <Fact term="Sessions run">{String(flow.sessionCount)}</Fact>
            </dl>
          </Link>
        </li>
      ))}
    </ul>
  );
}

function Fact({ term, children }: { term: string; children: string }) {
  return (
    <div className="flex flex-col">
      <dt className="text-ink-muted">{term}</dt>
      <dd className="font-semibold tabular-figures">{children}</dd>
    </div>
  );
}
