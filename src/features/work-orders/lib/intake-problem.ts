import { z } from "zod";
import { clientErrorIds, isApiRequestError } from "../../../lib/api-client.ts";

export interface IntakeProblem {
  title: string;
  body: string;
}

const invalidInputSchema = z.object({
  fieldErrors: z.record(z.string(), z.array(z.string())).catch({}),
  formErrors: z.array(z.string()).catch([]),
});

export function invalidInputDetails(details: unknown) {
  const parsed = invalidInputSchema.safeParse(details ?? {});
  return parsed.success ? parsed.data : { fieldErrors: {}, formErrors: [] };
}

const kept = "Everything you typed is still here.";

/** What to tell the person checking the unit in when the server does not take it; null when the fields say it all. */
export function describeIntakeProblem(error: unknown, fieldsShown: boolean): IntakeProblem {
  if (isApiRequestError(error, "invalid_input")) {
    const { formErrors } = invalidInputDetails(error.details);
    if (fieldsShown && formErrors.length === 0) return { title: "The server wants some answers changed.", body: "Each one is marked beside its field." };
    return { title: "The server did not take this check-in.", body: `${formErrors.join(" ") || error.message} ${kept}` };
  }
  if (isApiRequestError(error, clientErrorIds.offline) || isApiRequestError(error, clientErrorIds.unreachable)) {
    return {
      title: "Not checked in: Benchpath cannot reach the shop's server.",
      body: `${kept} Check that this tablet is on the shop's network, then press Check in again.`,
    };
  }
  return {
    title: "Not checked in: something went wrong on the server.",
    body: `${kept} Press Check in again; if it keeps happening, tell your shop lead.`,
  };
}
