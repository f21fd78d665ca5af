import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "../../../lib/api-client.ts";

export function signOut(): Promise<void> {
  return apiFetch<void>("/api/auth/sign-out", { method: "POST" });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: async () => {
      await queryClient.cancelQueries();
      // Nothing one person saw may stay in memory for the next person at the same tablet.
      queryClient.clear();
    },
  });
}
