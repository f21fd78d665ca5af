import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { renderApp, stubApi } from "../render-app.tsx";
import { buildDefinition, buildDetail, editorOpened, fakeFlowServer, flowId, seniorTech } from "./fakes.ts";

/** "pull-plug" leads to a step that is not there; "loop" only ever leads back to itself. */
function brokenDraft() {
  const definition = buildDefinition();
  definition.steps["pull-plug"] = { kind: "instruction", title: "Take out the spark plug", next: "spark-test" };
  definition.steps.spark = { kind: "instruction", title: "Crank it again", next: "spark" };
  return definition;
}

describe("the problems panel", () => {
  it("lists an unknown target and a dead end, and opens the step a problem names", async () => {
    stubApi(seniorTech, fakeFlowServer(buildDetail({}, brokenDraft())).route);
    const { router } = renderApp(`/flows/${flowId}`);
    await editorOpened();
    const panel = screen.getByRole("region", { name: "Problems" });

    const unknown = within(panel).getByRole("button", { name: /Step “pull-plug”: next goes to "spark-test", which is not a step/ });
    expect(within(panel).getByRole("button", { name: /Step “spark”: no finding can be reached from this step/ })).toBeInTheDocument();
    expect(within(panel).getByRole("status")).toHaveTextContent(/errors/);

    await userEvent.setup().click(unknown);
    await waitFor(() => expect(router.state.location.search).toBe("?step=pull-plug"));
    expect(await screen.findByRole("heading", { level: 2, name: "Take out the spark plug" }, { timeout: 5000 })).toBeInTheDocument();
    // The step list marks the step as current and shows it has an error.
    const steps = screen.getByRole("navigation", { name: "Steps" });
    expect(within(steps).getByRole("button", { current: "step" })).toHaveTextContent(/pull-plug.*2 errors/);
  });

  it("clears a problem as soon as the draft no longer has it", async () => {
    stubApi(seniorTech, fakeFlowServer(buildDetail({}, brokenDraft())).route);
    renderApp(`/flows/${flowId}?step=pull-plug`);
    await editorOpened();
    const user = userEvent.setup();
    const next = screen.getByRole("textbox", { name: "When done, go to" });
    expect(next).toHaveValue("spark-test");
    await user.click(screen.getByRole("button", { name: "Pick from the list" }));
    await user.selectOptions(screen.getByRole("combobox", { name: "When done, go to" }), "dead-coil");

    const panel = screen.getByRole("region", { name: "Problems" });
    await waitFor(() => expect(within(panel).queryByRole("button", { name: /spark-test/ })).not.toBeInTheDocument());
  });
});
