import type { ReactNode } from "react";
import { MutationCache, QueryCache, QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { meQueryOptions } from "../features/auth/api/get-me.ts";
import { isApiRequestError } from "../lib/api-client.ts";
import { MotionProvider } from "../lib/motion.tsx";

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
      },
    },
  });
  return queryClient;
}

// Asking again will not change a 4xx answer.
function isClientError(error: unknown) {
  return isApiRequestError(error) && error.status >= 400 && error.status < 500;
}

export function AppProvider({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      <MotionProvider>{children}</MotionProvider>
    </QueryClientProvider>
  );
}
