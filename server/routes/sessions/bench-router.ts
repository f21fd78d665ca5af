import { Router, type Request, type Response } from "express";
import type { AppContext } from "../../context.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { benchHome } from "../../services/bench-home.ts";

/** The tech's own bench: mounted at /api/bench. */
export function benchRouter(ctx: AppContext): Router {
  const router = Router();
  router.get("/home", requireUser, async (_req: Request, res: Response) => {
    res.json(await benchHome(ctx, currentUser(res)));
  });
  return router;
}
