/** An error with an HTTP status and a stable snake_case id, answered as JSON. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly id: string,
    message: string,
    readonly details?: unknown,
    readonly headers?: Record<string, string>,
  ) {
    super(message);
    this.name = "HttpError";
  }
}

export const badRequest = (id: string, message: string, details?: unknown) => new HttpError(400, id, message, details);
export const invalidInput = (details: unknown, message = "Some fields need attention.") =>
  new HttpError(400, "invalid_input", message, details);
export const unauthenticated = (message = "Sign in to continue.") => new HttpError(401, "unauthenticated", message);
export const forbidden = (id = "forbidden", message = "Your role cannot do that.") => new HttpError(403, id, message);
export const notFound = (message = "Not found.") => new HttpError(404, "not_found", message);
export const conflict = (id: string, message: string, details?: unknown) => new HttpError(409, id, message, details);
export const unprocessable = (id: string, message: string, details?: unknown) => new HttpError(422, id, message, details);
export const tooManyRequests = (retryAfterSeconds: number, message: string) =>
  new HttpError(429, "too_many_attempts", message, { retryAfterSeconds }, { "Retry-After": String(retryAfterSeconds) });
export const payloadTooLarge = (message: string) => new HttpError(413, "payload_too_large", message);

/** A PostgreSQL unique violation (23505), as node-postgres and PGlite raise it through drizzle. */
export const isUniqueViolation = (e: unknown) => (e as { code?: string } | null)?.code === "23505" || (e as { cause?: { code?: string } } | null)?.cause?.code === "23505";
