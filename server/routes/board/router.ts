import { Router, type Request, type Response } from "express";
import type { z } from "zod";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { authorize } from "../../auth/policies.ts";
import { getBoard, moveByHand, recordTestRun } from "../../services/board.ts";
import { idParamsSchema } from "../../../shared/schemas/work-orders.ts";
import { moveWorkOrderRequestSchema, type MoveWorkOrderRequest } from "../../../shared/schemas/board.ts";
import { recordTestRunRequestSchema } from "../../../shared/schemas/test-runs.ts";

type Id = z.output<typeof idParamsSchema>;

/** The board and moves by hand; mounted beside the work-orders router, ahead of its /:id. */
export function boardRouter(ctx: AppContext): Router {
  const router = Router();

  router.get("/board", requireUser, async (_req: Request, res: Response) => {
    authorize(currentUser(res), "work_order.read");
    res.json(await getBoard(ctx));
  });

  router.post("/:id/moves", requireUser, validate({ params: idParamsSchema, body: moveWorkOrderRequestSchema }), async (req: Request, res: Response) => {
    const user = currentUser(res);
    authorize(user, "work_order.update");
    res.json(await moveByHand(ctx, user, (res.locals.params as Id).id, req.body as MoveWorkOrderRequest));
  });

  router.post("/:id/test-runs", requireUser, validate({ params: idParamsSchema, body: recordTestRunRequestSchema }), async (req: Request, res: Response) => {
    const user = currentUser(res);
    authorize(user, "work_order.update");
    res.status(201).json(await recordTestRun(ctx, user, (res.locals.params as Id).id, req.body as z.output<typeof recordTestRunRequestSchema>));
  });

  return router;
}
