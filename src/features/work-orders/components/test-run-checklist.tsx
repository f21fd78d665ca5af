import { useState } from "react";
import { Link } from "react-router";
import { failedChecks, testRunCheckIds, testRunCheckQuestions, type TestRunCheckId } from "../../../../shared/work-orders/moves.ts";
import type { TestRun } from "../../../../shared/schemas/test-runs.ts";
import type { WorkOrderDetail } from "../../../../shared/schemas/work-orders.ts";
import { Button } from "../../../components/ui/button.tsx";
import { ChoiceGroup } from "../../../components/ui/choice-group.tsx";
import { FormProblem } from "../../../components/ui/form-message.tsx";
import { SafetyPanel } from "../../../components/ui/safety-panel.tsx";
import { StatePill } from "../../../components/ui/state-pill.tsx";
import { TextArea } from "../../../components/ui/text-area.tsx";
import { isApiRequestError } from "../../../lib/api-client.ts";
import { useRecordTestRun } from "../api/record-test-run.ts";

type Answer = "yes" | "no";
const yesNo = [
  { value: "yes", label: "Yes" },
  { value: "no", label: "No" },
] as const;
const noAnswers = (): Record<TestRunCheckId, Answer | null> => ({ throttleReturns: null, stopSwitchStops: null, steadyIdle: null, attachmentStillAtIdle: null, runsUnderLoad: null });
const ranFormat = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });

/** The test run after a repair: five yes/no checks behind the safety warning, and the latest result. */
export function TestRunChecklist({ workOrder }: { workOrder: WorkOrderDetail }) {
  const latest = workOrder.latestTestRun ?? null;
  const inTestRun = workOrder.state === "test_run";
  if (!inTestRun && !latest) return null;
  return (
    <section aria-labelledby="test-run" className="flex flex-col gap-5">
      <h2 id="test-run" className="text-2xl font-semibold">
        Test run
      </h2>
      {latest && <LatestRun run={latest} />}
      {inTestRun && <NextRun key={latest?.id ?? "first"} workOrderId={workOrder.id} passed={latest?.passed === true} />}
    </section>
  );
}

// After a pass the unit is ready to go out: the form folds away unless another run is wanted.
function NextRun({ workOrderId, passed }: { workOrderId: string; passed: boolean }) {
  const [again, setAgain] = useState(false);
  if (passed && !again)
    return (
      <div className="flex flex-col items-start gap-3">
        <p role="status">
          Passed.{" "}
          <Link to="/work-orders/board" className="font-semibold text-accent underline decoration-2 underline-offset-4">
            Move it to ready for pick-up on the board
          </Link>
          .
        </p>
        <Button onClick={() => setAgain(true)}>Record another test run</Button>
      </div>
    );
  return <TestRunForm workOrderId={workOrderId} />;
}

function LatestRun({ run }: { run: TestRun }) {
  const failed = failedChecks(run.checks);
  return (
    <div className="flex flex-col gap-3 rounded-xl border-2 border-line-strong bg-raised px-5 py-4" aria-label="Latest test run">
      <div className="flex flex-wrap items-center gap-3">
        <StatePill shape={run.passed ? "yes" : "no"}>{run.passed ? "Passed" : `Failed: ${failed.length} of ${testRunCheckIds.length} checks`}</StatePill>
        <span>
          {run.by ? `${run.by.name}, ` : ""}
          {ranFormat.format(new Date(run.at))}
        </span>
      </div>
      <ul className="flex flex-col gap-1">
        {testRunCheckIds.map((id) => {
          const ok = run.checks[id] === true;
          return (
            <li key={id} className={ok ? "" : "font-semibold text-problem"}>
              <span aria-hidden="true">{ok ? "✓ " : "✗ "}</span>
              {testRunCheckQuestions[id]} {ok ? "Yes." : "No — failed."}
            </li>
          );
        })}
      </ul>
      {run.note && <p>Note: {run.note}</p>}
      {!run.passed && <p>Move it back to in repair on the board, fix what failed, then run the test again.</p>}
    </div>
  );
}

function TestRunForm({ workOrderId }: { workOrderId: string }) {
  const record = useRecordTestRun();
  const [answers, setAnswers] = useState(noAnswers);
  const [note, setNote] = useState("");
  const [acknowledged, setAcknowledged] = useState(false);
  const [tried, setTried] = useState(false);
  const missing = testRunCheckIds.filter((id) => answers[id] === null);

  const save = () => {
    setTried(true);
    if (missing.length > 0 || !acknowledged) return;
    const checks = Object.fromEntries(testRunCheckIds.map((id) => [id, answers[id] === "yes"])) as Record<TestRunCheckId, boolean>;
    record.mutate({ workOrderId, checks, note });
  };

  const problem = record.error
    ? isApiRequestError(record.error) && record.error.status === 409
      ? record.error.message
      : "The test run was not saved: Benchpath could not reach the shop's server. Your answers are still here; press Save again."
    : null;

  return (
    <form
      noValidate
      aria-label="Record a test run"
      className="flex flex-col gap-5"
      onSubmit={(event) => {
        event.preventDefault();
        save();
      }}
    >
      <SafetyPanel signal="warning" title="The engine runs and the cutting attachment can move" onAcknowledge={() => setAcknowledged(true)} acknowledged={acknowledged}>
        <ul className="flex list-disc flex-col gap-1 pl-5">
          <li>Run it outdoors or with exhaust extraction: exhaust gas contains carbon monoxide, which can kill without warning.</li>
          <li>Keep hands, feet and bystanders clear of the chain, blade or line: it can turn as the clutch engages.</li>
          <li>Start it on the ground, with the chain brake on where fitted; wear eye and hearing protection.</li>
        </ul>
        <p className="mt-2">Follow the manufacturer's manual for this unit and your shop's rules.</p>
      </SafetyPanel>
      <SafetyPanel signal="caution" title="Hot exhaust">
        The muffler and engine stay hot after running: let them cool before handling, and keep fuel and rags away from them.
      </SafetyPanel>
      {testRunCheckIds.map((id) => (
        <ChoiceGroup
          key={id}
          id={`test-run-${id}`}
          name={id}
          legend={testRunCheckQuestions[id]}
          minChoiceWidth="narrow"
          choices={yesNo}
          value={answers[id]}
          onChange={(value: Answer) => setAnswers((current) => ({ ...current, [id]: value }))}
          error={tried && answers[id] === null ? "Answer yes or no." : undefined}
        />
      ))}
      {missing.length === 0 && testRunCheckIds.some((id) => answers[id] === "no") && (
        <p className="font-semibold">
          {testRunCheckIds.filter((id) => answers[id] === "no").length} answered No: this test run will be saved as failed.
        </p>
      )}
      <TextArea id="test-run-note" label="Note" hint="Optional: what you saw, in a few words." value={note} maxLength={1000} onChange={(event) => setNote(event.currentTarget.value)} />
      {tried && !acknowledged && <FormProblem title="Read the warning first.">Press “Read and understood” on the warning above, then save.</FormProblem>}
      {problem && <FormProblem title="Not saved.">{problem}</FormProblem>}
      <Button type="submit" variant="primary" size="main" disabled={record.isPending} className="self-start">
        {record.isPending ? "Saving…" : "Save the test run"}
      </Button>
    </form>
  );
}
