import type { InvalidInputDetails } from "../../../../shared/schemas/common.ts";
import { clientErrorIds, isApiRequestError } from "../../../lib/api-client.ts";

export interface SignInProblem {
  title: string;
  body: string;
}

export function invalidInputDetails(details: unknown): InvalidInputDetails {
  const given = (details ?? {}) as Partial<InvalidInputDetails>;
  return { fieldErrors: given.fieldErrors ?? {}, formErrors: given.formErrors ?? [] };
}

/** What to tell the person at the tablet when sign-in fails, and what to do next; null when the fields say it. */
export function describeSignInProblem(error: unknown): SignInProblem | null {
  if (!isApiRequestError(error)) return somethingWentWrong;
  switch (error.id) {
    case "invalid_input": {
      const { fieldErrors, formErrors } = invalidInputDetails(error.details);
      if (formErrors.length === 0 && Object.keys(fieldErrors).length > 0) return null;
      return { title: "Check what you typed.", body: formErrors.join(" ") || error.message };
    }
    case "invalid_credentials":
      return {
        title: "That e-mail and password do not match an account.",
        body: "Check both and try again. If you have forgotten your password, choose “Forgot your password?” below.",
      };
    case "too_many_attempts":
      return {
        title: "Too many sign-in attempts.",
        body: `To protect the shop's accounts, sign-in is paused. ${waitSentence(error.retryAfter)}`,
      };
    case clientErrorIds.offline:
      return {
        title: "Benchpath cannot reach the shop's server.",
        body: "Check that this tablet is on the shop's network, then try again. What you typed is kept.",
      };
    case clientErrorIds.unreachable:
      return {
        title: "The shop's server is not answering.",
        body: "It may be restarting. Try again in a minute; if it keeps happening, tell your shop lead.",
      };
    default:
      return somethingWentWrong;
  }
}

const somethingWentWrong: SignInProblem = {
  title: "Sign-in did not work this time.",
  body: "Something went wrong on the server. Try again; if it keeps happening, tell your shop lead.",
};

export function waitSentence(retryAfterSeconds: number | null): string {
  if (retryAfterSeconds === null) return "Wait a few minutes, then try again.";
  const minutes = Math.max(1, Math.ceil(retryAfterSeconds / 60));
  return `Wait ${minutes} ${minutes === 1 ? "minute" : "minutes"}, then try again.`;
}
