import { queryOptions } from "@tanstack/react-query";
import { outgoingMailResponseSchema } from "../../../../shared/schemas/mail.ts";
import { apiFetch } from "../../../lib/api-client.ts";

export const mailKeys = {
  all: ["mail"] as const,
  outgoing: () => [...mailKeys.all, "outgoing"] as const,
  inbox: () => [...mailKeys.all, "inbox"] as const,
  message: (id: string) => [...mailKeys.all, "inbox", id] as const,
};

/** What the shop tried to send, newest first, with how each went. */
export function listOutgoing(signal?: AbortSignal) {
  return apiFetch("/api/mail/outgoing?limit=100", { signal, schema: outgoingMailResponseSchema });
}

export function outgoingQueryOptions() {
  return queryOptions({ queryKey: mailKeys.outgoing(), queryFn: ({ signal }) => listOutgoing(signal), staleTime: 0 });
}
