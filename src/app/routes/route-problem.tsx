import { isRouteErrorResponse, useRouteError } from "react-router";
import { Button } from "../../components/ui/button.tsx";
import { FormProblem } from "../../components/ui/form-message.tsx";
import { clientErrorIds, isApiRequestError } from "../../lib/api-client.ts";
import { areaIds, type AreaId } from "../areas.ts";
import { NotFound } from "./not-found.tsx";
import { NotForRole } from "./not-for-role.tsx";

/** Shown inside the shell when an area cannot open: wrong role, no such page, or a failure. */
export function AreaProblem() {
  const error = useRouteError();
  const area = isRouteErrorResponse(error) && error.status === 403 ? forbiddenArea(error.data) : null;
  if (area) return <NotForRole area={area} />;
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFound />;
  return <ScreenProblem error={error} />;
}

function forbiddenArea(data: unknown): AreaId | null {
  const area = (data as { area?: unknown } | null)?.area;
  return areaIds.find((id) => id === area) ?? null;
}

export function ScreenProblem({ error }: { error: unknown }) {
  const cannotConnect =
    isApiRequestError(error, clientErrorIds.offline) || isApiRequestError(error, clientErrorIds.unreachable);
  return (
    <div className="flex max-w-[70ch] flex-col items-start gap-5">
      <h1 className="text-step font-semibold">This screen did not open</h1>
      <FormProblem title={cannotConnect ? "Benchpath cannot reach the shop's server." : "Something went wrong."}>
        {cannotConnect
          ? "Check that this tablet is on the shop's network, then try again."
          : "Try again. If it keeps happening, tell your shop lead what you were doing."}
      </FormProblem>
      <Button variant="primary" size="main" onClick={() => window.location.reload()}>
        Try again
      </Button>
    </div>
  );
}
