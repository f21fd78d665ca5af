import type { ReactNode } from "react";
import type { SessionDetail } from "../../../../shared/schemas/sessions.ts";
import { kindLabel, localDayTime, makeModel, workOrderNumber } from "../lib/review-words.ts";
import { ReviewStateLabel } from "./review-state-label.tsx";

/** Which check this is: the ticket, the unit, who ran it on which flow, and when. */
export function SessionFacts({ detail }: { detail: SessionDetail }) {
  return (
    <header className="flex flex-col gap-4">
      <div className="flex flex-wrap items-baseline justify-between gap-x-6 gap-y-2">
        <h1 className="text-step font-semibold">
          <span className="tabular-figures">{workOrderNumber(detail.workOrderNumber)}</span> · {detail.customer}
        </h1>
        <ReviewStateLabel state={detail.reviewState} status={detail.status} />
      </div>
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2 md:grid-cols-3">
        <Fact term="Unit">
          {makeModel(detail.unit)} <span className="text-ink-muted">{kindLabel(detail.unit.equipmentKind).toLowerCase()}</span>
        </Fact>
        <Fact term="Tech">{detail.techName}</Fact>
        <Fact term="Flow">
          {detail.flow.title} v.{detail.flow.version}
        </Fact>
        <Fact term="Started">{localDayTime(detail.startedAt)}</Fact>
        <Fact term="Completed">{detail.completedAt ? localDayTime(detail.completedAt) : detail.status === "abandoned" ? "Abandoned" : "Not yet"}</Fact>
        {detail.reviewedAt && (
          <Fact term={detail.reviewState === "returned" ? "Sent back" : "Signed off"}>
            {localDayTime(detail.reviewedAt)}
            {detail.reviewerName && <> by {detail.reviewerName}</>}
          </Fact>
        )}
      </dl>
    </header>
  );
}

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="flex flex-col">
      <dt className="text-base text-ink-muted">{term}</dt>
      <dd className="text-lg font-semibold tabular-figures">{children}</dd>
    </div>
  );
}
