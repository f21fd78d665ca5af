import { compileFlow, type CompiledFlow } from "../../shared/flow/compile.ts";
import type { SessionDetail } from "../../shared/schemas/sessions.ts";

// A published version never changes: compile it once, however often its sessions are fetched again.
const compiledVersions = new Map<string, CompiledFlow>();

/** The session's pinned flow version, compiled. */
export function compiledVersionOf(detail: Pick<SessionDetail, "flow" | "definition">): CompiledFlow {
  let compiled = compiledVersions.get(detail.flow.versionId);
  if (!compiled) compiledVersions.set(detail.flow.versionId, (compiled = compileFlow(detail.definition)));
  return compiled;
}
