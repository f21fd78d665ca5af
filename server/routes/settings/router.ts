import { Router, type Request, type Response } from "express";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { authorize } from "../../auth/policies.ts";
import { readSettings, updateSettings } from "../../services/settings.ts";
import { settingsSchema, type Settings } from "../../../shared/schemas/settings.ts";

export function settingsRouter(ctx: AppContext): Router {
  const router = Router();

  router.get("/", requireUser, async (_req: Request, res: Response) => {
    authorize(currentUser(res), "settings.read");
    res.json(await readSettings(ctx));
  });

  // The policy comes before the body is checked, so a tech is told no rather than what to fix.
  const mayUpdate = (_req: Request, res: Response, next: () => void) => {
    authorize(currentUser(res), "settings.update");
    next();
  };
  router.put("/", requireUser, mayUpdate, validate({ body: settingsSchema }), async (req: Request, res: Response) => {
    res.json(await updateSettings(ctx, currentUser(res), req.body as Settings));
  });

  return router;
}
