import { Router, type Request, type Response } from "express";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { HttpError } from "../../lib/errors.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { authorize } from "../../auth/policies.ts";
import { clearSessionCookie, setSessionCookie } from "../../auth/cookies.ts";
import { signInThrottle } from "../../auth/throttle.ts";
import { signIn, signOut } from "../../services/auth.ts";
import { changePassword } from "../../services/users.ts";
import { getShopName } from "../../services/settings.ts";
import { changePasswordRequestSchema, signInRequestSchema, type MeResponse } from "../../../shared/schemas/auth.ts";
import type { z } from "zod";

export function authRouter(ctx: AppContext): Router {
  const router = Router();

  router.post("/sign-in", ...signInThrottle(), validate({ body: signInRequestSchema }), async (req: Request, res: Response) => {
    const { email, password } = req.body as z.output<typeof signInRequestSchema>;
    const result = await signIn(ctx, email, password, req.ip);
    if (!result) throw new HttpError(401, "invalid_credentials", "That e-mail and password do not match an active account.");
    setSessionCookie(req, res, ctx.env.COOKIE_SECURE, result.token, result.expiresAt);
    const body: MeResponse = { user: result.user, shop: { name: await getShopName(ctx) } };
    res.json(body);
  });

  router.post("/sign-out", requireUser, async (req: Request, res: Response) => {
    await signOut(ctx, res.locals.auth!);
    clearSessionCookie(req, res, ctx.env.COOKIE_SECURE);
    res.status(204).end();
  });

  router.get("/me", requireUser, async (_req: Request, res: Response) => {
    const body: MeResponse = { user: currentUser(res), shop: { name: await getShopName(ctx) } };
    res.json(body);
  });

  router.post("/password", requireUser, validate({ body: changePasswordRequestSchema }), async (req: Request, res: Response) => {
    const user = currentUser(res);
    authorize(user, "user.change_own_password", { ownerId: user.id });
    const { currentPassword, newPassword } = req.body as z.output<typeof changePasswordRequestSchema>;
    await changePassword(ctx, user.id, currentPassword, newPassword);
    clearSessionCookie(req, res, ctx.env.COOKIE_SECURE);
    res.status(204).end();
  });

  return router;
}
