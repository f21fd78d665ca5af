import { useMemo, useState, type ReactNode } from "react";
import { compileFlow, type CompiledFlow } from "../../../../shared/flow/compile.ts";
import type { FlowInput } from "../../../../shared/flow/step-rules.ts";
import { Button } from "../../../components/ui/button.tsx";
import { useSandboxLog } from "../lib/use-sandbox-log.ts";
import { LiveSession } from "./live-session.tsx";
import { PhotoSourceContext } from "./photo-thumb.tsx";
import { SandboxSetup } from "./sandbox-setup.tsx";

function compileOrReason(definition: unknown): { compiled: CompiledFlow } | { reason: string } {
  try {
    return { compiled: compileFlow(definition) };
  } catch (e) {
    return { reason: e instanceof Error ? e.message : "The flow cannot be run." };
  }
}

function SandboxRun({ compiled, input, unitSystem, onAgain, leave }: { compiled: CompiledFlow; input: FlowInput; unitSystem: "imperial" | "metric"; onAgain: () => void; leave: ReactNode }) {
  const session = useSandboxLog();
  return (
    <PhotoSourceContext.Provider value={session.photos.source}>
      <LiveSession
        key={session.log.generation}
        sessionId="sandbox"
        input={input}
        compiled={compiled}
        unitSystem={unitSystem}
        session={session}
        findingActions={() => (
          <div className="flex flex-wrap gap-4">
            <Button variant="primary" size="main" onClick={onAgain}>
              Run it again
            </Button>
            {leave}
          </div>
        )}
        footer={leave}
        subject={`Trial run · ${compiled.title}`}
        showSaveStatus={false}
      />
    </PhotoSourceContext.Provider>
  );
}

/**
 * A trial run of a flow that may never have been published: the apprentice's own screens and rules,
 * with an engine and altitude the author picks, and nothing saved anywhere.
 */
export function SandboxSession({ definition, unitSystem, defaultAltitudeM, leave }: { definition: unknown; unitSystem: "imperial" | "metric"; defaultAltitudeM: number; leave: ReactNode }) {
  const compiled = useMemo(() => compileOrReason(definition), [definition]);
  const [input, setInput] = useState<FlowInput | null>(null);
  const [run, setRun] = useState(0);
  return (
    <div className="flex flex-col gap-6">
      <p role="note" className="max-w-[70ch] rounded-lg border-2 border-dashed border-line-strong bg-sunken px-5 py-3 text-base font-semibold">
        Trial run: nothing you enter here is saved, and no work order is touched.
      </p>
      {"reason" in compiled ? (
        <div role="alert" className="flex max-w-[70ch] flex-col gap-3">
          <p className="text-lg font-semibold">This draft cannot be run yet.</p>
          <p className="text-base">{compiled.reason}</p>
          {leave}
        </div>
      ) : input === null ? (
        <SandboxSetup defaultAltitudeM={defaultAltitudeM} onStart={setInput} />
      ) : (
        <SandboxRun key={run} compiled={compiled.compiled} input={input} unitSystem={unitSystem} onAgain={() => setRun((n) => n + 1)} leave={leave} />
      )}
    </div>
  );
}
