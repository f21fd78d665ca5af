import { Router } from "express";
import type { AppContext } from "../../context.ts";
import type { HealthResponse } from "../../../shared/schemas/health.ts";

export const APP_VERSION = "0.1.0";

export function healthRouter(ctx: AppContext): Router {
  const router = Router();
  router.get("/", async (_req, res) => {
    const database = await ctx.health();
    const body: HealthResponse = { status: database.ok ? "ok" : "degraded", version: APP_VERSION, database };
    res.status(database.ok ? 200 : 503).json(body);
  });
  return router;
}
