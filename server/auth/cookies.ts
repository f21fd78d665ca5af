import type { Request, Response } from "express";
import type { Env } from "../env.ts";

const PLAIN = "bp_session";
const HOST_BOUND = "__Host-bp_session";

/** Secure (and the __Host- prefix) whenever the request came over HTTPS, or always when configured. */
function isSecure(req: Request, mode: Env["COOKIE_SECURE"]): boolean {
  return mode === "always" || req.secure;
}

export function readSessionToken(req: Request): string | null {
  const header = req.headers.cookie;
  if (!header) return null;
  const jar = new Map<string, string>();
  for (const part of header.split(";")) {
    const eq = part.indexOf("=");
    if (eq > 0) jar.set(part.slice(0, eq).trim(), decodeURIComponent(part.slice(eq + 1).trim()));
  }
  return jar.get(HOST_BOUND) ?? jar.get(PLAIN) ?? null;
}

export function setSessionCookie(req: Request, res: Response, mode: Env["COOKIE_SECURE"], token: string, expiresAt: Date): void {
  const secure = isSecure(req, mode);
  res.cookie(secure ? HOST_BOUND : PLAIN, token, { httpOnly: true, sameSite: "lax", path: "/", secure, expires: expiresAt });
}

export function clearSessionCookie(req: Request, res: Response, mode: Env["COOKIE_SECURE"]): void {
  const secure = isSecure(req, mode);
  res.clearCookie(secure ? HOST_BOUND : PLAIN, { httpOnly: true, sameSite: "lax", path: "/", secure });
}
