import { Link, useNavigate } from "react-router";
import { equipmentKindLabels } from "../../../../shared/equipment.ts";
import type { WorkOrderDetail } from "../../../../shared/schemas/work-orders.ts";
import { buttonClasses } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { clientErrorIds, isApiRequestError } from "../../../lib/api-client.ts";
import { useStartSession } from "../api/start-session.ts";

/** The work order's main action: pick the guided check that fits this unit and go to the bench. */
export function StartCheck({ workOrder }: { workOrder: WorkOrderDetail }) {
  const navigate = useNavigate();
  const start = useStartSession(workOrder.id);
  const { applicableFlows, unit } = workOrder;
  const open = workOrder.sessions.find((session) => session.status === "open");

  const onStart = async (flowId: string) => {
    if (start.isPending) return;
    try {
      const sessionId = await start.mutateAsync(flowId);
      await navigate(sessionPath(sessionId));
    } catch {
      // The problem is shown from the mutation's error below.
    }
  };

  // One check at a time per unit: while one is open, going on with it is the only action.
  if (open) {
    return (
      <section aria-labelledby="start-check" className="flex flex-col gap-4">
        <h2 id="start-check" className="text-2xl font-semibold">
          Check in progress
        </h2>
        <p>{open.techName} started {open.flowTitle}. Finish it before starting another check.</p>
        <Link to={sessionPath(open.id)} className={`${buttonClasses({ variant: "primary", size: "main" })} w-full`}>
          Go on with the check
          <StartGlyph />
        </Link>
      </section>
    );
  }

  return (
    <section aria-labelledby="start-check" className="flex flex-col gap-4">
      <h2 id="start-check" className="text-2xl font-semibold">
        Start a check
      </h2>
      {start.isError && <FormProblem title="The check did not start.">{startProblem(start.error)}</FormProblem>}
      {applicableFlows.length === 0 ? (
        <div className="flex flex-col gap-2 rounded-xl border-2 border-dashed border-line-strong px-5 py-4">
          <p className="font-semibold">
            No guided check fits a {unit.cycle}-stroke {equipmentKindLabels[unit.equipmentKind].toLowerCase()} yet.
          </p>
          <p>Checks are picked by the kind of equipment and the engine's cycle. If either is wrong on this work order, tell your shop lead; otherwise ask a senior tech to publish a check for it.</p>
        </div>
      ) : (
        <ul className="flex flex-col gap-3">
          {applicableFlows.map((flow) => (
            <li key={flow.flowId}>
              <button
                type="button"
                disabled={start.isPending}
                onClick={() => void onStart(flow.flowId)}
                aria-labelledby={`flow-title-${flow.flowId}`}
                aria-describedby={`flow-summary-${flow.flowId}`}
                className="flex min-h-20 w-full items-center gap-4 rounded-xl border-2 border-accent bg-accent px-6 py-4 text-left text-accent-ink disabled:opacity-70"
              >
                <span className="flex min-w-0 flex-1 flex-col gap-1">
                  <span id={`flow-title-${flow.flowId}`} className="text-xl font-semibold">
                    {start.isPending && start.variables === flow.flowId ? `Starting ${flow.title}…` : flow.title}
                  </span>
                  <span id={`flow-summary-${flow.flowId}`} className="line-clamp-3 text-base">
                    {flow.summary}
                  </span>
                </span>
                <StartGlyph />
              </button>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

function startProblem(error: unknown) {
  if (isApiRequestError(error, clientErrorIds.offline) || isApiRequestError(error, clientErrorIds.unreachable)) {
    return "Benchpath cannot reach the shop's server. Check that this tablet is on the shop's network, then press the check again.";
  }
  if (isApiRequestError(error) && error.status === 403) return "Your role cannot start checks. Ask an apprentice or a senior tech.";
  return "Something went wrong on the server. Press the check again; if it keeps happening, tell your shop lead.";
}

function StartGlyph() {
  return (
    <svg viewBox="0 0 24 24" className="size-9 shrink-0" aria-hidden="true" focusable="false">
      <path d="M9 5l7 7-7 7" fill="none" strokeWidth="3" strokeLinecap="round" strokeLinejoin="round" className="stroke-current" />
    </svg>
  );
}

function sessionPath(id: string) {
  return `/bench/sessions/${encodeURIComponent(id)}`;
}
