// When a session's save waits and tries again, for answers and photos alike.
import { clientErrorIds, isApiRequestError } from "../../../lib/api-client.ts";

/** No answer at all, or a gateway with no server behind it: the save waits and tries again. */
export function isUnreachable(error: unknown): boolean {
  if (error instanceof TypeError) return true;
  return isApiRequestError(error) && (error.id === clientErrorIds.offline || error.id === clientErrorIds.unreachable || error.status >= 500);
}

export const retryDelay = (attempt: number) => Math.min(1000 * 2 ** attempt, 15_000);
