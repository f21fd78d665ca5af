import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { renderApp, stubApi } from "../render-app.tsx";
import { buildDefinition, editorOpened, fakeFlowServer, flowId, seniorTech } from "./fakes.ts";

const title = () => screen.getByRole("textbox", { name: /^Title/ });

/** Opens the editor, lets Rosa save from another tablet, then edits and saves here: the save is stale. */
async function clash() {
  const server = fakeFlowServer();
  stubApi(seniorTech, server.route);
  renderApp(`/flows/${flowId}?step=pull-plug`);
  await editorOpened();
  const theirs = buildDefinition();
  const spark = theirs.steps.spark as Extract<(typeof theirs.steps)[string], { kind: "choice" }>;
  spark.options[0]!.next = "dead-coil";
  server.saveElsewhere(theirs);

  const user = userEvent.setup();
  await user.type(title(), " first");
  await user.click(screen.getByRole("button", { name: "Save" }));
  const panel = await screen.findByRole("region", { name: /Rosa Lindqvist saved this draft while you were editing/ }, { timeout: 5000 });
  return { server, user, panel };
}

describe("a save that another save overtook (409 draft_stale)", () => {
  it("keeps my edit and offers to load theirs, compare, or keep mine", async () => {
    const { panel } = await clash();
    expect(screen.getByText("Not saved: someone else saved this draft")).toBeInTheDocument();
    expect(title()).toHaveValue("Take out the spark plug first");
    expect(within(panel).getByRole("button", { name: "Load theirs (discard mine)" })).toBeInTheDocument();
    expect(within(panel).getByRole("button", { name: "Compare" })).toBeInTheDocument();
    expect(within(panel).getByRole("button", { name: "Keep mine (save over theirs)" })).toBeInTheDocument();
    expect(window.localStorage.getItem(`benchpath.flow-draft.${flowId}`)).toContain("Take out the spark plug first");
  });

  it("compares mine with theirs step by step, with their changed branch", async () => {
    const { user, panel } = await clash();
    await user.click(within(panel).getByRole("button", { name: "Compare" }));
    const changed = within(panel).getByRole("heading", { name: "Steps changed (2)" }).parentElement!;
    expect(within(changed).getByText("Title: “Take out the spark plug” → “Take out the spark plug first”")).toBeInTheDocument();
    // Theirs sends "yes" to the coil; mine still sends it to the plug.
    expect(within(changed).getByText("Answer “yes”, leads to: “dead-coil” → “plug-fouled”")).toBeInTheDocument();
  });

  it("loads theirs, dropping mine", async () => {
    const { user, panel, server } = await clash();
    await user.click(within(panel).getByRole("button", { name: "Load theirs (discard mine)" }));
    await waitFor(() => expect(title()).toHaveValue("Take out the spark plug"));
    expect(screen.queryByRole("region", { name: /saved this draft while you were editing/ })).not.toBeInTheDocument();
    expect(screen.getByText("All changes saved")).toBeInTheDocument();
    expect(server.saves).toHaveLength(1);
  });

  it("keeps mine by saving it on top of their revision", async () => {
    const { user, panel, server } = await clash();
    await user.click(within(panel).getByRole("button", { name: "Keep mine (save over theirs)" }));
    await waitFor(() => expect(screen.getByText("All changes saved")).toBeInTheDocument());
    expect(server.saves.map((s) => s.revision)).toEqual([4, 5]);
    expect(server.detail.draft?.definition).toMatchObject({ steps: { "pull-plug": { title: "Take out the spark plug first" } } });
    expect(title()).toHaveValue("Take out the spark plug first");
  });
});
