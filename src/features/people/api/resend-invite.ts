import { useMutation, useQueryClient } from "@tanstack/react-query";
import { inviteResponseSchema } from "../../../../shared/schemas/people.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { peopleKeys } from "./list-people.ts";

/** A fresh invitation link by e-mail; the older links stop working. */
export function resendInvite(userId: string) {
  return apiFetch(`/api/users/${encodeURIComponent(userId)}/invites`, { method: "POST", schema: inviteResponseSchema });
}

export function useResendInvite() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: resendInvite, onSettled: () => queryClient.invalidateQueries({ queryKey: peopleKeys.all }) });
}
