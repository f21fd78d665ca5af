import { flowApiPath } from "./keys.ts";

/** The address of a flow's file: a plain link downloads it with the session cookie, no fetch needed. */
export function exportHref(flowId: string, version: number | "draft") {
  return flowApiPath(flowId, `/export?version=${version}`);
}

export function exportFileName(flowId: string, version: number | "draft") {
  return `${flowId}-${version === "draft" ? "draft" : `v${version}`}.json`;
}
