import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi } from "../render-app.tsx";
import { answers, buildDetail } from "../work-orders/fakes.ts";
import type { TestRun } from "../../../shared/schemas/test-runs.ts";
import type { WorkOrderDetail } from "../../../shared/schemas/work-orders.ts";

const tech = meAnswers(signedInAs("senior_tech", { id: "user-tech", name: "Wes Tannery" }));
const questions = [
  "Does the throttle return to idle freely when let go?",
  "Does the stop switch stop the engine?",
  "Does the engine idle steadily without stalling?",
  "Does the cutting attachment stay still at idle?",
  "Does it run under load without bogging or dying?",
];

async function open(detail: () => WorkOrderDetail, post?: (body: unknown) => Response) {
  stubApi(tech, answers("GET", "/api/work-orders/wo-1", () => json(detail())), ...(post ? [answers("POST", "/api/work-orders/wo-1/test-runs", post)] : []));
  renderApp("/work-orders/wo-1");
  await screen.findByRole("heading", { level: 1, name: "Hollis TR-22 string trimmer" }, { timeout: 5000 });
  return screen.getByRole("region", { name: "Test run" });
}

describe("the test-run checklist", () => {
  it("is not shown before the repair has reached a test run", async () => {
    stubApi(tech, answers("GET", "/api/work-orders/wo-1", () => json(buildDetail({ state: "in_repair" }))));
    renderApp("/work-orders/wo-1");
    await screen.findByRole("heading", { level: 1, name: "Hollis TR-22 string trimmer" }, { timeout: 5000 });
    expect(screen.queryByRole("region", { name: "Test run" })).toBeNull();
  });

  it("asks the warning to be read, names an unanswered check beside it, and saves a failed run shown plainly", async () => {
    let latest: TestRun | null = null;
    let posted: unknown;
    const section = await open(
      () => buildDetail({ state: "test_run", latestTestRun: latest }),
      (body) => {
        posted = body;
        latest = { id: "tr-1", checks: { ...(body as { checks: TestRun["checks"] }).checks }, passed: false, note: "Head creeps", by: { id: "user-tech", name: "Wes Tannery" }, at: "2026-03-05T14:05:00.000Z" };
        return json(latest, { status: 201 });
      },
    );
    expect(within(section).getByText("WARNING")).toBeInTheDocument();
    expect(within(section).getByText(/carbon monoxide/)).toBeInTheDocument();
    expect(within(section).getByText("CAUTION")).toBeInTheDocument();
    const user = userEvent.setup();
    for (const q of questions.filter((q) => !q.includes("cutting attachment"))) await user.click(within(within(section).getByRole("radiogroup", { name: q })).getByText("Yes"));
    await user.click(within(section).getByRole("button", { name: "Save the test run" }));

    const attachment = within(section).getByRole("radiogroup", { name: "Does the cutting attachment stay still at idle?" });
    expect(attachment).toHaveAccessibleDescription("Answer yes or no.");
    expect(within(section).getByRole("alert")).toHaveTextContent("Read the warning first.");
    expect(posted).toBeUndefined();

    await user.click(within(section).getByRole("button", { name: "Read and understood" }));
    await user.click(within(attachment).getByText("No"));
    expect(within(section).getByText("1 answered No: this test run will be saved as failed.")).toBeInTheDocument();
    await user.type(within(section).getByRole("textbox", { name: /Note/ }), "Head creeps");
    await user.click(within(section).getByRole("button", { name: "Save the test run" }));

    const result = await within(section).findByLabelText("Latest test run");
    expect(posted).toEqual({ checks: { throttleReturns: true, stopSwitchStops: true, steadyIdle: true, attachmentStillAtIdle: false, runsUnderLoad: true }, note: "Head creeps" });
    expect(result).toHaveTextContent("Failed: 1 of 5 checks");
    expect(result).toHaveTextContent("Does the cutting attachment stay still at idle? No — failed.");
    expect(result).toHaveTextContent("Wes Tannery");
  });

  it("folds the form away after a pass and points to the board", async () => {
    const passed: TestRun = { id: "tr-2", checks: { throttleReturns: true, stopSwitchStops: true, steadyIdle: true, attachmentStillAtIdle: true, runsUnderLoad: true }, passed: true, note: "", by: null, at: "2026-03-05T14:05:00.000Z" };
    const section = await open(() => buildDetail({ state: "test_run", latestTestRun: passed }));
    expect(within(section).getByLabelText("Latest test run")).toHaveTextContent("Passed");
    expect(within(section).getByRole("link", { name: "Move it to ready for pick-up on the board" })).toHaveAttribute("href", "/work-orders/board");
    expect(within(section).queryByRole("button", { name: "Save the test run" })).toBeNull();
    await userEvent.setup().click(within(section).getByRole("button", { name: "Record another test run" }));
    expect(within(section).getByRole("button", { name: "Save the test run" })).toBeInTheDocument();
  });
});
