import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi } from "../render-app.tsx";
import { answers } from "../work-orders/fakes.ts";
import { buildListItem, rosa, seniorTech } from "./fakes.ts";

const flows = [
  buildListItem(),
  buildListItem({
    id: "tiller-no-start",
    title: "Tiller: will not start",
    appliesTo: { equipment: ["tiller"], cycle: "any" },
    retired: true,
    published: { number: 5, createdAt: "2025-01-05T10:00:00.000Z", createdBy: rosa },
    draft: { revision: 2, updatedAt: "2025-03-01T10:00:00.000Z", updatedBy: rosa, errorCount: 3 },
    lastEditedBy: rosa,
    sessionCount: 7,
  }),
];
const list = answers("GET", "/api/flows", () => json({ flows }));

describe("the flows list", () => {
  it("shows what each flow applies to, its version, its draft, who edited it, its sessions and whether it is retired", async () => {
    stubApi(seniorTech, list);
    renderApp("/flows");
    const plug = await screen.findByRole("link", { name: /Spark plug check/ }, { timeout: 8000 });
    expect(plug).toHaveAttribute("href", "/flows/plug-check");
    expect(within(plug).getByText("Chainsaws and leaf blowers with a 2-stroke engine")).toBeInTheDocument();
    expect(within(plug).getByText("Version 2")).toBeInTheDocument();
    expect(within(plug).getByText("Yes, no errors")).toBeInTheDocument();
    expect(within(plug).getByText("Tomás Reyes")).toBeInTheDocument();
    expect(within(plug).getByText("42")).toBeInTheDocument();
    expect(within(plug).queryByText("Retired")).not.toBeInTheDocument();

    const tiller = screen.getByRole("link", { name: /Tiller: will not start/ });
    expect(within(tiller).getByText("Tillers with either engine cycle")).toBeInTheDocument();
    expect(within(tiller).getByText("Yes, 3 errors")).toBeInTheDocument();
    expect(within(tiller).getByText("Rosa Lindqvist")).toBeInTheDocument();
    expect(within(tiller).getByText("Retired")).toBeInTheDocument();
  });

  it("makes a new flow from an id and a title, with each problem beside its field", async () => {
    const made: unknown[] = [];
    stubApi(
      seniorTech,
      list,
      answers("POST", "/api/flows", (body) => {
        made.push(body);
        if ((body as { id: string }).id === "plug-check") return json({ error: { id: "flow_exists", message: 'There is already a flow with the id "plug-check"; choose another id.' } }, { status: 409 });
        return json({}, { status: 201 });
      }),
      answers("GET", "/api/flows/mower-no-start", () => json({ id: "mower-no-start", title: "Mower: will not start", retired: false, versions: [], draft: null })),
    );
    const { router } = renderApp("/flows");
    const user = userEvent.setup();
    await user.click(await screen.findByRole("button", { name: "New flow" }, { timeout: 8000 }));
    const id = screen.getByRole("textbox", { name: /^Id/ });
    const title = screen.getByRole("textbox", { name: /^Title/ });

    await user.type(id, "Mower No Start");
    await user.click(screen.getByRole("button", { name: "Make the flow" }));
    expect(await screen.findByText("an id uses lowercase letters, digits and single hyphens")).toBeInTheDocument();
    expect(id).toHaveAccessibleDescription(expect.stringContaining("an id uses lowercase letters, digits and single hyphens"));
    expect(title).toHaveAccessibleDescription(expect.stringContaining("Give the flow a title."));
    expect(made).toEqual([]);

    await user.clear(id);
    await user.type(id, "plug-check");
    await user.type(title, "Mower: will not start");
    await user.click(screen.getByRole("button", { name: "Make the flow" }));
    await waitFor(() => expect(id).toHaveAccessibleDescription(expect.stringContaining('There is already a flow with the id "plug-check"')));

    await user.clear(id);
    await user.type(id, "mower-no-start");
    await user.click(screen.getByRole("button", { name: "Make the flow" }));
    await waitFor(() => expect(router.state.location.pathname).toBe("/flows/mower-no-start"));
    expect(made.at(-1)).toEqual({ id: "mower-no-start", title: "Mower: will not start" });
  });
});

describe("who may open the flows", () => {
  it("tells an apprentice the area is for senior techs and shop leads, without asking for any flow", async () => {
    const fetchMock = stubApi(meAnswers(signedInAs("apprentice")), list);
    renderApp("/flows/plug-check");
    expect(await screen.findByRole("heading", { level: 1, name: "Not for your role" }, { timeout: 8000 })).toBeInTheDocument();
    expect(screen.getByText(/The Flows area is open to senior techs and shop leads\./)).toBeInTheDocument();
    expect(fetchMock.mock.calls.map(([url]) => String(url))).toEqual(["/api/auth/me"]);
  });
});

describe("importing a flow file", () => {
  const file = (text: string, name = "flow.json") => new File([text], name, { type: "application/json" });

  it("refuses a file that is not JSON before sending anything", async () => {
    const fetchMock = stubApi(seniorTech, list);
    renderApp("/flows");
    const input = await screen.findByLabelText("Import a flow file", {}, { timeout: 8000 });
    await userEvent.setup().upload(input, file("{ \"id\": \"plug-check\", ", "broken.json"));

    const alert = await screen.findByRole("alert");
    expect(alert).toHaveTextContent("“broken.json” is not valid JSON.");
    expect(alert).toHaveTextContent("It was not sent to the server.");
    expect(fetchMock.mock.calls.some(([url]) => String(url).includes("/import"))).toBe(false);
  });

  it("sends the file's JSON and lists the problems the server found in it", async () => {
    const sent: unknown[] = [];
    stubApi(
      seniorTech,
      list,
      answers("POST", "/api/flows/import", (body) => {
        sent.push(body);
        return json(
          { flowId: "plug-check", created: false, revision: 5, problems: [{ stepId: "spark", code: "target_unknown", message: 'options[1].next goes to "coil", which is not a step', severity: "error" }] },
          { status: 201 },
        );
      }),
    );
    renderApp("/flows");
    const input = await screen.findByLabelText("Import a flow file", {}, { timeout: 8000 });
    await userEvent.setup().upload(input, file(JSON.stringify({ formatVersion: 1, id: "plug-check", title: "Spark plug check" })));

    const status = await screen.findByText(/Imported as the draft of “plug-check”, with 1 error to fix/);
    expect(sent).toEqual([{ formatVersion: 1, id: "plug-check", title: "Spark plug check" }]);
    const result = status.closest("[role=status]") as HTMLElement;
    expect(result).toHaveTextContent('Step “spark” (error): options[1].next goes to "coil", which is not a step');
    expect(within(result).getByRole("link", { name: "Open the draft" })).toHaveAttribute("href", "/flows/plug-check");
  });

  it("shows the server's reason when it refuses the file", async () => {
    stubApi(
      seniorTech,
      list,
      answers("POST", "/api/flows/import", () => json({ error: { id: "draft_exists", message: "This flow already has a draft; open it, or discard it first." } }, { status: 409 })),
    );
    renderApp("/flows");
    const input = await screen.findByLabelText("Import a flow file", {}, { timeout: 8000 });
    await userEvent.setup().upload(input, file(JSON.stringify({ id: "plug-check" })));
    const alert = await screen.findByRole("alert");
    expect(alert).toHaveTextContent("The server did not import the file.");
    expect(alert).toHaveTextContent("This flow already has a draft; open it, or discard it first.");
  });
});
