import { z } from "zod";

export const healthResponseSchema = z.object({
  status: z.enum(["ok", "degraded"]),
  version: z.string(),
  database: z.object({ kind: z.string(), ok: z.boolean(), latencyMs: z.number().nullable(), error: z.string().optional() }),
});
export type HealthResponse = z.infer<typeof healthResponseSchema>;
