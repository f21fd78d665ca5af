import { createBrowserRouter, data, redirect, type LoaderFunctionArgs, type RouteObject } from "react-router";
import type { QueryClient } from "@tanstack/react-query";
import { workOrderQueryOptions } from "../features/work-orders/api/get-work-order.ts";
import { waitingSearch } from "../features/review/lib/queue-views.ts";
import { isApiRequestError } from "../lib/api-client.ts";
import { areaIds, areas, type AreaId } from "./areas.ts";
import { areaLoader, homeLoader, rootLoader, signedInLoader, signInLoader } from "./loaders.ts";
import { NotFound } from "./routes/not-found.tsx";
import { AreaProblem } from "./routes/route-problem.tsx";
import { RootProblem, StartingUp } from "./routes/root-problem.tsx";

type AreaModule = () => Promise<{ Component: () => React.JSX.Element }>;
const areasWithChildren = ["bench", "work-orders", "flows", "review"] as const;
type AreaWithChildren = (typeof areasWithChildren)[number];
const hasChildren = (id: AreaId): id is AreaWithChildren => (areasWithChildren as readonly AreaId[]).includes(id);

// One chunk per area, so the bench never downloads the flow editor or the insight charts.
const areaModules: Record<Exclude<AreaId, AreaWithChildren>, AreaModule> = {
  insight: () => import("./routes/insight.tsx"),
  settings: () => import("./routes/settings.tsx"),
  people: () => import("./routes/people.tsx"),
};

/** Opens a work order's screen with its data ready; an unknown id is the plain not-found page. */
function workOrderLoader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    try {
      await queryClient.ensureQueryData(workOrderQueryOptions(params.workOrderId ?? ""));
    } catch (error) {
      if (isApiRequestError(error) && error.status === 404) throw data(null, { status: 404 });
      throw error;
    }
    return null;
  };
}

/** The bare /review is the shop lead's home: the sessions waiting for sign-off. */
function reviewQueueLoader({ request }: LoaderFunctionArgs) {
  if (new URL(request.url).search === "") throw redirect(`/review${waitingSearch}`);
  return null;
}

// Areas with more than one screen load each screen on its own.
function areaChildren(queryClient: QueryClient): Record<AreaWithChildren, RouteObject[]> {
  const bench = () => import("./routes/bench.tsx");
  const workOrders = () => import("./routes/work-orders.tsx");
  const flows = () => import("./routes/flows.tsx");
  const review = () => import("./routes/review.tsx");
  return {
    bench: [
      { index: true, lazy: () => bench().then((module) => ({ Component: module.BenchHomeRoute })) },
      { path: "sessions/:sessionId", lazy: () => bench().then((module) => ({ Component: module.SessionRoute })) },
      { path: "calculators", lazy: () => bench().then((module) => ({ Component: module.CalculatorsRoute })) },
    ],
    "work-orders": [
      { index: true, lazy: () => workOrders().then((module) => ({ Component: module.WorkOrderListRoute })) },
      { path: "new", lazy: () => workOrders().then((module) => ({ Component: module.IntakeRoute })) },
      { path: "board", lazy: () => import("./routes/board.tsx").then((module) => ({ Component: module.BoardRoute })) },
      {
        path: ":workOrderId",
        loader: workOrderLoader(queryClient),
        lazy: () => workOrders().then((module) => ({ Component: module.WorkOrderDetailRoute })),
      },
      { path: ":workOrderId/report", lazy: () => import("./routes/reports.tsx").then((module) => ({ Component: module.CustomerReportRoute })) },
    ],
    flows: [
      { index: true, lazy: () => flows().then((module) => ({ Component: module.FlowListRoute })) },
      { path: ":flowId", lazy: () => flows().then((module) => ({ Component: module.FlowEditorRoute })) },
      { path: ":flowId/history", lazy: () => flows().then((module) => ({ Component: module.FlowHistoryRoute })) },
      { path: ":flowId/simulate", lazy: () => flows().then((module) => ({ Component: module.FlowSimulateRoute })) },
    ],
    review: [
      { index: true, loader: reviewQueueLoader, lazy: () => review().then((module) => ({ Component: module.ReviewQueueRoute })) },
      { path: "sessions/:sessionId", lazy: () => review().then((module) => ({ Component: module.ReviewSessionRoute })) },
    ],
  };
}

function areaRoute(queryClient: QueryClient, id: AreaId): RouteObject {
  const route = { path: areas[id].path.slice(1), loader: areaLoader(queryClient, id) };
  if (hasChildren(id)) return { ...route, children: areaChildren(queryClient)[id] };
  return { ...route, lazy: areaModules[id] };
}

export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      id: "root",
      loader: rootLoader(queryClient),
      HydrateFallback: StartingUp,
      ErrorBoundary: RootProblem,
      children: [
        { path: "sign-in", loader: signInLoader(queryClient), lazy: () => import("./routes/sign-in.tsx") },
        { path: "welcome/:token", lazy: () => import("./routes/password-link.tsx").then((module) => ({ Component: module.PasswordLinkRoute })) },
        { path: "reset-password/:token", lazy: () => import("./routes/password-link.tsx").then((module) => ({ Component: module.PasswordLinkRoute })) },
        { path: "forgot-password", lazy: () => import("./routes/password-link.tsx").then((module) => ({ Component: module.ForgotPasswordRoute })) },
        // The customer's estimate from the e-mail's link: no sign-in, outside the shop's own screens.
        { path: "estimate/:token", lazy: () => import("../features/estimates/components/public-estimate-page.tsx").then((module) => ({ Component: module.PublicEstimatePage })) },
        {
          loader: signedInLoader(queryClient),
          lazy: () => import("./layout/app-shell.tsx").then((module) => ({ Component: module.AppShell })),
          children: [
            {
              ErrorBoundary: AreaProblem,
              children: [
                { index: true, loader: homeLoader(queryClient) },
                ...areaIds.map((id) => areaRoute(queryClient, id)),
                { path: "people/mail", loader: areaLoader(queryClient, "people"), lazy: () => import("./routes/people-mail.tsx") },
                { path: "*", Component: NotFound },
              ],
            },
          ],
        },
      ],
    },
  ];
}

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter(createRoutes(queryClient));
}
