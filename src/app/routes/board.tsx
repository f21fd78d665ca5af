import { useQuery } from "@tanstack/react-query";
import { meQueryOptions } from "../../features/auth/api/get-me.ts";
import { BoardPage } from "../../features/board/components/board-page.tsx";

// Everyone on the work-order area may move tickets (work_order.update covers the intake roles).
export function BoardRoute() {
  const { data: me } = useQuery(meQueryOptions());
  return <BoardPage canMove={me != null} />;
}
