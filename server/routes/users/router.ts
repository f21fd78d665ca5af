import { Router, type NextFunction, type Request, type Response } from "express";
import type { z } from "zod";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { authorize } from "../../auth/policies.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { publicBaseUrl } from "../../lib/public-url.ts";
import { invitePerson, listPeople, resendInvite, updatePerson } from "../../services/people.ts";
import { inviteRequestSchema, updatePersonRequestSchema, userIdParamsSchema } from "../../../shared/schemas/people.ts";

const mayManage = (_req: Request, res: Response, next: NextFunction) => {
  authorize(currentUser(res), "user.manage");
  next();
};

/** The shop lead's people: who is here, invitations, roles and standing. Mounted at /api/users. */
export function usersRouter(ctx: AppContext): Router {
  const router = Router();

  router.get("/", requireUser, mayManage, async (_req: Request, res: Response) => {
    res.json({ people: await listPeople(ctx) });
  });

  router.post("/invites", requireUser, mayManage, validate({ body: inviteRequestSchema }), async (req: Request, res: Response) => {
    const body = req.body as z.output<typeof inviteRequestSchema>;
    res.status(201).json(await invitePerson(ctx, body, publicBaseUrl(req, ctx.env), currentUser(res).id));
  });

  router.post("/:id/invites", requireUser, mayManage, validate({ params: userIdParamsSchema }), async (req: Request, res: Response) => {
    const { id } = res.locals.params as z.output<typeof userIdParamsSchema>;
    res.json(await resendInvite(ctx, id, publicBaseUrl(req, ctx.env), currentUser(res).id));
  });

  router.patch("/:id", requireUser, mayManage, validate({ params: userIdParamsSchema, body: updatePersonRequestSchema }), async (req: Request, res: Response) => {
    const { id } = res.locals.params as z.output<typeof userIdParamsSchema>;
    const change = req.body as z.output<typeof updatePersonRequestSchema>;
    res.json({ person: await updatePerson(ctx, id, change, currentUser(res).id) });
  });

  return router;
}
