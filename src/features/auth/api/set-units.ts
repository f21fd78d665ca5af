import { useMutation, useQueryClient } from "@tanstack/react-query";
import { unitChoiceResponseSchema, type UnitChoiceRequest } from "../../../../shared/schemas/people.ts";
import type { MeResponse } from "../../../../shared/schemas/auth.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { meQueryOptions } from "./get-me.ts";

export function setUnits(input: UnitChoiceRequest) {
  return apiFetch("/api/auth/me/units", { method: "PUT", body: input, schema: unitChoiceResponseSchema });
}

/** Saves the signed-in person's units; every screen reads them from the /me answer, so it is updated in place. */
export function useSetUnits() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setUnits,
    onSuccess: ({ user }) => {
      queryClient.setQueryData<MeResponse | null>(meQueryOptions().queryKey, (me) => (me ? { ...me, user } : me));
    },
  });
}
