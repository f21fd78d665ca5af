import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { renderApp, stubApi } from "../render-app.tsx";
import { buildDetail, editorOpened, fakeFlowServer, flowId, seniorTech } from "./fakes.ts";

describe("what acts on a whole flow", () => {
  it("starts a draft from the latest version when the flow has none", async () => {
    const server = fakeFlowServer(buildDetail({ draft: null }));
    stubApi(seniorTech, server.route);
    renderApp(`/flows/${flowId}`);
    const user = userEvent.setup();
    await user.click(await screen.findByRole("button", { name: "Start a draft from version 2" }, { timeout: 8000 }));
    await editorOpened();
    expect(server.detail.draft?.basedOnVersion).toBe(2);
  });

  it("retires the flow and brings it back", async () => {
    const server = fakeFlowServer();
    stubApi(seniorTech, server.route);
    renderApp(`/flows/${flowId}`);
    await editorOpened();
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Retire the flow" }));
    expect(await screen.findByText(/Retired: no new bench session can start on this flow/)).toBeInTheDocument();
    expect(server.detail.retired).toBe(true);
    await user.click(screen.getByRole("button", { name: "Bring the flow back" }));
    await waitFor(() => expect(screen.queryByText(/Retired: no new bench session/)).not.toBeInTheDocument());
    expect(server.detail.retired).toBe(false);
  });

  it("discards the draft only once asked to confirm, and offers the export of each", async () => {
    const server = fakeFlowServer();
    stubApi(seniorTech, server.route);
    renderApp(`/flows/${flowId}`);
    await editorOpened();
    expect(screen.getByRole("link", { name: "Export the saved draft" })).toHaveAttribute("href", `/api/flows/${flowId}/export?version=draft`);
    expect(screen.getByRole("link", { name: "Export version 2" })).toHaveAttribute("href", `/api/flows/${flowId}/export?version=2`);

    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Discard the draft…" }));
    const confirm = screen.getByRole("alert");
    await user.click(within(confirm).getByRole("button", { name: "Keep it" }));
    expect(server.detail.draft).not.toBeNull();

    await user.click(screen.getByRole("button", { name: "Discard the draft…" }));
    await user.click(within(screen.getByRole("alert")).getByRole("button", { name: "Discard the draft" }));
    expect(await screen.findByRole("button", { name: "Start a draft from version 2" }, { timeout: 5000 })).toBeInTheDocument();
    expect(server.detail.draft).toBeNull();
  });
});
