import { Router, type Request, type Response } from "express";
import type { z } from "zod";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { reviewQueue } from "../../services/review-queue.ts";
import { flagsOfSession } from "../../services/review.ts";
import { flagLimits } from "../../services/settings.ts";
import { reviewOptions } from "../../services/review-options.ts";
import { idParamsSchema } from "../../../shared/schemas/work-orders.ts";
import { reviewOptionsQuerySchema, reviewQueueQuerySchema, type ReviewQueueQuery } from "../../../shared/schemas/review.ts";

/**
 * The shop lead's review: mounted at /api/review. Every signed-in tech may ask; the services narrow
 * a tech to their own sessions (review.list_all, session.flags), the filter options included. The
 * sign-off itself is POST /api/sessions/:id/review.
 */
export function reviewRouter(ctx: AppContext): Router {
  const router = Router();

  router.get("/sessions", requireUser, validate({ query: reviewQueueQuerySchema }), async (_req: Request, res: Response) => {
    res.json(await reviewQueue(ctx, currentUser(res), res.locals.query as ReviewQueueQuery, new Date(), await flagLimits(ctx)));
  });

  router.get("/options", requireUser, validate({ query: reviewOptionsQuerySchema }), async (_req: Request, res: Response) => {
    res.json(await reviewOptions(ctx, currentUser(res)));
  });

  router.get("/sessions/:id/flags", requireUser, validate({ params: idParamsSchema }), async (_req: Request, res: Response) => {
    res.json(await flagsOfSession(ctx, currentUser(res), (res.locals.params as z.output<typeof idParamsSchema>).id));
  });

  return router;
}
