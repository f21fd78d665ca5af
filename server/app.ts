import path from "node:path";
import { existsSync } from "node:fs";
import express, { type Express, type RequestHandler } from "express";
import helmet from "helmet";
import { pinoHttp } from "pino-http";
import { redactTokenInUrl } from "./lib/redact-url.ts";
import { v7 as uuidv7 } from "uuid";
import type { AppContext } from "./context.ts";
import { loadSession } from "./auth/middleware.ts";
import { requireSameOrigin } from "./lib/origin.ts";
import { errorHandler } from "./lib/error-handler.ts";
import { HttpError } from "./lib/errors.ts";
import { apiResources } from "./routes/index.ts";

export interface AppOptions {
  /** The built client (dist/client) to serve with an SPA fallback; null for an API-only app. */
  clientDir?: string | null;
  /** Development: Vite's middleware serves the client instead. */
  clientMiddleware?: RequestHandler | null;
}

function trustProxySetting(value: string | undefined): number | string | false {
  if (!value) return false;
  return /^\d+$/.test(value) ? Number(value) : value;
}

/** Builds the whole app without listening: tests drive it with supertest, server/index.ts listens. */
export function createApp(ctx: AppContext, options: AppOptions = {}): Express {
  const app = express();
  app.disable("x-powered-by");
  app.set("trust proxy", trustProxySetting(ctx.env.TRUST_PROXY));

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", "data:", "blob:"],
          fontSrc: ["'self'", "data:"],
          connectSrc: ["'self'"],
          mediaSrc: ["'self'", "blob:"],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          frameAncestors: ["'none'"],
          // No upgrade-insecure-requests: shops run Benchpath over plain HTTP on their own network.
        },
      },
      strictTransportSecurity: false,
      crossOriginEmbedderPolicy: false,
    }),
  );

  app.use(
    pinoHttp({
      logger: ctx.logger,
      genReqId: (req, res) => {
        const id = uuidv7();
        res.setHeader("x-request-id", id);
        return id;
      },
      autoLogging: { ignore: (req) => req.url === "/api/health" },
      serializers: {
        req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: redactTokenInUrl(req.url) }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );

  const api = express.Router();
  const resources = apiResources(ctx);
  const ownBodies = resources.filter((r) => r.ownBodies).map((r) => r.base.replace(/^\/api/, ""));
  const json = express.json({ limit: "100kb" });
  api.use((req, res, next) => (ownBodies.some((base) => req.path === base || req.path.startsWith(`${base}/`)) ? next() : json(req, res, next)));
  api.use(requireSameOrigin(ctx.env.ALLOWED_ORIGINS));
  api.use(loadSession(ctx));
  for (const resource of resources) api.use(resource.base.replace(/^\/api/, ""), resource.router);
  api.use(() => {
    throw new HttpError(404, "not_found", "There is no such API endpoint.");
  });
  api.use(errorHandler(ctx.logger));
  app.use("/api", api);

  if (options.clientMiddleware) app.use(options.clientMiddleware);
  const clientDir = options.clientDir;
  if (clientDir && existsSync(path.join(clientDir, "index.html"))) {
    app.use(express.static(clientDir, { index: false, maxAge: "1h", setHeaders: immutableAssets }));
    app.get("/{*splat}", (_req, res) => {
      res.setHeader("Cache-Control", "no-cache");
      res.sendFile(path.join(clientDir, "index.html"));
    });
  }
  app.use(errorHandler(ctx.logger));
  return app;
}

function immutableAssets(res: express.Response, file: string) {
  // The tablet asks for the service worker again on every visit, so a new build reaches it.
  if (path.basename(file) === "sw.js") res.setHeader("Cache-Control", "no-cache");
  if (file.includes(`${path.sep}assets${path.sep}`)) res.setHeader("Cache-Control", "public, max-age=31536000, immutable");
}
