import { queryOptions } from "@tanstack/react-query";
import { peopleResponseSchema } from "../../../../shared/schemas/people.ts";
import { apiFetch } from "../../../lib/api-client.ts";

export const peopleKeys = {
  all: ["people"] as const,
  list: () => [...peopleKeys.all, "list"] as const,
};

export function listPeople(signal?: AbortSignal) {
  return apiFetch("/api/users", { signal, schema: peopleResponseSchema });
}

export function peopleQueryOptions() {
  return queryOptions({ queryKey: peopleKeys.list(), queryFn: ({ signal }) => listPeople(signal), staleTime: 0 });
}
