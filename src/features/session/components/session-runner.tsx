import type { CompiledFlow } from "../../../../shared/flow/compile.ts";
import { equipmentKindLabels } from "../../../../shared/equipment.ts";
import type { SessionDetail } from "../../../../shared/schemas/sessions.ts";
import { useSessionLog } from "../lib/use-session-log.ts";
import { AbandonCheck } from "./abandon-dialog.tsx";
import { FindingActions } from "./finding-actions.tsx";
import { LiveSession } from "./live-session.tsx";

/** A real check on the bench: the tablet's log of it, saved to the server in order. */
export function SessionRunner({ detail, compiled, unitSystem }: { detail: SessionDetail; compiled: CompiledFlow; unitSystem: "imperial" | "metric" }) {
  const session = useSessionLog(detail);
  return (
    <LiveSession
      key={session.log.generation}
      sessionId={detail.id}
      input={detail.input}
      compiled={compiled}
      unitSystem={unitSystem}
      session={session}
      findingActions={(save) => <FindingActions sessionId={detail.id} save={save} />}
      footer={<AbandonCheck sessionId={detail.id} />}
      subject={`WO ${detail.workOrderNumber} · ${detail.unit.make} ${detail.unit.model} ${equipmentKindLabels[detail.unit.equipmentKind].toLowerCase()} · ${detail.flow.title}`}
    />
  );
}
