import { useMutation } from "@tanstack/react-query";
import type { PasswordResetRequest } from "../../../../shared/schemas/people.ts";
import { apiFetch } from "../../../lib/api-client.ts";

/** Always answered 202: the server never says whether the address belongs to anyone. */
export function requestReset(input: PasswordResetRequest): Promise<unknown> {
  return apiFetch("/api/auth/password-resets", { method: "POST", body: input });
}

export function useRequestReset() {
  return useMutation({ mutationFn: requestReset });
}
