import { queryOptions } from "@tanstack/react-query";
import { inboxResponseSchema } from "../../../../shared/schemas/mail.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { mailKeys } from "./list-outgoing.ts";

/** Where mail goes and, with the built-in sink, what it received. */
export function getInbox(signal?: AbortSignal) {
  return apiFetch("/api/mail/inbox?limit=100", { signal, schema: inboxResponseSchema });
}

export function inboxQueryOptions() {
  return queryOptions({ queryKey: mailKeys.inbox(), queryFn: ({ signal }) => getInbox(signal), staleTime: 0 });
}
