import { Router, type NextFunction, type Request, type Response } from "express";
import type { z } from "zod";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { publicBaseUrl } from "../../lib/public-url.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { authorize } from "../../auth/policies.ts";
import { findWorkOrder } from "../../services/work-order-detail.ts";
import { createEstimate, reviseEstimate, updateEstimate } from "../../services/estimates.ts";
import { getEstimate, listEstimates } from "../../services/estimate-view.ts";
import { sendEstimate } from "../../services/estimate-send.ts";
import { idParamsSchema } from "../../../shared/schemas/work-orders.ts";
import {
  createEstimateRequestSchema,
  listEstimatesQuerySchema,
  sendEstimateRequestSchema,
  updateEstimateRequestSchema,
} from "../../../shared/schemas/estimates.ts";

type Id = z.output<typeof idParamsSchema>;
const idOf = (res: Response) => (res.locals.params as Id).id;

/** A work order's estimates, for the techs and the shop lead who price and send them. Mounted at /api/estimates. */
export function estimatesRouter(ctx: AppContext): Router {
  const router = Router();
  const may = (action: string) => (_req: Request, res: Response, next: NextFunction) => {
    authorize(currentUser(res), action);
    next();
  };

  router.get("/", requireUser, may("estimate.read"), validate({ query: listEstimatesQuerySchema }), async (_req: Request, res: Response) => {
    const { workOrderId } = res.locals.query as z.output<typeof listEstimatesQuerySchema>;
    await findWorkOrder(ctx, workOrderId);
    res.json({ estimates: await listEstimates(ctx.db, workOrderId) });
  });

  router.post("/", requireUser, may("estimate.edit"), validate({ body: createEstimateRequestSchema }), async (req: Request, res: Response) => {
    const id = await createEstimate(ctx, currentUser(res), req.body as z.output<typeof createEstimateRequestSchema>);
    res.status(201).json(await getEstimate(ctx.db, id));
  });

  router.get("/:id", requireUser, may("estimate.read"), validate({ params: idParamsSchema }), async (_req: Request, res: Response) => {
    res.json(await getEstimate(ctx.db, idOf(res)));
  });

  router.put("/:id", requireUser, may("estimate.edit"), validate({ params: idParamsSchema, body: updateEstimateRequestSchema }), async (req: Request, res: Response) => {
    await updateEstimate(ctx, currentUser(res), idOf(res), req.body as z.output<typeof updateEstimateRequestSchema>);
    res.json(await getEstimate(ctx.db, idOf(res)));
  });

  router.post("/:id/revise", requireUser, may("estimate.edit"), validate({ params: idParamsSchema }), async (_req: Request, res: Response) => {
    const id = await reviseEstimate(ctx, currentUser(res), idOf(res));
    res.status(201).json(await getEstimate(ctx.db, id));
  });

  // Answers 200 either way: a failed send is a recorded outcome with its reason, and the estimate stays a draft.
  router.post("/:id/send", requireUser, may("estimate.send"), validate({ params: idParamsSchema, body: sendEstimateRequestSchema }), async (req: Request, res: Response) => {
    const { to } = req.body as z.output<typeof sendEstimateRequestSchema>;
    res.json(await sendEstimate(ctx, currentUser(res), idOf(res), to, publicBaseUrl(req, ctx.env)));
  });

  return router;
}
