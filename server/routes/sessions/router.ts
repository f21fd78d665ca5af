import { Router, type Request, type Response } from "express";
import type { z } from "zod";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { getSessionDetail, sessionFor } from "../../services/sessions.ts";
import { savePhoto } from "../../services/attachments.ts";
import { compiledVersion } from "../../services/flows.ts";
import { conflict, unprocessable } from "../../lib/errors.ts";
import { photoUpload } from "../attachments/upload.ts";
import { appendEvent } from "../../services/session-events.ts";
import { abandonSession, completeSession, reopenSession } from "../../services/session-end.ts";
import { reviewSession } from "../../services/review.ts";
import { authorize } from "../../auth/policies.ts";
import { reviewDecisionRequestSchema, type ReviewDecisionRequest } from "../../../shared/schemas/review.ts";
import { idParamsSchema } from "../../../shared/schemas/work-orders.ts";
import { abandonSessionRequestSchema, appendEventRequestSchema, sessionPhotoFieldsSchema, type AppendEventRequest } from "../../../shared/schemas/sessions.ts";

type Id = z.output<typeof idParamsSchema>;
const idOf = (res: Response) => (res.locals.params as Id).id;

// Who may do what to a session is decided by the named policies inside the services (session.read, session.append, session.abandon).
export function sessionsRouter(ctx: AppContext): Router {
  const router = Router();

  router.get("/:id", requireUser, validate({ params: idParamsSchema }), async (_req: Request, res: Response) => {
    res.json(await getSessionDetail(ctx, currentUser(res), idOf(res)));
  });

  router.post("/:id/events", requireUser, validate({ params: idParamsSchema, body: appendEventRequestSchema }), async (req: Request, res: Response) => {
    const result = await appendEvent(ctx, currentUser(res), idOf(res), req.body as AppendEventRequest);
    res.status(result.stored ? 201 : 200).json(result);
  });

  router.post("/:id/complete", requireUser, validate({ params: idParamsSchema }), async (_req: Request, res: Response) => {
    const user = currentUser(res);
    await completeSession(ctx, user, idOf(res));
    res.json(await getSessionDetail(ctx, user, idOf(res)));
  });

  router.post("/:id/abandon", requireUser, validate({ params: idParamsSchema, body: abandonSessionRequestSchema }), async (req: Request, res: Response) => {
    const user = currentUser(res);
    await abandonSession(ctx, user, idOf(res), (req.body as z.output<typeof abandonSessionRequestSchema>).reason);
    res.json(await getSessionDetail(ctx, user, idOf(res)));
  });

  router.post("/:id/reopen", requireUser, validate({ params: idParamsSchema }), async (_req: Request, res: Response) => {
    const user = currentUser(res);
    await reopenSession(ctx, user, idOf(res));
    res.json(await getSessionDetail(ctx, user, idOf(res)));
  });

  // The role is checked before the body, so a tech is told 403 rather than what the form lacks.
  const mayReview = (_req: Request, res: Response, next: () => void) => {
    authorize(currentUser(res), "session.review");
    next();
  };
  router.post("/:id/review", requireUser, validate({ params: idParamsSchema }), mayReview, validate({ body: reviewDecisionRequestSchema }), async (req: Request, res: Response) => {
    const user = currentUser(res);
    await reviewSession(ctx, user, idOf(res), req.body as ReviewDecisionRequest);
    res.json(await getSessionDetail(ctx, user, idOf(res)));
  });

  // Only the session's own tech, on an open session, gets as far as sending the file.
  const photoTarget = async (_req: Request, res: Response, next: () => void) => {
    const session = await sessionFor(ctx.db, currentUser(res), idOf(res), "session.append");
    if (session.status !== "open") throw conflict("session_closed", "This session is already completed or abandoned; it takes no more photos.");
    res.locals.flowVersionId = session.flowVersionId;
    next();
  };
  router.post("/:id/photos", requireUser, validate({ params: idParamsSchema }), photoTarget, photoUpload, validate({ body: sessionPhotoFieldsSchema }), async (req: Request, res: Response) => {
    const { stepId, id } = req.body as z.output<typeof sessionPhotoFieldsSchema>;
    const flow = await compiledVersion(ctx.db, res.locals.flowVersionId as string);
    if (!flow.steps[stepId]) throw unprocessable("unknown_step", `"${stepId}" is not a step of this session's flow.`, { stepId });
    const { created, ...photo } = await savePhoto(ctx, currentUser(res), { type: "session", id: idOf(res), stepId }, req.file!.buffer, id);
    res.status(created ? 201 : 200).json(photo);
  });

  return router;
}
