import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { Link, useSearchParams } from "react-router";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { ChoiceGroup } from "../../../components/ui/choice-group.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { PlusGlyph } from "../../../components/ui/plus-glyph.tsx";
import { TextField } from "../../../components/ui/text-field.tsx";
import { useDebouncedText } from "../../../lib/use-debounced-text.ts";
import { workOrderListQueryOptions } from "../api/list-work-orders.ts";
import { WorkOrderRows } from "./work-order-rows.tsx";

const showChoices = [
  { value: "open", label: "Open" },
  { value: "all", label: "All" },
] as const;

// "WO 1042" is how people say it; the server searches the bare number.
function searchTerm(q: string) {
  return q.trim().replace(/^wo\s*(\d+)$/i, "$1");
}

export function WorkOrderListPage() {
  const [params, setParams] = useSearchParams();
  const q = params.get("q") ?? "";
  const state = params.get("state") === "all" ? "all" : "open";
  // The address holds the search, so a reload or the back button brings it back.
  const [typed, setTyped] = useDebouncedText(q, (text) =>
    setParams((current) => {
      const next = new URLSearchParams(current);
      if (text.trim() === "") next.delete("q");
      else next.set("q", text);
      return next;
    }, { replace: true }),
  );

  const setState = (value: "open" | "all") =>
    setParams((current) => {
      const next = new URLSearchParams(current);
      if (value === "open") next.delete("state");
      else next.set("state", value);
      return next;
    }, { replace: true });

  // While a new search loads, the last answer stays up rather than flashing an empty screen.
  const list = useQuery({ ...workOrderListQueryOptions({ search: searchTerm(q), state }), placeholderData: keepPreviousData });

  return (
    <div className="flex max-w-5xl flex-col gap-6">
      <div className="flex flex-wrap items-center justify-between gap-4">
        <h1 className="text-step font-semibold">Work orders</h1>
        <Link to="/work-orders/board" className="inline-flex min-h-12 items-center font-semibold text-accent underline decoration-2 underline-offset-4">Board view</Link>
        <Link to="/work-orders/new" className={buttonClasses({ variant: "primary", size: "main" })}>
          <PlusGlyph />
          Check in a unit
        </Link>
      </div>
      <div role="search" className="grid gap-5 landscape:grid-cols-[1fr_auto] landscape:items-start">
        <TextField
          id="work-order-search"
          label="Find a work order"
          hint="Customer, make, model or number"
          type="search"
          autoComplete="off"
          value={typed}
          onChange={(event) => setTyped(event.currentTarget.value)}
          className="[&_input::-webkit-search-cancel-button]:appearance-none"
          trailing={
            typed !== "" && (
              <button type="button" className={`${buttonClasses({ variant: "secondary" })} min-h-14`} onClick={() => setTyped("")}>
                Clear
              </button>
            )
          }
        />
        <ChoiceGroup id="work-order-show" name="show" legend="Show" hint="All includes picked up" minChoiceWidth="fit" choices={showChoices} value={state} onChange={setState} />
      </div>
      {list.isError ? (
        <FormProblem title="The work orders did not load.">Check that this tablet is on the shop's network, then search again or reload.</FormProblem>
      ) : list.isPending ? (
        <p className="text-ink-muted">Loading work orders…</p>
      ) : list.data.length === 0 ? (
        <EmptyList search={q} state={state} onShowAll={() => setState("all")} />
      ) : (
        <WorkOrderRows workOrders={list.data} />
      )}
    </div>
  );
}

function EmptyList({ search, state, onShowAll }: { search: string; state: "open" | "all"; onShowAll: () => void }) {
  const searching = search.trim() !== "";
  return (
    <div className="flex flex-col items-start gap-3 rounded-xl border-2 border-dashed border-line-strong px-5 py-4">
      <p className="font-semibold">{searching ? `No work order matches “${search.trim()}”.` : "No open work orders."}</p>
      <p>
        {searching
          ? "Check the spelling, or search by the customer's surname or the number on the tag."
          : "When a unit comes in, check it in: it shows up here until it is picked up."}
      </p>
      {state === "open" && searching && (
        <button type="button" className={buttonClasses({ variant: "secondary" })} onClick={onShowAll}>
          Search picked-up work orders too
        </button>
      )}
    </div>
  );
}
