import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { useParams } from "react-router";
import { equipmentKindLabels } from "../../../../shared/equipment.ts";
import type { EstimateDecisionResponse, PublicEstimate } from "../../../../shared/schemas/estimates.ts";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { publicEstimateQueryOptions } from "../api/get-public-estimate.ts";
import { useDecideEstimate } from "../api/decide-estimate.ts";
import { dayWords } from "../lib/when.ts";
import { PublicConfirm, type Pending } from "./public-confirm.tsx";
import { PublicOptionCard } from "./public-option-card.tsx";
import { PublicPlainPage } from "./public-plain-page.tsx";

/** The customer's page from the e-mail's link: the shop, the unit, each option with its total, one answer. */
export function PublicEstimatePage() {
  const { token = "" } = useParams();
  const { data, error, isFetchedAfterMount } = useQuery(publicEstimateQueryOptions(token));
  const decide = useDecideEstimate(token);
  const [pending, setPending] = useState<Pending | null>(null);
  const [answer, setAnswer] = useState<EstimateDecisionResponse | null>(null);

  if (answer) return <ThankYou answer={answer} />;
  if (error) return <LinkProblem error={error} />;
  if (!data || !isFetchedAfterMount) return <PublicPlainPage title="Opening your estimate…" />;

  const confirm = (comment: string) => {
    if (!pending) return;
    const body = pending.kind === "approve" ? { decision: "approve" as const, optionId: pending.option.id, comment } : { decision: "decline" as const, comment };
    decide.mutate(body, { onSuccess: setAnswer });
  };

  return (
    <main className="mx-auto flex w-full max-w-xl flex-col gap-6 px-4 py-6">
      <ShopHeader estimate={data} />
      <div className="flex flex-col gap-2">
        <h1 className="text-step font-semibold">Your estimate</h1>
        <p className="text-lg">
          For your {data.unit.make} {data.unit.model} {equipmentKindLabels[data.unit.equipmentKind].toLowerCase()}, work order {data.workOrderNumber}.
        </p>
        {data.findingTitle && (
          <p className="text-lg">
            What we found: <strong>{data.findingTitle}</strong>
          </p>
        )}
        {data.note && <p className="rounded-lg bg-sunken px-4 py-3">{data.note}</p>}
        <p className="text-ink-muted">You can answer until {dayWords(data.validUntil)}. Totals include tax.</p>
      </div>

      {pending ? (
        <PublicConfirm pending={pending} currency={data.currency} busy={decide.isPending} error={decide.error} onConfirm={confirm} onBack={() => (decide.reset(), setPending(null))} />
      ) : (
        <>
          <ul className="flex flex-col gap-5">
            {data.options.map((option, i) => (
              <PublicOptionCard key={option.id} option={option} number={data.options.length > 1 ? i + 1 : null} currency={data.currency} onApprove={() => setPending({ kind: "approve", option })} />
            ))}
          </ul>
          <div className="flex flex-col gap-3 border-t-2 border-line pt-5">
            <p>Not going ahead? Tell the shop, and they will get in touch about picking up the unit.</p>
            <button type="button" className="min-h-16 w-full rounded-lg border-2 border-line-strong bg-raised px-6 text-xl font-semibold" onClick={() => setPending({ kind: "decline" })}>
              Decline the estimate
            </button>
          </div>
        </>
      )}
    </main>
  );
}

function ShopHeader({ estimate }: { estimate: PublicEstimate }) {
  const { shop } = estimate;
  return (
    <header className="flex flex-col gap-1 border-b-2 border-line pb-4">
      <p className="text-2xl font-semibold">{shop.name}</p>
      {shop.address && <p className="text-ink-muted">{shop.address}</p>}
      <p className="flex flex-wrap gap-x-4">
        {shop.phone && (
          <a className="inline-flex min-h-12 items-center font-semibold text-accent underline decoration-2 underline-offset-4" href={`tel:${shop.phone.replace(/[^0-9+]/g, "")}`}>
            Call {shop.phone}
          </a>
        )}
        {shop.email && (
          <a className="inline-flex min-h-12 items-center font-semibold text-accent underline decoration-2 underline-offset-4" href={`mailto:${shop.email}`}>
            {shop.email}
          </a>
        )}
      </p>
    </header>
  );
}

function ThankYou({ answer }: { answer: EstimateDecisionResponse }) {
  const call = answer.shopPhone ? ` Questions? Call ${answer.shopPhone}.` : "";
  return answer.decision === "approved" ? (
    <PublicPlainPage title="Thank you: the repair is approved">
      <p>
        {answer.shopName} has your go-ahead for <strong>{answer.optionTitle}</strong> and will be in touch when the unit is ready.{call}
      </p>
    </PublicPlainPage>
  ) : (
    <PublicPlainPage title="Thank you for your answer">
      <p>
        {answer.shopName} knows you are not going ahead and will be in touch about picking up the unit.{call}
      </p>
    </PublicPlainPage>
  );
}

const linkProblems: Record<string, string> = {
  link_used: "Already answered",
  link_revoked: "A newer e-mail replaced this link",
  link_expired: "Past its date",
  link_closed: "No longer open",
  not_found: "Link not found",
};

function LinkProblem({ error }: { error: unknown }) {
  const known = isApiRequestError(error) ? linkProblems[error.id] : undefined;
  if (known && isApiRequestError(error)) return <PublicPlainPage title={known}>{<p>{error.message}</p>}</PublicPlainPage>;
  return (
    <PublicPlainPage title="The estimate could not be opened">
      <p>The shop's server did not answer. Check your connection and open the link again in a moment.</p>
    </PublicPlainPage>
  );
}
