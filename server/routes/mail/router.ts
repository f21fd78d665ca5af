import { Router, type NextFunction, type Request, type Response } from "express";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { authorize } from "../../auth/policies.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { capturedAttachment, capturedMessage, inbox, listOutgoingMail } from "../../services/mail-records.ts";
import { attachmentParamsSchema, mailIdParamsSchema, mailListQuerySchema } from "../../../shared/schemas/mail.ts";
import type { z } from "zod";

const mayRead = (_req: Request, res: Response, next: NextFunction) => {
  authorize(currentUser(res), "mail.read");
  next();
};

/** The shop lead's view of mail: what was sent and how it went, and the built-in sink's inbox. Mounted at /api/mail. */
export function mailRouter(ctx: AppContext): Router {
  const router = Router();

  router.get("/outgoing", requireUser, mayRead, validate({ query: mailListQuerySchema }), async (_req: Request, res: Response) => {
    const { limit } = res.locals.query as z.output<typeof mailListQuerySchema>;
    res.json({ messages: await listOutgoingMail(ctx, limit) });
  });

  router.get("/inbox", requireUser, mayRead, validate({ query: mailListQuerySchema }), async (_req: Request, res: Response) => {
    const { limit } = res.locals.query as z.output<typeof mailListQuerySchema>;
    res.json(await inbox(ctx, limit));
  });

  router.get("/inbox/:id", requireUser, mayRead, validate({ params: mailIdParamsSchema }), async (_req: Request, res: Response) => {
    const { id } = res.locals.params as z.output<typeof mailIdParamsSchema>;
    res.json(await capturedMessage(ctx, id));
  });

  router.get("/inbox/:id/attachments/:index", requireUser, mayRead, validate({ params: attachmentParamsSchema }), async (_req: Request, res: Response) => {
    const { id, index } = res.locals.params as z.output<typeof attachmentParamsSchema>;
    const file = await capturedAttachment(ctx, id, index);
    res.setHeader("Content-Type", file.contentType);
    res.setHeader("Content-Disposition", `attachment; filename="${file.filename.replace(/["\\\r\n]/g, "_")}"`);
    res.setHeader("X-Content-Type-Options", "nosniff");
    res.send(file.content);
  });

  return router;
}
