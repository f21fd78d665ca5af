import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, renderApp, stubApi } from "../render-app.tsx";
import { answers } from "../work-orders/fakes.ts";
import { buildDefinition, buildDetail, fakeFlowServer, flowId, seniorTech } from "./fakes.ts";

/** Version 1 had no question: the plug step went straight to the coil. */
function versionOne() {
  const definition = buildDefinition();
  definition.steps["pull-plug"] = { kind: "instruction", title: "Take out the spark plug", next: "dead-coil" };
  delete definition.steps.spark;
  return definition;
}

/** The draft adds a caution to the plug step. */
function draft() {
  const definition = buildDefinition();
  definition.steps["pull-plug"] = { kind: "instruction", title: "Take out the spark plug", next: "spark", cautions: [{ signal: "CAUTION", text: "The cylinder head may be hot." }] };
  return definition;
}

function versions() {
  const v1 = versionOne();
  const v2 = buildDefinition();
  return [
    answers("GET", `/api/flows/${flowId}/versions/1`, () => json({ ...buildDetail().versions[1], flowId, definition: v1 })),
    answers("GET", `/api/flows/${flowId}/versions/2`, () => json({ ...buildDetail().versions[0], flowId, definition: v2 })),
  ];
}

describe("a flow's history", () => {
  it("lists the versions with author, note and sessions, and compares the draft with the latest version", async () => {
    stubApi(seniorTech, fakeFlowServer(buildDetail({}, draft())).route, ...versions());
    renderApp(`/flows/${flowId}/history`);
    const table = await screen.findByRole("table", { name: "Versions of this flow" }, { timeout: 8000 });
    const rows = within(table).getAllByRole("row");
    expect(rows[1]).toHaveTextContent(/Draft.*Tomás Reyes/);
    expect(rows[2]).toHaveTextContent(/2.*Tomás Reyes.*Ask about the spark before the coil.*12/);
    expect(rows[3]).toHaveTextContent(/1.*Rosa Lindqvist.*First version.*30/);

    expect(screen.getByRole("heading", { name: "From version 2 to the draft" })).toBeInTheDocument();
    expect(await screen.findByText("Safety panels: added CAUTION: “The cylinder head may be hot.”")).toBeInTheDocument();
  });

  it("compares any two versions: steps added and a changed branch", async () => {
    stubApi(seniorTech, fakeFlowServer(buildDetail({}, draft())).route, ...versions());
    const { router } = renderApp(`/flows/${flowId}/history`);
    const user = userEvent.setup();
    await user.selectOptions(await screen.findByRole("combobox", { name: "From" }, { timeout: 8000 }), "1");
    await user.selectOptions(screen.getByRole("combobox", { name: "To" }), "2");
    await waitFor(() => expect(router.state.location.search).toBe("?from=1&to=2"));

    expect(await screen.findByRole("heading", { name: "From version 1 to version 2" }, { timeout: 5000 })).toBeInTheDocument();
    const added = (await screen.findByRole("heading", { name: "Steps added (1)" })).parentElement!;
    expect(within(added).getByText("Is there a blue spark at the gap? (spark)")).toBeInTheDocument();
    const changed = screen.getByRole("heading", { name: "Steps changed (1)" }).parentElement!;
    expect(within(changed).getByText("1 branch change")).toBeInTheDocument();
    expect(within(changed).getByText("Goes to: “dead-coil” → “spark”")).toBeInTheDocument();
  });
});
