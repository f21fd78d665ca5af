import { Router, type Request, type Response } from "express";
import type { z } from "zod";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { readLink, usePasswordLink } from "../../services/password-links.ts";
import { linkTokenParamsSchema, setPasswordRequestSchema } from "../../../shared/schemas/people.ts";

/** The one-time links from invitation and reset e-mails; the token is the only credential. Mounted at /api/public/password-links. */
export function passwordLinksRouter(ctx: AppContext): Router {
  const router = Router();

  router.get("/:token", validate({ params: linkTokenParamsSchema }), async (_req: Request, res: Response) => {
    const { token } = res.locals.params as z.output<typeof linkTokenParamsSchema>;
    res.setHeader("Cache-Control", "no-store");
    res.json(await readLink(ctx, token));
  });

  router.post("/:token", validate({ params: linkTokenParamsSchema, body: setPasswordRequestSchema }), async (req: Request, res: Response) => {
    const { token } = res.locals.params as z.output<typeof linkTokenParamsSchema>;
    const { password } = req.body as z.output<typeof setPasswordRequestSchema>;
    res.json(await usePasswordLink(ctx, token, password));
  });

  return router;
}
