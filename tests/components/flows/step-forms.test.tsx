import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { renderApp, stubApi } from "../render-app.tsx";
import { buildDetail, editorOpened, fakeFlowServer, flowId, seniorTech, withGapReading } from "./fakes.ts";

async function openStep(stepId: string) {
  const server = fakeFlowServer(buildDetail({}, withGapReading()));
  stubApi(seniorTech, server.route);
  renderApp(`/flows/${flowId}?step=${stepId}`);
  await editorOpened();
  return server;
}

describe("a step's form", () => {
  it("says beside the title that an emptied title must be filled in", async () => {
    await openStep("pull-plug");
    const user = userEvent.setup();
    const title = screen.getByRole("textbox", { name: /^Title/ });
    expect(title).toHaveValue("Take out the spark plug");

    await user.clear(title);
    expect(await screen.findByText("Fill this in.")).toBeInTheDocument();
    expect(title).toHaveAccessibleDescription(expect.stringContaining("Fill this in."));
    expect(title).toHaveAttribute("aria-invalid", "true");
    // The same draft goes through the validator: the problems panel names the step too.
    const panel = screen.getByRole("region", { name: "Problems" });
    expect(within(panel).getByRole("button", { name: /Step “pull-plug”: title/ })).toBeInTheDocument();
  });

  it("says beside an answer's value what a value may hold", async () => {
    await openStep("spark");
    const user = userEvent.setup();
    const value = screen.getByRole("textbox", { name: "Answer 1 value" });
    await user.clear(value);
    await user.type(value, "Yes!");

    const message = "an option value uses lowercase letters, digits, hyphens and underscores";
    expect(await screen.findByText(message)).toBeInTheDocument();
    expect(value).toHaveAccessibleDescription(expect.stringContaining(message));
    expect(screen.getByRole("textbox", { name: "Answer 2 value" })).not.toHaveAttribute("aria-invalid");
  });

  it("asks for the step a target leads to when none is chosen", async () => {
    await openStep("pull-plug");
    const user = userEvent.setup();
    const next = screen.getByRole("combobox", { name: "When done, go to" });
    expect(next).toHaveValue("gap");
    await user.selectOptions(next, "");
    expect(await screen.findByText("Choose the step this leads to.")).toBeInTheDocument();
    expect(next).toHaveAccessibleDescription("Choose the step this leads to.");
  });

  it("switches a reading from bands to a compression evaluation, whose verdicts each lead somewhere", async () => {
    await openStep("gap");
    const user = userEvent.setup();
    await user.selectOptions(screen.getByRole("combobox", { name: "Quantity" }), "pressure");
    expect(await screen.findByRole("combobox", { name: /Unit the step asks for/ })).toHaveValue("psi");
    await user.click(screen.getByRole("radio", { name: "Compression evaluation" }));

    const good = await screen.findByRole("combobox", { name: "When good, go to" });
    expect(screen.queryByRole("textbox", { name: "Band 1 label" })).not.toBeInTheDocument();
    expect(good).toHaveAccessibleDescription("Choose the step this leads to.");
    const panel = screen.getByRole("region", { name: "Problems" });
    expect(within(panel).getByRole("button", { name: /Step “gap”: evaluation\.next\.good goes to "", which is not a step/ })).toBeInTheDocument();

    await user.click(screen.getByRole("button", { name: "Undo" }));
    expect(await screen.findByRole("textbox", { name: "Band 1 label" })).toHaveValue("Too close");
  });

  it("says beside a repair's labour that it needs a number", async () => {
    await openStep("dead-coil");
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Add a repair" }));
    // The new, empty repair is in the draft at once: the validator asks for its title.
    const panel = screen.getByRole("region", { name: "Problems" });
    expect(await within(panel).findByRole("button", { name: /Step “dead-coil”: repairs\[1\]\.title/ })).toBeInTheDocument();
    const hours = screen.getByRole("spinbutton", { name: "Repair 2 labour, hours" });
    await user.clear(hours);
    expect(await screen.findByText("Enter a number.")).toBeInTheDocument();
    expect(hours).toHaveAccessibleDescription("Enter a number.");
    await user.type(screen.getByRole("textbox", { name: "Repair 2 parts" }), "Flywheel key{Enter}Shroud screws");
    await user.type(hours, "1.5");
    await waitFor(() => expect(hours).not.toHaveAttribute("aria-invalid"));
  });
});
