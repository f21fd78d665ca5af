import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { renderApp, stubApi } from "../render-app.tsx";
import { editorOpened, fakeFlowServer, flowId, seniorTech } from "./fakes.ts";

async function openEditor(path = `/flows/${flowId}?step=pull-plug`) {
  stubApi(seniorTech, fakeFlowServer().route);
  const view = renderApp(path);
  await editorOpened();
  return view;
}

const title = () => screen.getByRole("textbox", { name: /^Title/ });

describe("undo and redo in the draft", () => {
  it("takes back a typed word with the Undo button and puts it back with Redo", async () => {
    await openEditor();
    const user = userEvent.setup();
    const undo = screen.getByRole("button", { name: "Undo" });
    expect(undo).toBeDisabled();

    await user.type(title(), " carefully");
    expect(title()).toHaveValue("Take out the spark plug carefully");
    await user.click(undo);
    await waitFor(() => expect(title()).toHaveValue("Take out the spark plug"));
    expect(undo).toBeDisabled();

    await user.click(screen.getByRole("button", { name: "Redo" }));
    await waitFor(() => expect(title()).toHaveValue("Take out the spark plug carefully"));
    // The step list follows the draft, not the form alone.
    expect(within(screen.getByRole("navigation", { name: "Steps" })).getByText("Take out the spark plug carefully")).toBeInTheDocument();
  });

  it("undoes with Ctrl+Z and redoes with Shift+Ctrl+Z, keeping the focus in the field", async () => {
    await openEditor();
    const user = userEvent.setup();
    await user.type(title(), " now");
    await user.keyboard("{Control>}z{/Control}");
    await waitFor(() => expect(title()).toHaveValue("Take out the spark plug"));
    expect(title()).toHaveFocus();
    await user.keyboard("{Control>}{Shift>}z{/Shift}{/Control}");
    await waitFor(() => expect(title()).toHaveValue("Take out the spark plug now"));
  });

  it("brings back a deleted step, and undoes a rename everywhere it reached", async () => {
    const { router } = await openEditor(`/flows/${flowId}?step=dead-coil`);
    const user = userEvent.setup();
    const steps = () => screen.getByRole("navigation", { name: "Steps" });

    await user.click(screen.getByRole("button", { name: "Delete step" }));
    await user.click(screen.getByRole("button", { name: "Delete the step" }));
    await waitFor(() => expect(within(steps()).queryByText("The ignition coil is dead")).not.toBeInTheDocument());
    const panel = screen.getByRole("region", { name: "Problems" });
    expect(within(panel).getByRole("button", { name: /options\[1\]\.next goes to "dead-coil", which is not a step/ })).toBeInTheDocument();

    await user.click(screen.getByRole("button", { name: "Undo" }));
    expect(await within(steps()).findByText("The ignition coil is dead")).toBeInTheDocument();
    expect(within(panel).getByRole("status")).toHaveTextContent("No problems");

    await user.click(within(steps()).getByText("Take out the spark plug"));
    await user.click(await screen.findByRole("button", { name: "Rename id" }, { timeout: 5000 }));
    const newId = screen.getByRole("textbox", { name: "New id" });
    await user.clear(newId);
    await user.type(newId, "remove-plug");
    await user.click(screen.getByRole("button", { name: "Rename" }));
    await waitFor(() => expect(router.state.location.search).toBe("?step=remove-plug"));
    expect(within(steps()).getByRole("button", { name: /remove-plug · start/ })).toBeInTheDocument();
    expect(within(panel).getByRole("status")).toHaveTextContent("No problems");

    await user.click(screen.getByRole("button", { name: "Undo" }));
    expect(await within(steps()).findByRole("button", { name: /pull-plug · start/ })).toBeInTheDocument();
  });
});
