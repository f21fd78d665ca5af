import { queryOptions } from "@tanstack/react-query";
import { capturedMailSchema } from "../../../../shared/schemas/mail.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { mailKeys } from "./list-outgoing.ts";

/** One received message with its text and HTML parts; it never changes once received. */
export function getCapturedMessage(id: string, signal?: AbortSignal) {
  return apiFetch(`/api/mail/inbox/${encodeURIComponent(id)}`, { signal, schema: capturedMailSchema });
}

export function capturedMessageQueryOptions(id: string) {
  return queryOptions({ queryKey: mailKeys.message(id), queryFn: ({ signal }) => getCapturedMessage(id, signal), staleTime: Infinity });
}

export const attachmentUrl = (id: string, index: number) => `/api/mail/inbox/${encodeURIComponent(id)}/attachments/${index}`;
