import { Router, type Request, type Response } from "express";
import { pipeline } from "node:stream/promises";
import type { z } from "zod";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { openAttachment } from "../../services/attachments.ts";
import { idParamsSchema } from "../../../shared/schemas/work-orders.ts";

type Id = z.output<typeof idParamsSchema>;

export function attachmentsRouter(ctx: AppContext): Router {
  const router = Router();
  const serve = (which: "main" | "thumb") => async (_req: Request, res: Response) => {
    const { row, stream } = await openAttachment(ctx, currentUser(res), (res.locals.params as Id).id, which);
    res.setHeader("Content-Type", row.mimeType);
    // Private: a shared cache must never keep a customer's photo; the bytes under an id never change.
    res.setHeader("Cache-Control", "private, max-age=86400");
    await pipeline(stream, res);
  };
  router.get("/:id", requireUser, validate({ params: idParamsSchema }), serve("main"));
  router.get("/:id/thumb", requireUser, validate({ params: idParamsSchema }), serve("thumb"));
  return router;
}
