import { z } from "zod";
import { isApiRequestError } from "../../../lib/api-client.ts";

const flattenedSchema = z.object({ formErrors: z.array(z.string()).default([]), fieldErrors: z.record(z.string(), z.array(z.string()).optional()).default({}) });

export interface QueueRefusal {
  /** Every message, each once, in the server's order. */
  messages: string[];
  /** The first message for each parameter, to show beside its control. */
  byParam: Record<string, string>;
}

/** What a 400 from the queue says about the address, or null for any other failure. */
export function queueRefusalOf(error: unknown): QueueRefusal | null {
  if (!isApiRequestError(error) || error.status !== 400) return null;
  const parsed = flattenedSchema.safeParse(error.details);
  if (!parsed.success) return { messages: [error.message], byParam: {} };
  const byParam: Record<string, string> = {};
  const messages = [...parsed.data.formErrors];
  for (const [param, list] of Object.entries(parsed.data.fieldErrors)) {
    if (list?.[0]) byParam[param] = list[0];
    messages.push(...(list ?? []));
  }
  return { messages: [...new Set(messages.length > 0 ? messages : [error.message])], byParam };
}
