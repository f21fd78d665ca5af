import type { NextFunction, Request, Response } from "express";
import type { Logger } from "./logger.ts";
import { HttpError } from "./errors.ts";

interface BodyParserError {
  type?: string;
  status?: number;
}

function send(res: Response, status: number, id: string, message: string, details?: unknown) {
  res.status(status).json({ error: details === undefined ? { id, message } : { id, message, details } });
}

/** The one place errors become responses: JSON with a stable id, never a stack trace. */
export function errorHandler(logger: Logger) {
  return (error: unknown, req: Request, res: Response, _next: NextFunction) => {
    if (res.headersSent) return;
    if (error instanceof HttpError) {
      for (const [name, value] of Object.entries(error.headers ?? {})) res.setHeader(name, value);
      return send(res, error.status, error.id, error.message, error.details);
    }
    const parserError = error as BodyParserError;
    if (parserError?.type === "entity.parse.failed") return send(res, 400, "malformed_json", "The request body is not valid JSON.");
    if (parserError?.type === "entity.too.large") return send(res, 413, "payload_too_large", "The request body is too large.");
    if (parserError?.type === "encoding.unsupported" || parserError?.type === "charset.unsupported")
      return send(res, 415, "unsupported_encoding", "The request body's encoding is not supported.");
    (req.log ?? logger).error({ err: error, reqId: req.id }, "unhandled error");
    send(res, 500, "internal_error", `Something went wrong on the server (request ${String(req.id ?? "")}).`);
  };
}
