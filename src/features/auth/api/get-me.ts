import { queryOptions } from "@tanstack/react-query";
import { meResponseSchema, type MeResponse } from "../../../../shared/schemas/auth.ts";
import { apiFetch, isApiRequestError } from "../../../lib/api-client.ts";

/** The signed-in user and shop, or null when nobody is signed in. */
export async function getMe(signal?: AbortSignal): Promise<MeResponse | null> {
  try {
    return await apiFetch("/api/auth/me", { signal, schema: meResponseSchema });
  } catch (error) {
    if (isApiRequestError(error) && error.status === 401) return null;
    throw error;
  }
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: ["auth", "me"],
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });
}
