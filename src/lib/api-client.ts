import type { z } from "zod";
import { apiErrorSchema } from "../../shared/schemas/common.ts";

/** Error ids the client makes itself, beside the server's own ids. */
export const clientErrorIds = {
  offline: "offline",
  unreachable: "unreachable",
  unexpectedResponse: "unexpected_response",
} as const;

export class ApiRequestError extends Error {
  override readonly name = "ApiRequestError";
  readonly status: number;
  readonly id: string;
  readonly details: unknown;
  /** Seconds to wait before trying again, from the Retry-After header. */
  readonly retryAfter: number | null;

  constructor(init: { status: number; id: string; message: string; details?: unknown; retryAfter?: number | null }) {
    super(init.message);
    this.status = init.status;
    this.id = init.id;
    this.details = init.details;
    this.retryAfter = init.retryAfter ?? null;
  }
}

export function isApiRequestError(error: unknown, id?: string): error is ApiRequestError {
  return error instanceof ApiRequestError && (id === undefined || error.id === id);
}

interface ApiFetchOptions<T> {
  method?: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  /** JSON-encoded, except FormData, which goes as multipart (photos). */
  body?: unknown;
  signal?: AbortSignal;
  /** Checks the success body at the boundary. */
  schema?: z.ZodType<T>;
}

export async function apiFetch<T = unknown>(path: string, options: ApiFetchOptions<T> = {}): Promise<T> {
  const { method = "GET", body, signal, schema } = options;
  const headers: Record<string, string> = { accept: "application/json" };
  const multipart = body instanceof FormData;
  if (body !== undefined && !multipart) headers["content-type"] = "application/json";

  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      body: body === undefined ? undefined : multipart ? body : JSON.stringify(body),
      credentials: "same-origin",
      signal,
    });
  } catch (error) {
    if (signal?.aborted) throw error;
    throw new ApiRequestError({ status: 0, id: clientErrorIds.offline, message: "The server could not be reached." });
  }

  const payload = await readJson(response);
  if (!response.ok) throw toRequestError(response, payload);
  if (!schema) return payload as T;

  const parsed = schema.safeParse(payload);
  if (!parsed.success) {
    throw new ApiRequestError({
      status: response.status,
      id: clientErrorIds.unexpectedResponse,
      message: "The server sent an answer this version of Benchpath does not understand.",
    });
  }
  return parsed.data;
}

async function readJson(response: Response): Promise<unknown> {
  if (response.status === 204) return undefined;
  const text = await response.text();
  if (text === "") return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

function toRequestError(response: Response, payload: unknown): ApiRequestError {
  const retryAfter = parseRetryAfter(response.headers.get("retry-after"));
  const parsed = apiErrorSchema.safeParse(payload);
  if (parsed.success) {
    const { id, message, details } = parsed.data.error;
    return new ApiRequestError({ status: response.status, id, message, details, retryAfter });
  }
  // A gateway answering for a server that is down is the same, for the user, as no connection.
  const gatewayDown = response.status === 502 || response.status === 503 || response.status === 504;
  return new ApiRequestError({
    status: response.status,
    id: gatewayDown ? clientErrorIds.unreachable : clientErrorIds.unexpectedResponse,
    message: gatewayDown ? "The server is not answering." : `The server answered ${response.status}.`,
    retryAfter,
  });
}

/** Retry-After is either seconds or an HTTP date. */
export function parseRetryAfter(value: string | null, now: number = Date.now()): number | null {
  if (value === null || value.trim() === "") return null;
  const seconds = Number(value);
  if (Number.isFinite(seconds)) return Math.max(0, Math.ceil(seconds));
  const date = Date.parse(value);
  if (Number.isNaN(date)) return null;
  return Math.max(0, Math.ceil((date - now) / 1000));
}
