import type { Router } from "express";
import type { AppContext } from "../context.ts";
import { authRouter } from "./auth/router.ts";
import { healthRouter } from "./health/router.ts";
import { workOrdersRouter } from "./work-orders/router.ts";
import { sessionsRouter } from "./sessions/router.ts";
import { benchRouter } from "./sessions/bench-router.ts";
import { attachmentsRouter } from "./attachments/router.ts";
import { flowsRouter } from "./flows/router.ts";
import { reviewRouter } from "./review/router.ts";
import { insightRouter } from "./insight/router.ts";
import { mailRouter } from "./mail/router.ts";
import { boardRouter } from "./board/router.ts";
import { settingsRouter } from "./settings/router.ts";
import { usersRouter } from "./users/router.ts";
import { passwordLinksRouter } from "./password-links/router.ts";
import { estimatesRouter } from "./estimates/router.ts";
import { publicEstimatesRouter } from "./estimates/public-router.ts";

export interface ApiResource {
  base: string;
  router: Router;
  /** The resource's routes read their own bodies (after their checks, with their own limits); the API's JSON parser leaves them alone. */
  ownBodies?: boolean;
}

/** Every API resource and where it is mounted; the access-matrix test reads the routes from here. */
export function apiResources(ctx: AppContext): ApiResource[] {
  return [
    { base: "/api/health", router: healthRouter(ctx) },
    { base: "/api/auth", router: authRouter(ctx) },
    // Ahead of the work-orders router, whose /:id would otherwise take /board.
    { base: "/api/work-orders", router: boardRouter(ctx) },
    { base: "/api/work-orders", router: workOrdersRouter(ctx) },
    { base: "/api/sessions", router: sessionsRouter(ctx) },
    { base: "/api/bench", router: benchRouter(ctx) },
    { base: "/api/attachments", router: attachmentsRouter(ctx) },
    { base: "/api/flows", router: flowsRouter(ctx), ownBodies: true },
    { base: "/api/review", router: reviewRouter(ctx) },
    { base: "/api/insight", router: insightRouter(ctx) },
    { base: "/api/mail", router: mailRouter(ctx) },
    { base: "/api/settings", router: settingsRouter(ctx) },
    { base: "/api/users", router: usersRouter(ctx) },
    { base: "/api/public/password-links", router: passwordLinksRouter(ctx) },
    { base: "/api/estimates", router: estimatesRouter(ctx) },
    // A customer's estimate by its one-time link: beside sign-in and the password links, the only change made without signing in.
    { base: "/api/public/estimates", router: publicEstimatesRouter(ctx) },
  ];
}

interface RouteLayer {
  route?: { path: string; methods: Record<string, boolean> };
}

export function listRoutes(resources: ApiResource[]): { method: string; path: string }[] {
  return resources.flatMap(({ base, router }) =>
    (router.stack as RouteLayer[])
      .filter((layer) => layer.route)
      .flatMap((layer) =>
        Object.keys(layer.route!.methods)
          .filter((m) => m !== "_all")
          .map((m) => ({ method: m.toUpperCase(), path: (base + (layer.route!.path === "/" ? "" : layer.route!.path)) || "/" })),
      ),
  );
}
