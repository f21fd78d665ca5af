// The flows resource reads its own request bodies (the API's 100 kB JSON parser leaves /api/flows
// alone), each after the caller is known to be allowed: a draft or a flow file may be up to
// MAX_IMPORT_BYTES, and a refused caller's bytes are never read.
import express, { type NextFunction, type Request, type RequestHandler, type Response } from "express";
import { badRequest, payloadTooLarge } from "../../lib/errors.ts";
import { MAX_IMPORT_BYTES } from "../../../shared/schemas/flows.ts";

const SMALL_BODY = "100kb";
const limitText = `${MAX_IMPORT_BYTES / (1024 * 1024)} MiB (${MAX_IMPORT_BYTES.toLocaleString("en-US")} bytes)`;

/** Runs a body-parser, answering its "too large" with our own message. */
function withLimitMessage(parser: RequestHandler, message: string): RequestHandler {
  return (req: Request, res: Response, next: NextFunction) =>
    parser(req, res, (error?: unknown) => next((error as { type?: string } | undefined)?.type === "entity.too.large" ? payloadTooLarge(message) : error));
}

/** A small JSON body (the API's usual limit). */
export const smallJson = withLimitMessage(express.json({ limit: SMALL_BODY }), "The request body is too large.");

/** A draft save: a whole definition, up to the size of a flow file. */
export const draftJson = withLimitMessage(express.json({ limit: MAX_IMPORT_BYTES }), `The draft is larger than ${limitText}, the most a flow may be.`);

const decoder = new TextDecoder("utf-8", { fatal: true });

/**
 * A flow file as the body, whatever its content type: read as bytes up to MAX_IMPORT_BYTES, then
 * parsed here so a file that is not JSON gets a message about the file rather than the request.
 */
export const flowFileBody: RequestHandler = withLimitMessage(
  express.raw({ type: () => true, limit: MAX_IMPORT_BYTES }),
  `The file is larger than ${limitText}, the most a flow file may be.`,
);

export function parseFlowFile(req: Request): unknown {
  const bytes = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
  try {
    return JSON.parse(decoder.decode(bytes).replace(/^\uFEFF/, ""));
  } catch {
    throw badRequest("malformed_json", bytes.length === 0 ? "The file is empty: send a flow's JSON as the request body." : "The file is not valid JSON (UTF-8); export a flow from Benchpath and try again.");
  }
}
