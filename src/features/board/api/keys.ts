/**
 * Under the work orders' own prefix, so anything that refreshes work orders refreshes the board,
 * and a move here refreshes their lists and details too.
 */
export const boardKeys = {
  workOrders: ["work-orders"] as const,
  board: () => [...boardKeys.workOrders, "board"] as const,
};
