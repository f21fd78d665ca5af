import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import { passwordLinkSchema, setPasswordResponseSchema, type SetPasswordRequest } from "../../../../shared/schemas/people.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { meQueryOptions } from "./get-me.ts";

export const passwordLinkKeys = {
  all: ["password-links"] as const,
  one: (token: string) => [...passwordLinkKeys.all, token] as const,
};

/** What a one-time link is for and whose it is; 404 and 410 say it cannot be used. */
export function getPasswordLink(token: string, signal?: AbortSignal) {
  return apiFetch(`/api/public/password-links/${encodeURIComponent(token)}`, { signal, schema: passwordLinkSchema });
}

export function passwordLinkQueryOptions(token: string) {
  return queryOptions({ queryKey: passwordLinkKeys.one(token), queryFn: ({ signal }) => getPasswordLink(token, signal), retry: false, staleTime: Infinity });
}

export function usePasswordLink(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SetPasswordRequest) => apiFetch(`/api/public/password-links/${encodeURIComponent(token)}`, { method: "POST", body: input, schema: setPasswordResponseSchema }),
    // The new password ends every session of that person, perhaps this browser's own.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey }),
  });
}
