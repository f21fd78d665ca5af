import { Router, type Request, type Response } from "express";
import type { z } from "zod";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { decideEstimate, publicEstimate } from "../../services/estimate-public.ts";
import { estimateDecisionRequestSchema, estimateTokenParamsSchema } from "../../../shared/schemas/estimates.ts";

type TokenParams = z.output<typeof estimateTokenParamsSchema>;

/**
 * The customer's estimate by its one-time link: no account, the link's token is the only key.
 * The product's one write without a signed-in user; the Origin check still applies to it. Mounted at /api/public/estimates.
 */
export function publicEstimatesRouter(ctx: AppContext): Router {
  const router = Router();

  router.get("/:token", validate({ params: estimateTokenParamsSchema }), async (_req: Request, res: Response) => {
    res.setHeader("Cache-Control", "no-store");
    res.json(await publicEstimate(ctx, (res.locals.params as TokenParams).token));
  });

  router.post("/:token/decision", validate({ params: estimateTokenParamsSchema, body: estimateDecisionRequestSchema }), async (req: Request, res: Response) => {
    res.setHeader("Cache-Control", "no-store");
    res.json(await decideEstimate(ctx, (res.locals.params as TokenParams).token, req.body as z.output<typeof estimateDecisionRequestSchema>));
  });

  return router;
}
