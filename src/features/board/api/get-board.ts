import { queryOptions } from "@tanstack/react-query";
import { boardResponseSchema } from "../../../../shared/schemas/board.ts";
import { apiFetch } from "../../../lib/api-client.ts";
import { boardKeys } from "./keys.ts";

export function getBoard(signal?: AbortSignal) {
  return apiFetch("/api/work-orders/board", { signal, schema: boardResponseSchema });
}

export function boardQueryOptions() {
  return queryOptions({
    queryKey: boardKeys.board(),
    queryFn: ({ signal }) => getBoard(signal),
    // Others move tickets too: keep the board fresh while it is on the wall.
    refetchInterval: 30_000,
  });
}
