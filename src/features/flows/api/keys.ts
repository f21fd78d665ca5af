/** Query keys from general to specific, so a change can invalidate the list and a flow at once. */
export const flowKeys = {
  all: ["flows"] as const,
  list: () => [...flowKeys.all, "list"] as const,
  detail: (flowId: string) => [...flowKeys.all, "detail", flowId] as const,
  // Versions never change once published, so they sit apart from the detail they belong to.
  version: (flowId: string, number: number) => [...flowKeys.all, "version", flowId, number] as const,
};

export function flowPath(flowId: string, screen?: "history" | "simulate") {
  return `/flows/${encodeURIComponent(flowId)}${screen ? `/${screen}` : ""}`;
}

export function flowApiPath(flowId: string, rest = "") {
  return `/api/flows/${encodeURIComponent(flowId)}${rest}`;
}
