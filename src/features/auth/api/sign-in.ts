import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { z } from "zod";
import { meResponseSchema, type MeResponse, type signInRequestSchema } from "../../../../shared/schemas/auth.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { meQueryOptions } from "./get-me.ts";

export type SignInInput = z.output<typeof signInRequestSchema>;

export function signIn(input: SignInInput): Promise<MeResponse> {
  return apiFetch("/api/auth/sign-in", { method: "POST", body: input, schema: meResponseSchema });
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: async (me) => {
      // A different person may have used this tablet last: start from an empty cache.
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, me);
      // Re-read the session through the cookie so a cookie the browser refused shows up here.
      await queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey, refetchType: "all" });
    },
  });
}
