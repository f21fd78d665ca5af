import { screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { renderApp, stubApi } from "../render-app.tsx";
import { buildDefinition, editorOpened, fakeFlowServer, flowId, seniorTech } from "./fakes.ts";

const title = () => screen.getByRole("textbox", { name: /^Title/ });
const storageKey = `benchpath.flow-draft.${flowId}`;

describe("the working copy on this computer", () => {
  it("restores edits that never reached the server after the page is opened again, and says so", async () => {
    const server = fakeFlowServer();
    stubApi(seniorTech, server.route);
    const first = renderApp(`/flows/${flowId}?step=pull-plug`);
    await editorOpened();
    await userEvent.setup().type(title(), " and check its gap");
    expect(JSON.parse(window.localStorage.getItem(storageKey) ?? "null")).toMatchObject({ baseRevision: 4 });
    // Closed before the auto-save: the server never saw the edit.
    first.unmount();
    expect(server.saves).toEqual([]);

    renderApp(`/flows/${flowId}?step=pull-plug`);
    await editorOpened();
    expect(screen.getByText("Your unsaved changes were restored from this computer.")).toBeInTheDocument();
    expect(title()).toHaveValue("Take out the spark plug and check its gap");
    expect(screen.getByText("Unsaved changes, kept on this computer")).toBeInTheDocument();

    await userEvent.setup().click(screen.getByRole("button", { name: "Save" }));
    await waitFor(() => expect(screen.getByText("All changes saved")).toBeInTheDocument());
    expect(server.saves).toHaveLength(1);
    expect(server.saves[0]!.revision).toBe(4);
    expect(server.saves[0]!.definition).toMatchObject({ steps: { "pull-plug": { title: "Take out the spark plug and check its gap" } } });
    expect(window.localStorage.getItem(storageKey)).toBeNull();
  });

  it("opens the server's draft when the copy here holds nothing new", async () => {
    window.localStorage.setItem(storageKey, JSON.stringify({ baseRevision: 4, definition: buildDefinition() }));
    stubApi(seniorTech, fakeFlowServer().route);
    renderApp(`/flows/${flowId}`);
    await editorOpened();
    expect(screen.queryByText("Your unsaved changes were restored from this computer.")).not.toBeInTheDocument();
    expect(screen.getByText("All changes saved")).toBeInTheDocument();
    expect(window.localStorage.getItem(storageKey)).toBeNull();
  });

  it("restores a copy made on an older revision as a clash to settle, not as a save over someone's work", async () => {
    const mine = buildDefinition();
    mine.title = "Spark plug check, mine";
    window.localStorage.setItem(storageKey, JSON.stringify({ baseRevision: 3, definition: mine }));
    const server = fakeFlowServer();
    stubApi(seniorTech, server.route);
    renderApp(`/flows/${flowId}`);
    await editorOpened();
    expect(screen.getByText("Your unsaved changes were restored from this computer.")).toBeInTheDocument();
    expect(screen.getByRole("region", { name: /saved this draft while you were editing/ })).toBeInTheDocument();
    expect(screen.getByRole("textbox", { name: /^Title/ })).toHaveValue("Spark plug check, mine");
    expect(server.saves).toEqual([]);
  });
});
