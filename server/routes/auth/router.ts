import { Router, type Request, type Response } from "express";
import type { AppContext } from "../../context.ts";
import { validate } from "../../lib/validate.ts";
import { HttpError } from "../../lib/errors.ts";
import { currentUser, requireUser } from "../../auth/middleware.ts";
import { authorize } from "../../auth/policies.ts";
import { clearSessionCookie, setSessionCookie } from "../../auth/cookies.ts";
import { passwordResetThrottle, signInThrottle } from "../../auth/throttle.ts";
import { signIn, signOut } from "../../services/auth.ts";
import { changePassword } from "../../services/users.ts";
import { getShopName } from "../../services/settings.ts";
import { changePasswordRequestSchema, signInRequestSchema, type MeResponse } from "../../../shared/schemas/auth.ts";
import type { z } from "zod";
import { publicBaseUrl } from "../../lib/public-url.ts";
import { setOwnUnits } from "../../services/people.ts";
import { requestPasswordReset } from "../../services/password-links.ts";
import { passwordResetRequestSchema, unitChoiceRequestSchema } from "../../../shared/schemas/people.ts";

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

  router.put("/me/units", requireUser, validate({ body: unitChoiceRequestSchema }), async (req: Request, res: Response) => {
    const user = currentUser(res);
    const { unitSystem } = req.body as z.output<typeof unitChoiceRequestSchema>;
    res.json({ user: await setOwnUnits(ctx, user.id, unitSystem) });
  });

  // The same answer, at once, for every address: whether a link goes out is never told, not even by timing.
  router.post("/password-resets", ...passwordResetThrottle(), validate({ body: passwordResetRequestSchema }), (req: Request, res: Response) => {
    const { email } = req.body as z.output<typeof passwordResetRequestSchema>;
    requestPasswordReset(ctx, email, publicBaseUrl(req, ctx.env), req.ip).catch((error: unknown) => ctx.logger.error({ err: error }, "password reset not sent"));
    res.status(202).json({ message: "If that address belongs to someone here, a link is on its way." });
  });

  return router;
}
