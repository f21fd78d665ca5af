import type { NextFunction, Request, Response } from "express";
import type { AppContext } from "../context.ts";
import { forbidden, unauthenticated } from "../lib/errors.ts";
import { clearSessionCookie, readSessionToken, setSessionCookie } from "./cookies.ts";
import { validateToken, type ValidSession } from "../services/auth.ts";
import type { PublicUser, Role } from "../../shared/schemas/users.ts";

declare module "express-serve-static-core" {
  interface Locals {
    auth?: ValidSession | null;
  }
}

/** Reads the session cookie, if any, and slides its expiry; never refuses by itself. */
export function loadSession(ctx: AppContext) {
  return async (req: Request, res: Response, next: NextFunction) => {
    const token = readSessionToken(req);
    if (!token) {
      res.locals.auth = null;
      return next();
    }
    const auth = await validateToken(ctx, token);
    res.locals.auth = auth;
    if (!auth) clearSessionCookie(req, res, ctx.env.COOKIE_SECURE);
    else if (auth.renewedUntil) setSessionCookie(req, res, ctx.env.COOKIE_SECURE, token, auth.renewedUntil);
    next();
  };
}

export function currentUser(res: Response): PublicUser {
  const user = res.locals.auth?.user;
  if (!user) throw unauthenticated();
  return user;
}

export function requireUser(_req: Request, res: Response, next: NextFunction) {
  currentUser(res);
  next();
}

/** Lets through only the named roles; everyone else gets 403 (401 when not signed in). */
export function requireRole(...allowed: Role[]) {
  return (_req: Request, res: Response, next: NextFunction) => {
    const user = currentUser(res);
    if (!allowed.includes(user.role)) throw forbidden();
    next();
  };
}
