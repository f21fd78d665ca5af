import type { Database } from "./db/client.ts";
import type { Env } from "./env.ts";
import type { Logger } from "./lib/logger.ts";
import { createLucia, type AppLucia } from "./auth/lucia.ts";
import { createMailer, type Mailer } from "./mail/mailer.ts";

/** What every route and service needs, built once per app. */
export interface AppContext {
  db: Database;
  env: Env;
  logger: Logger;
  lucia: AppLucia;
  /** Outgoing mail: SMTP_URL, or the built-in sink. */
  mail: Mailer;
  health: () => Promise<{ kind: string; ok: boolean; latencyMs: number | null; error?: string }>;
}

export function createContext(parts: Omit<AppContext, "lucia" | "mail"> & { mail?: Mailer }): AppContext {
  return { ...parts, lucia: createLucia(parts.db), mail: parts.mail ?? createMailer(parts) };
}
