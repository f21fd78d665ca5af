import type { Request } from "express";
import type { Env } from "../env.ts";

/** The address links in e-mail start with: PUBLIC_URL, or the address this request came in on. */
export function publicBaseUrl(req: Request, env: Pick<Env, "PUBLIC_URL">): string {
  if (env.PUBLIC_URL) return env.PUBLIC_URL.replace(/\/+$/, "");
  return `${req.protocol}://${req.get("host")}`;
}
