import { createBrowserRouter, type RouteObject } from "react-router";
import type { QueryClient } from "@tanstack/react-query";
import { areaIds, areas, type AreaId } from "./areas.ts";
import { areaLoader, homeLoader, rootLoader, signedInLoader, signInLoader } from "./loaders.ts";
import { NotFound } from "./routes/not-found.tsx";
import { AreaProblem } from "./routes/route-problem.tsx";
import { RootProblem, StartingUp } from "./routes/root-problem.tsx";

type AreaModule = () => Promise<{ Component: () => React.JSX.Element }>;

// One chunk per area, so the bench never downloads the flow editor or the insight charts.
const areaModules: Record<AreaId, AreaModule> = {
  bench: () => import("./routes/bench.tsx"),
  "work-orders": () => import("./routes/work-orders.tsx"),
  flows: () => import("./routes/flows.tsx"),
  review: () => import("./routes/review.tsx"),
  insight: () => import("./routes/insight.tsx"),
  settings: () => import("./routes/settings.tsx"),
  people: () => import("./routes/people.tsx"),
};

export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      id: "root",
      loader: rootLoader(queryClient),
      HydrateFallback: StartingUp,
      ErrorBoundary: RootProblem,
      children: [
        { path: "sign-in", loader: signInLoader(queryClient), lazy: () => import("./routes/sign-in.tsx") },
        {
          loader: signedInLoader(queryClient),
          lazy: () => import("./layout/app-shell.tsx").then((module) => ({ Component: module.AppShell })),
          children: [
            {
              ErrorBoundary: AreaProblem,
              children: [
                { index: true, loader: homeLoader(queryClient) },
                ...areaIds.map((id) => ({
                  path: areas[id].path.slice(1),
                  loader: areaLoader(queryClient, id),
                  lazy: areaModules[id],
                })),
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
