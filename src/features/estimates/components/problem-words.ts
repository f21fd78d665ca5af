import { clientErrorIds, isApiRequestError } from "../../../lib/api-client.ts";

/** What went wrong, in words that say what to do next. */
export function problemWords(error: unknown): string {
  if (isApiRequestError(error, clientErrorIds.offline) || isApiRequestError(error, clientErrorIds.unreachable)) {
    return "The shop's server cannot be reached. Check the connection, then try again.";
  }
  if (isApiRequestError(error) && error.status === 403) return "Your role cannot do this. Ask the shop lead.";
  if (isApiRequestError(error) && error.id !== clientErrorIds.unexpectedResponse) return error.message;
  return "Something went wrong on the server. Try again; if it keeps happening, tell the shop lead.";
}
