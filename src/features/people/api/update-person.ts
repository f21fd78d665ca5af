import { useMutation, useQueryClient } from "@tanstack/react-query";
import { updatePersonResponseSchema, type UpdatePersonRequest } from "../../../../shared/schemas/people.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { peopleKeys } from "./list-people.ts";

export function updatePerson({ id, change }: { id: string; change: UpdatePersonRequest }) {
  return apiFetch(`/api/users/${encodeURIComponent(id)}`, { method: "PATCH", body: change, schema: updatePersonResponseSchema });
}

export function useUpdatePerson() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updatePerson, onSettled: () => queryClient.invalidateQueries({ queryKey: peopleKeys.all }) });
}
