import { useMutation, useQueryClient } from "@tanstack/react-query";
import { inviteResponseSchema, type InviteRequest } from "../../../../shared/schemas/people.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { peopleKeys } from "./list-people.ts";

export function invitePerson(input: InviteRequest) {
  return apiFetch("/api/users/invites", { method: "POST", body: input, schema: inviteResponseSchema });
}

export function useInvitePerson() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: invitePerson, onSettled: () => queryClient.invalidateQueries({ queryKey: peopleKeys.all }) });
}
