import type { NextFunction, Request, Response } from "express";
import { forbidden } from "./errors.ts";

const SAFE = new Set(["GET", "HEAD", "OPTIONS"]);

/** CSRF defence: a state-changing request must say where it came from, and it must be us. */
export function requireSameOrigin(allowed: string[]) {
  const extra = new Set(allowed.map((o) => new URL(o).origin));
  return (req: Request, _res: Response, next: NextFunction) => {
    if (SAFE.has(req.method)) return next();
    const origin = req.get("origin");
    if (!origin) throw forbidden("origin_missing", "This request must come from a Benchpath page (no Origin header was sent).");
    const own = `${req.protocol}://${req.get("host")}`;
    if (origin !== own && !extra.has(origin)) throw forbidden("origin_forbidden", "This request came from another site and was refused.");
    next();
  };
}
