import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, renderApp, stubApi } from "../render-app.tsx";
import { answers } from "../work-orders/fakes.ts";
import { buildDefinition, buildDetail, editorOpened, fakeFlowServer, flowId, seniorTech } from "./fakes.ts";

/** A draft whose first step leads nowhere yet. */
function unfinished() {
  const definition = buildDefinition();
  definition.steps["pull-plug"] = { kind: "instruction", title: "Take out the spark plug", next: "" };
  return definition;
}

describe("publishing the draft", () => {
  it("is refused with the reason while the draft has errors, and offered once they are fixed", async () => {
    const server = fakeFlowServer(buildDetail({}, unfinished()));
    stubApi(seniorTech, server.route);
    renderApp(`/flows/${flowId}?step=pull-plug`);
    await editorOpened();
    const user = userEvent.setup();
    const publish = screen.getByRole("button", { name: "Publish…" });
    expect(publish).toBeDisabled();
    expect(publish).toHaveAccessibleDescription(/Publishing needs a draft without errors: \d+ errors? to fix\./);

    await user.selectOptions(screen.getByRole("combobox", { name: "When done, go to" }), "spark");
    await waitFor(() => expect(publish).toBeEnabled());
    expect(publish).not.toHaveAccessibleDescription();

    await user.click(publish);
    const dialog = screen.getByRole("dialog", { name: "Publish this draft as version 3" });
    await user.click(within(dialog).getByRole("button", { name: "Publish" }));
    const note = within(dialog).getByRole("textbox", { name: /What changed in this version/ });
    expect(await within(dialog).findByText("Say what changed in this version.")).toBeInTheDocument();
    expect(note).toHaveAccessibleDescription(expect.stringContaining("Say what changed in this version."));
    expect(server.publishes).toEqual([]);

    await user.type(note, "Go straight from the plug to the spark test");
    await user.click(within(dialog).getByRole("button", { name: "Publish" }));
    expect(await screen.findByText("Published version 3: new bench sessions start on it.", {}, { timeout: 5000 })).toBeInTheDocument();
    // The unsaved fix was saved first, and that revision is the one published.
    expect(server.saves.map((s) => s.revision)).toEqual([4]);
    expect(server.publishes).toEqual([{ revision: 5, note: "Go straight from the plug to the spark test" }]);
    expect(screen.getByRole("button", { name: "Start a draft from version 3" })).toBeInTheDocument();
    expect(window.localStorage.getItem(`benchpath.flow-draft.${flowId}`)).toBeNull();
  });

  it("shows the problems the server names when it refuses to publish (422)", async () => {
    const server = fakeFlowServer();
    const problems = [{ stepId: "dead-coil", code: "section_missing", message: 'section "coil-test" is not in the section library', severity: "error" }];
    stubApi(
      seniorTech,
      answers("POST", `/api/flows/${flowId}/publish`, () =>
        json({ error: { id: "draft_has_errors", message: "The draft has 1 error to fix before it can be published.", details: { problems } } }, { status: 422 }),
      ),
      server.route,
    );
    renderApp(`/flows/${flowId}`);
    await editorOpened();
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Publish…" }));
    const dialog = screen.getByRole("dialog", { name: "Publish this draft as version 3" });
    await user.type(within(dialog).getByRole("textbox", { name: /What changed/ }), "Coil test");
    await user.click(within(dialog).getByRole("button", { name: "Publish" }));

    const refusal = await within(dialog).findByRole("alert");
    expect(refusal).toHaveTextContent("The draft has 1 error to fix before it can be published.");
    expect(refusal).toHaveTextContent('Step “dead-coil” (error): section "coil-test" is not in the section library');
  });
});
