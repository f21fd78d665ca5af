import { Link } from "react-router";
import type { FlowDetail } from "../../../../shared/schemas/flows.ts";
import { Button, buttonClasses } from "../../../components/ui/button.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { exportFileName, exportHref } from "../api/export-flow.ts";
import { flowPath } from "../api/keys.ts";
import { useSetFlowRetired } from "../api/update-flow.ts";
import { RetiredMark } from "./flow-rows.tsx";

const linkClasses = "inline-flex min-h-12 items-center font-semibold text-accent underline decoration-2 underline-offset-4";

/** The flow's name and what acts on the flow as a whole: history, export of a version, retiring. */
export function FlowHeader({ detail, screen }: { detail: FlowDetail; screen: "draft" | "history" }) {
  const retire = useSetFlowRetired(detail.id);
  const latest = detail.versions[0];
  return (
    <div className="flex flex-col gap-3">
      <nav aria-label="Flow" className="flex flex-wrap gap-x-6">
        <Link to="/flows" className={linkClasses}>
          All flows
        </Link>
        {screen === "history" ? (
          <Link to={flowPath(detail.id)} className={linkClasses}>
            Draft editor
          </Link>
        ) : (
          <Link to={flowPath(detail.id, "history")} className={linkClasses}>
            Versions and comparison
          </Link>
        )}
      </nav>
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-step font-semibold">{detail.title}</h1>
        {detail.retired && <RetiredMark />}
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <p className="text-ink-muted">
          {latest ? `Published version ${latest.number}` : "Never published"} · id <code>{detail.id}</code>
        </p>
        {latest && (
          <a className={buttonClasses({ variant: "quiet" })} href={exportHref(detail.id, latest.number)} download={exportFileName(detail.id, latest.number)}>
            Export version {latest.number}
          </a>
        )}
        <Button variant="quiet" disabled={retire.isPending} onClick={() => retire.mutate(!detail.retired)}>
          {detail.retired ? "Bring the flow back" : "Retire the flow"}
        </Button>
      </div>
      {detail.retired && <p className="max-w-[65ch]">Retired: no new bench session can start on this flow. Sessions already run on it stay in the record.</p>}
      {retire.error && <FormProblem title={detail.retired ? "The flow was not brought back." : "The flow was not retired."}>{retire.error.message}</FormProblem>}
    </div>
  );
}
