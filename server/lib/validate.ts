import type { NextFunction, Request, Response } from "express";
import { z } from "zod";
import { invalidInput } from "./errors.ts";

interface Schemas {
  body?: z.ZodType;
  query?: z.ZodType;
  params?: z.ZodType;
}

declare module "express-serve-static-core" {
  interface Locals {
    query?: unknown;
    params?: unknown;
  }
}

function parse(schema: z.ZodType, value: unknown) {
  const result = schema.safeParse(value ?? {});
  if (!result.success) throw invalidInput(z.flattenError(result.error));
  return result.data;
}

/** Checks the request against the shared contract; the parsed body replaces req.body, query and params go to res.locals. */
export function validate(schemas: Schemas) {
  return (req: Request, res: Response, next: NextFunction) => {
    if (schemas.body) req.body = parse(schemas.body, req.body);
    if (schemas.query) res.locals.query = parse(schemas.query, req.query);
    if (schemas.params) res.locals.params = parse(schemas.params, req.params);
    next();
  };
}
