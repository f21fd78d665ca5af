import { useEffect, type ReactNode } from "react";
import { MutationCache, QueryCache, QueryClient, QueryClientProvider } from "@tanstack/react-query";
import type { Persister } from "@tanstack/react-query-persist-client";
import { meQueryOptions } from "../features/auth/api/get-me.ts";
import { signOut } from "../features/auth/api/sign-out.ts";
import { registerSessionSaveDefaults } from "../features/session/api/append-event.ts";
import { forgetKeptPhotos } from "../features/session/api/upload-photo.ts";
import { isApiRequestError } from "../lib/api-client.ts";
import { MotionProvider } from "../lib/motion.tsx";
import { PERSIST_MAX_AGE_MS } from "./query-persistence.ts";

export function createQueryClient() {
  // Any 401 means the session has ended: the shell then sees no user and goes to sign-in.
  const forgetEndedSession = (error: unknown) => {
    if (isApiRequestError(error, "unauthenticated")) queryClient.setQueryData(meQueryOptions().queryKey, null);
  };
  const queryClient: QueryClient = new QueryClient({
    queryCache: new QueryCache({ onError: forgetEndedSession }),
    mutationCache: new MutationCache({ onError: forgetEndedSession }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (failureCount, error) => failureCount < 2 && !isClientError(error),
        // At least the persisted cache's age, or restored entries would be collected at once.
        gcTime: PERSIST_MAX_AGE_MS,
      },
    },
  });
  // Before any restore: saves taken back from storage need their function.
  registerSessionSaveDefaults(queryClient);
  return queryClient;
}

// Asking again will not change a 4xx answer.
function isClientError(error: unknown) {
  return isApiRequestError(error) && error.status >= 400 && error.status < 500;
}

// Nothing one person saw or typed may stay on the tablet's storage once they sign out.
function useForgetOnSignOut(queryClient: QueryClient, persister: Persister | undefined) {
  useEffect(() => {
    if (!persister) return;
    return queryClient.getMutationCache().subscribe((event) => {
      if (event.type === "updated" && event.action.type === "success" && event.mutation.options.mutationFn === signOut) {
        void persister.removeClient();
        void forgetKeptPhotos();
      }
    });
  }, [queryClient, persister]);
}

/** The app's providers; a persister (see startPersistence) is only told when someone signs out. */
export function AppProvider({ queryClient, persister, children }: { queryClient: QueryClient; persister?: Persister; children: ReactNode }) {
  useForgetOnSignOut(queryClient, persister);
  return (
    <QueryClientProvider client={queryClient}>
      <MotionProvider>{children}</MotionProvider>
    </QueryClientProvider>
  );
}
