import { useQuery } from "@tanstack/react-query";
import { useParams } from "react-router";
import { meQueryOptions } from "../../features/auth/api/get-me.ts";
import { BenchHome } from "../../features/bench/components/bench-home.tsx";
import { CalculatorsPage } from "../../features/calculators/components/calculators-page.tsx";
import { SessionPage } from "../../features/session/components/session-page.tsx";
import { WorkOrderQueue } from "../../features/work-orders/components/work-order-queue.tsx";

export function BenchHomeRoute() {
  return <BenchHome waiting={<WorkOrderQueue headingId="bench-waiting" />} />;
}

export function SessionRoute() {
  const { sessionId = "" } = useParams();
  // The shell has already loaded the signed-in user; their unit system picks each reading's first unit.
  const me = useQuery(meQueryOptions());
  return <SessionPage key={sessionId} sessionId={sessionId} unitSystem={me.data?.user.unitSystem ?? "metric"} />;
}

export function CalculatorsRoute() {
  return <CalculatorsPage />;
}
