import { useEffect, useState, type ReactNode } from "react";
import type { CompiledFlow } from "../../../../shared/flow/compile.ts";
import { latestReading } from "../../../../shared/flow/context.ts";
import type { FlowInput } from "../../../../shared/flow/step-rules.ts";
import { Button } from "../../../components/ui/button.tsx";
import type { SessionLog } from "../lib/use-session-log.ts";
import { useSessionRunner, type SaveState } from "../lib/use-session-runner.ts";
import { FindingSummary } from "./finding-screen.tsx";
import { PathTrail } from "./path-trail.tsx";
import { SaveStatus } from "./save-status.tsx";
import { StepMotion } from "./step-motion.tsx";
import { StepScreen } from "./step-screen.tsx";
import { VerdictCard } from "./verdict-card.tsx";

export interface LiveSessionProps {
  sessionId: string;
  input: FlowInput;
  compiled: CompiledFlow;
  unitSystem: "imperial" | "metric";
  /** The log the screen runs on: the server's save line, or a sandbox that keeps nothing. */
  session: SessionLog;
  /** What the tech can do at the finding (complete the check, or run a simulation again). */
  findingActions: (save: SaveState) => ReactNode;
  /** Below every step: abandoning a real check, leaving a simulation. */
  footer?: ReactNode;
  /** Which unit (or trial) this is, above every step, so two checks on one bench are never mixed up. */
  subject: ReactNode;
  /** A trial run saves nothing, so it has no save state to show. */
  showSaveStatus?: boolean;
}

/**
 * The machine says where the session stands, and the screen follows at once. Mount it under a key of
 * `session.log.generation`, so a log put back on the server's starts a fresh actor.
 */
export function LiveSession({ sessionId, input, compiled, unitSystem, session, findingActions, footer, subject, showSaveStatus = true }: LiveSessionProps) {
  const runner = useSessionRunner({ sessionId, input }, compiled, session);
  const { step, replayed, lastRequest } = runner;
  // The verdict of a reading stays up until the tech goes on; a later event replaces it anyway.
  const [seenVerdict, setSeenVerdict] = useState<string | null>(null);
  const recorded = lastRequest?.event.type === "step.record" && lastRequest.id !== seenVerdict ? lastRequest : null;
  const reading = recorded && recorded.event.type === "step.record" ? latestReading(replayed.context, recorded.event.stepId) : null;
  const direction = lastRequest?.event.type === "step.back" ? -1 : 1;
  const screenKey = reading ? `verdict-${recorded?.id}` : `${replayed.context.path.length}-${step.id}`;
  // Each new screen starts at its top, where its title and safety panels are.
  useEffect(() => {
    const page = document.scrollingElement ?? document.documentElement;
    page.scrollTop = 0;
  }, [screenKey]);

  return (
    <div className="flex flex-col gap-5 pb-10">
      <div className="flex flex-col gap-1 border-b-2 border-line pb-2">
        <div className="flex items-center justify-between gap-4">
          <p className="min-w-0 truncate text-base font-semibold">{subject}</p>
          {showSaveStatus && <SaveStatus state={runner.save} />}
        </div>
        <PathTrail compiled={compiled} path={replayed.context.path} />
      </div>
      {runner.problem && (
        <div role="alert" className="flex max-w-[70ch] flex-wrap items-center justify-between gap-3 rounded-lg border-2 border-problem bg-problem-soft px-4 py-3">
          <p className="text-base font-medium">{runner.problem}</p>
          <Button onClick={runner.dismissProblem}>Understood</Button>
        </div>
      )}
      <StepMotion key={screenKey} direction={direction}>
        {reading && recorded ? (
          <VerdictCard step={compiled.steps[reading.stepId]!} reading={reading} altitudeM={replayed.context.altitudeM} onContinue={() => setSeenVerdict(recorded.id)} />
        ) : step.kind === "finding" ? (
          <>
            <FindingSummary compiled={compiled} step={step} context={replayed.context} />
            <div className="sticky bottom-0 z-10 -mx-3 rounded-t-lg border-t-2 border-line-strong bg-surface px-3 pt-4 pb-5">{findingActions(runner.save)}</div>
            {/* A conclusion can be taken back: the answers before it stay in the log. */}
            {runner.can({ type: "step.back" }) && (
              <div className="flex justify-end border-t-2 border-line pt-5">
                <Button onClick={() => runner.send({ type: "step.back" })}>
                  <span aria-hidden="true">‹</span> Back one step
                </Button>
              </div>
            )}
          </>
        ) : (
          <StepScreen runner={runner} step={step} unitSystem={unitSystem} />
        )}
      </StepMotion>
      {footer && <div className="flex justify-end">{footer}</div>}
    </div>
  );
}
