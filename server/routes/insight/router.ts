import { Router, type NextFunction, type Request, type Response } from "express";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { authorize } from "../../auth/policies.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { shopInsight } from "../../services/insight.ts";
import { insightQuerySchema, type InsightQuery } from "../../../shared/schemas/insight.ts";

/** Checked before the query, so a tech is told 403 rather than what the dates lack. */
const mayRead = (_req: Request, res: Response, next: NextFunction) => {
  authorize(currentUser(res), "insight.read");
  next();
};

/** The shop lead's figures over a date range: mounted at /api/insight. */
export function insightRouter(ctx: AppContext): Router {
  const router = Router();

  router.get("/", requireUser, mayRead, validate({ query: insightQuerySchema }), async (_req: Request, res: Response) => {
    res.json(await shopInsight(ctx, currentUser(res), res.locals.query as InsightQuery));
  });

  return router;
}
