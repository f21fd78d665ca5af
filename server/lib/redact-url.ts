/**
 * One-time links carry their token in the address; the request log keeps the address without it.
 * Covers the customer's estimate page, the password pages and their API calls.
 */
const tokenPaths = /^(\/(?:api\/public\/[a-z-]+|estimate|welcome|reset-password))\/[A-Za-z0-9_-]{16,}/;

export function redactTokenInUrl(url: string): string {
  return url.replace(tokenPaths, "$1/[token]");
}
