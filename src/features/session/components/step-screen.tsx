import type { CompiledStep } from "../../../../shared/flow/compile.ts";
import type { SessionRunner } from "../lib/use-session-runner.ts";
import { Button } from "../../../components/ui/button.tsx";
import { GateNote } from "./gate-note.tsx";
import { MisleadsNote } from "./misleads-note.tsx";
import { PhotoRequest } from "./photo-request.tsx";
import { ReadingEntry } from "./reading-entry.tsx";
import { StepAnswers } from "./step-answers.tsx";
import { StepCautions } from "./step-cautions.tsx";
import { StepNote } from "./step-note.tsx";

type RunStep = Exclude<CompiledStep, { kind: "finding" }>;

function gateReasons(runner: SessionRunner, step: RunStep): string[] {
  const reasons = runner.missingAcks.map((signal) => `Read the ${signal} panel and press "Read and understood" first.`);
  if (runner.photoMissing && step.photo) reasons.push(`Take the photo first: ${step.photo.prompt}.`);
  return reasons;
}

/** One step: what to do, what to watch out for, then the one way on. */
export function StepScreen({ runner, step, unitSystem }: { runner: SessionRunner; step: RunStep; unitSystem: "imperial" | "metric" }) {
  const reasons = gateReasons(runner, step);
  const blocked = reasons.length > 0;
  const notes = (runner.replayed.notes[step.id] ?? []).map((n) => n.text);
  const canGoBack = runner.can({ type: "step.back" });
  return (
    <>
      <header className="flex max-w-[70ch] flex-col gap-3">
        <h1 className="text-step font-semibold">{step.title}</h1>
        {step.body && <p className="text-lg whitespace-pre-line">{step.body}</p>}
      </header>
      <StepCautions step={step} acknowledged={runner.replayed.acknowledgements[step.id] ?? []} onAcknowledge={(signal) => runner.send({ type: "caution.acknowledge", stepId: step.id, signal })} />
      {step.misleads && step.kind !== "reading" && <MisleadsNote text={step.misleads} />}
      {step.photo && <PhotoRequest key={step.id} ask={step.photo} taken={runner.photos} onTake={(photo) => runner.takePhoto(step.id, photo)} />}
      {step.kind === "reading" ? (
        <>
          <GateNote reasons={reasons} />
          <ReadingEntry key={step.id} step={step} unitSystem={unitSystem} blocked={blocked} can={runner.can} onRecord={runner.send} />
          {/* After the keypad: it is about what the number means, and the keypad must stay in view. */}
          {step.misleads && <MisleadsNote text={step.misleads} />}
        </>
      ) : (
        // Below the panels, but held at the foot of the screen while they are read: long safety text never hides the way on.
        <div className="sticky bottom-0 z-10 -mx-3 flex flex-col gap-3 rounded-t-lg border-t-2 border-line-strong bg-surface px-3 pt-4 pb-5">
          <GateNote reasons={reasons} />
          <StepAnswers step={step} blocked={blocked} can={runner.can} onAnswer={runner.send} />
        </div>
      )}
      <div className="flex flex-wrap items-start justify-between gap-6 border-t-2 border-line pt-5">
        <StepNote key={step.id} stepId={step.id} notes={notes} onAdd={(text) => runner.send({ type: "note.add", stepId: step.id, text })} />
        {canGoBack && (
          <Button onClick={() => runner.send({ type: "step.back" })}>
            <span aria-hidden="true">‹</span> Back one step
          </Button>
        )}
      </div>
    </>
  );
}
