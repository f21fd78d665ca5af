import type { Request, RequestHandler } from "express";
import { rateLimit, type RateLimitInfo } from "express-rate-limit";
import { tooManyRequests } from "../lib/errors.ts";

const WINDOW_MS = 10 * 60 * 1000;

function blocked(req: Request): never {
  const info = (req as Request & { rateLimit?: RateLimitInfo }).rateLimit;
  const reset = info?.resetTime?.getTime() ?? Date.now() + WINDOW_MS;
  const seconds = Math.max(1, Math.ceil((reset - Date.now()) / 1000));
  throw tooManyRequests(seconds, `Too many failed sign-ins. Try again in ${Math.ceil(seconds / 60)} minutes.`);
}

/**
 * Failed sign-ins are counted per address and per account (10 failures block that account for
 * 10 minutes); a success does not count.
 */
export function signInThrottle(): RequestHandler[] {
  const common = {
    windowMs: WINDOW_MS,
    skipSuccessfulRequests: true,
    standardHeaders: false,
    legacyHeaders: false,
    handler: (req: Request) => blocked(req),
  } as const;
  const perAddress = rateLimit({ ...common, limit: 30 });
  const perAccount = rateLimit({
    ...common,
    limit: 10,
    keyGenerator: (req) => `account:${String((req.body as { email?: unknown } | undefined)?.email ?? "").trim().toLowerCase()}`,
  });
  return [perAddress, perAccount];
}

/**
 * Reset requests are counted whatever the outcome, per address (20) and per e-mail (5) in 10 minutes,
 * so the form cannot be used to flood someone's inbox; the answer is the same for every e-mail.
 */
export function passwordResetThrottle(): RequestHandler[] {
  const common = {
    windowMs: WINDOW_MS,
    standardHeaders: false,
    legacyHeaders: false,
    handler: (req: Request) => {
      const info = (req as Request & { rateLimit?: RateLimitInfo }).rateLimit;
      const seconds = Math.max(1, Math.ceil(((info?.resetTime?.getTime() ?? Date.now() + WINDOW_MS) - Date.now()) / 1000));
      throw tooManyRequests(seconds, `Too many reset requests. Try again in ${Math.ceil(seconds / 60)} minutes.`);
    },
  } as const;
  const perAddress = rateLimit({ ...common, limit: 20 });
  const perAccount = rateLimit({
    ...common,
    limit: 5,
    keyGenerator: (req) => `reset:${String((req.body as { email?: unknown } | undefined)?.email ?? "").trim().toLowerCase()}`,
  });
  return [perAddress, perAccount];
}
