import { render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { QueryClient } from "@tanstack/react-query";
import { createMemoryRouter, RouterProvider } from "react-router";
import { describe, expect, it, vi } from "vitest";
import { AppProvider } from "../../../src/app/provider.tsx";
import { FlowEditorPage } from "../../../src/features/flows/components/flow-editor-page.tsx";
import type { BandCoverageProps, FlowGraphProps } from "../../../src/features/flows/lib/view-slots.ts";
import { stubApi } from "../render-app.tsx";
import { buildDetail, editorOpened, fakeFlowServer, flowId, withGapReading } from "./fakes.ts";

/** The editor page on its own, with the drawings another part of the app will hand it. */
function renderEditor(path: string, props: Parameters<typeof FlowEditorPage>[0]) {
  stubApi(fakeFlowServer(buildDetail({}, withGapReading())).route);
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const router = createMemoryRouter([{ path: "/flows/:flowId", element: <FlowEditorPage {...props} /> }], { initialEntries: [path] });
  render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return router;
}

describe("the drawings the editor hands out", () => {
  it("shows the view switch only with a graph, and gives the graph the draft, its problems and a way to select", async () => {
    const seen: FlowGraphProps[] = [];
    const renderGraph = (props: FlowGraphProps) => {
      seen.push(props);
      return (
        <button type="button" onClick={() => props.onSelect("gap")}>
          Graph node gap
        </button>
      );
    };
    const router = renderEditor(`/flows/${flowId}`, { renderGraph });
    await editorOpened();
    const user = userEvent.setup();
    expect(screen.queryByRole("button", { name: "Graph node gap" })).not.toBeInTheDocument();

    await user.click(within(screen.getByRole("group", { name: "View" })).getByRole("button", { name: "Graph" }));
    await user.click(screen.getByRole("button", { name: "Graph node gap" }));
    await waitFor(() => expect(router.state.location.search).toBe("?step=gap"));
    const last = seen.at(-1)!;
    expect(Object.keys(last.definition.steps as object)).toContain("gap");
    expect(last.problems).toEqual([]);
    await waitFor(() => expect(seen.at(-1)!.selectedStepId).toBe("gap"));
    // The picked node's form opens below the map, without leaving it.
    expect(await screen.findByRole("heading", { level: 2, name: "Measure the plug gap" }, { timeout: 5000 })).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Graph" })).toHaveAttribute("aria-pressed", "true");
  });

  it("has no view switch without a graph", async () => {
    renderEditor(`/flows/${flowId}`, {});
    await editorOpened();
    expect(screen.queryByRole("group", { name: "View" })).not.toBeInTheDocument();
  });

  it("draws the band coverage above a reading's rows, and opens the row picked on it", async () => {
    const coverage = vi.fn((props: BandCoverageProps) => (
      <button type="button" onClick={() => props.onPick?.(1)}>
        Coverage in {props.unit}
      </button>
    ));
    renderEditor(`/flows/${flowId}?step=gap`, { renderBandCoverage: coverage });
    await editorOpened();
    const user = userEvent.setup();
    expect(coverage.mock.lastCall?.[0].bands.map((b) => b.label)).toEqual(["Too close", "Within range"]);

    await user.click(screen.getByRole("button", { name: "Coverage in mm" }));
    expect(screen.getByRole("textbox", { name: "Band 2 label" })).toHaveFocus();

    // Moving a bound is seen by the drawing and by the validator at once.
    const end = screen.getByRole("spinbutton", { name: "Band 1 ends at" });
    await user.clear(end);
    await user.type(end, "0.4");
    await waitFor(() => expect(coverage.mock.lastCall?.[0].bands[0]?.to).toEqual({ value: 0.4, inclusive: false }));
    expect(await screen.findByRole("button", { name: /Step “gap”: nothing covers \[0\.4, 0\.5\) mm/ })).toBeInTheDocument();
  });
});
