import { fireEvent, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi } from "../render-app.tsx";
import { buildRow, optionsAnswers, queueAnswers } from "./fakes.ts";

const lead = meAnswers(signedInAs("shop_lead"));
const sixty = Array.from({ length: 60 }, (_, i) => buildRow({ sessionId: `se-${i + 1}`, workOrderNumber: 1100 + i }));
const paramsOf = (search: string) => Object.fromEntries(new URLSearchParams(search));
const table = () => screen.findByRole("table", { name: "Sessions" }, { timeout: 5000 });

describe("the review queue", () => {
  it("goes to the flagged checks waiting for sign-off in one tap, and marks that view as the one shown", async () => {
    const seen: string[] = [];
    stubApi(lead, optionsAnswers, queueAnswers(seen));
    const { router } = renderApp("/review");
    await screen.findByRole("link", { name: "WO 1042" }, { timeout: 5000 });
    await userEvent.setup().click(screen.getByRole("link", { name: "Flagged, waiting" }));
    await waitFor(() => expect(paramsOf(seen.at(-1)!)).toEqual({ reviewState: "waiting", flagged: "true" }));
    expect(router.state.location.search).toBe("?reviewState=waiting&flagged=true");
    expect(screen.getByRole("link", { name: "Flagged, waiting" })).toHaveAttribute("aria-current", "page");
    expect(screen.getByRole("link", { name: "Waiting for sign-off" })).not.toHaveAttribute("aria-current");
  });

  it("opens on the sessions waiting for sign-off, each row a link to the session", async () => {
    const seen: string[] = [];
    stubApi(lead, optionsAnswers, queueAnswers(seen));
    const { router } = renderApp("/review");
    const link = await screen.findByRole("link", { name: "WO 1042" }, { timeout: 5000 });
    expect(router.state.location.search).toBe("?reviewState=waiting");
    expect(seen).toEqual(["reviewState=waiting"]);
    expect(link).toHaveAttribute("href", "/review/sessions/se-1");
    const row = link.closest("tr")!;
    for (const text of ["Marlow Ashby", "Alder Quinn", "Trimmer no-start v.2", "Compression is healthy", "Waiting for sign-off", "2 flags"]) expect(within(row).getByText(text)).toBeInTheDocument();
    expect(within(row).getByText(/^Fernhill FT-25/)).toHaveTextContent("Fernhill FT-25 string trimmer");
    expect(screen.getByRole("link", { name: "Waiting for sign-off" })).toHaveAttribute("aria-current", "page");
    expect(screen.getAllByRole("columnheader").map((h) => h.textContent?.replace(/, sorted.*/, ""))).toEqual(["Work order", "Customer", "Unit", "Tech", "Flow", "Finding", "Started", "Completed", "Review", "Flags"]);
  });

  it("sends every filter, the sort and the page from the address to the server, and shows them in the controls", async () => {
    const seen: string[] = [];
    stubApi(lead, optionsAnswers, queueAnswers(seen, sixty));
    const address = "search=fern&techId=tech-birch&flowId=trimmer-check&findingStepId=worn&equipmentKind=chainsaw&from=2026-03-01&to=2026-03-31&flagged=true&reviewState=returned&sort=tech&order=asc&page=2&pageSize=10";
    renderApp(`/review?${address}`);
    await table();
    expect(seen.map(paramsOf)).toEqual([paramsOf(address)]);
    expect(screen.getByRole("searchbox", { name: /Find a customer or unit/ })).toHaveValue("fern");
    await waitFor(() => expect(screen.getByRole("combobox", { name: "Tech" })).toHaveDisplayValue("Birch Okafor"));
    expect(screen.getByRole("combobox", { name: "Flow" })).toHaveDisplayValue("Trimmer no-start");
    expect(screen.getByRole("combobox", { name: "Finding" })).toHaveDisplayValue("Worn rings");
    expect(screen.getByRole("combobox", { name: "Equipment" })).toHaveDisplayValue("Chainsaw");
    expect(screen.getByLabelText("Started from")).toHaveValue("2026-03-01");
    expect(screen.getByLabelText("Started up to")).toHaveValue("2026-03-31");
    expect(screen.getByRole("combobox", { name: "Flags" })).toHaveDisplayValue("Flagged only");
    expect(screen.getByRole("combobox", { name: "Review" })).toHaveDisplayValue("Sent back");
    expect(screen.getByRole("combobox", { name: "Rows a page" })).toHaveDisplayValue("10");
    expect(screen.getByRole("columnheader", { name: /Tech/ })).toHaveAttribute("aria-sort", "ascending");
    expect(screen.getByText("11–20 of 60 sessions")).toBeInTheDocument();
  });

  it("writes a changed filter to the address, back on page 1, and asks the server again", async () => {
    const seen: string[] = [];
    stubApi(lead, optionsAnswers, queueAnswers(seen, sixty));
    const { router } = renderApp("/review?reviewState=waiting&page=3");
    await table();
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Filters" }));
    await user.selectOptions(screen.getByRole("combobox", { name: "Flags" }), "Flagged only");
    await waitFor(() => expect(paramsOf(router.state.location.search)).toEqual({ reviewState: "waiting", flagged: "true", page: "1" }));
    await waitFor(() => expect(paramsOf(seen.at(-1)!)).toEqual({ reviewState: "waiting", flagged: "true", page: "1" }));

    // A finding picked from the whole list names its flow as well.
    await user.selectOptions(screen.getByRole("combobox", { name: "Finding" }), "Worn rings");
    await waitFor(() => expect(paramsOf(router.state.location.search)).toMatchObject({ flowId: "trimmer-check", findingStepId: "worn", page: "1" }));
    // Choosing another flow drops a finding of the old one.
    await user.selectOptions(screen.getByRole("combobox", { name: "Flow" }), "Mower no-start");
    await waitFor(() => expect(paramsOf(router.state.location.search)).toEqual({ reviewState: "waiting", flagged: "true", flowId: "mower-check", page: "1" }));

    fireEvent.change(screen.getByLabelText("Started from"), { target: { value: "2026-03-05" } });
    await waitFor(() => expect(paramsOf(router.state.location.search)).toMatchObject({ from: "2026-03-05", page: "1" }));
    await waitFor(() => expect(paramsOf(seen.at(-1)!)).toMatchObject({ from: "2026-03-05" }));

    await user.click(screen.getByRole("button", { name: "Clear filters" }));
    await waitFor(() => expect(paramsOf(router.state.location.search)).toEqual({ page: "1" }));
  });

  it("searches by customer or unit once typing pauses, from page 1", async () => {
    const seen: string[] = [];
    stubApi(lead, optionsAnswers, queueAnswers(seen, sixty));
    const { router } = renderApp("/review?page=2");
    await table();
    await userEvent.setup().type(screen.getByRole("searchbox", { name: /Find a customer or unit/ }), "ashby");
    await waitFor(() => expect(paramsOf(router.state.location.search)).toEqual({ search: "ashby", page: "1" }));
    await waitFor(() => expect(paramsOf(seen.at(-1)!)).toEqual({ search: "ashby", page: "1" }));
    // One request for the whole word, not one a key.
    expect(seen.filter((q) => q.includes("search"))).toHaveLength(1);
  });

  it("sorts from a column header, newest first on a time, and starts again at page 1", async () => {
    const seen: string[] = [];
    stubApi(lead, optionsAnswers, queueAnswers(seen, sixty));
    const { router } = renderApp("/review?page=2");
    await table();
    const user = userEvent.setup();
    expect(screen.getByRole("columnheader", { name: /Started/ })).toHaveAttribute("aria-sort", "descending");
    await user.click(screen.getByRole("button", { name: /^Tech/ }));
    await waitFor(() => expect(paramsOf(router.state.location.search)).toEqual({ sort: "tech", order: "asc", page: "1" }));
    await waitFor(() => expect(screen.getByRole("columnheader", { name: /Tech/ })).toHaveAttribute("aria-sort", "ascending"));
    expect(screen.getByRole("columnheader", { name: /Started/ })).not.toHaveAttribute("aria-sort");
    await user.click(screen.getByRole("button", { name: /^Tech/ }));
    await waitFor(() => expect(paramsOf(router.state.location.search)).toEqual({ sort: "tech", order: "desc", page: "1" }));
    await user.click(screen.getByRole("button", { name: /^Completed/ }));
    await waitFor(() => expect(paramsOf(router.state.location.search)).toEqual({ sort: "completedAt", order: "desc", page: "1" }));
    await waitFor(() => expect(paramsOf(seen.at(-1)!)).toEqual({ sort: "completedAt", order: "desc", page: "1" }));
  });

  it("pages through the server's total with next and previous, and a new page size starts at page 1", async () => {
    const seen: string[] = [];
    stubApi(lead, optionsAnswers, queueAnswers(seen, sixty));
    const { router } = renderApp("/review?page=1");
    await table();
    const user = userEvent.setup();
    expect(screen.getByText("1–25 of 60 sessions")).toBeInTheDocument();
    expect(screen.getByText("Page 1 of 3")).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Previous page" })).toBeDisabled();
    await user.click(screen.getByRole("button", { name: "Next page" }));
    expect(await screen.findByText("26–50 of 60 sessions", {}, { timeout: 5000 })).toBeInTheDocument();
    expect(paramsOf(router.state.location.search)).toEqual({ page: "2" });
    expect(await screen.findByRole("link", { name: "WO 1125" })).toBeInTheDocument();
    await user.click(screen.getByRole("button", { name: "Next page" }));
    expect(await screen.findByText("51–60 of 60 sessions", {}, { timeout: 5000 })).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Next page" })).toBeDisabled();
    await user.click(screen.getByRole("button", { name: "Previous page" }));
    expect(await screen.findByText("26–50 of 60 sessions", {}, { timeout: 5000 })).toBeInTheDocument();
    await user.selectOptions(screen.getByRole("combobox", { name: "Rows a page" }), "50");
    await waitFor(() => expect(paramsOf(router.state.location.search)).toEqual({ page: "1", pageSize: "50" }));
    expect(await screen.findByText("1–50 of 60 sessions", {}, { timeout: 5000 })).toBeInTheDocument();
    expect(seen.map(paramsOf)).toEqual([{ page: "1" }, { page: "2" }, { page: "3" }, { page: "2" }, { page: "1", pageSize: "50" }]);
  });

  it("says plainly when a page is past the end, with the way back", async () => {
    stubApi(lead, optionsAnswers, queueAnswers([], sixty.slice(0, 30)));
    const { router } = renderApp("/review?page=9");
    expect(await screen.findByText("There is no page 9: these filters give 2 pages.", {}, { timeout: 5000 })).toBeInTheDocument();
    await userEvent.setup().click(screen.getByRole("button", { name: "Go to the last page" }));
    await waitFor(() => expect(paramsOf(router.state.location.search)).toEqual({ page: "2" }));
    expect(await screen.findByRole("link", { name: "WO 1125" })).toBeInTheDocument();
  });

  it("tells the shop lead when nothing is waiting, with a way to every session", async () => {
    const seen: string[] = [];
    stubApi(lead, optionsAnswers, queueAnswers(seen, [], (params) => json({ rows: [], total: params.has("reviewState") ? 0 : 1, page: 1, pageSize: 25 })));
    const { router } = renderApp("/review");
    expect(await screen.findByText("Nothing is waiting for sign-off.", {}, { timeout: 5000 })).toBeInTheDocument();
    await userEvent.setup().click(screen.getByRole("link", { name: "See all sessions" }));
    await waitFor(() => expect(router.state.location.search).toBe("?page=1"));
    expect(screen.getByRole("link", { name: "All sessions" })).toHaveAttribute("aria-current", "page");
  });

  it("shows the server's words on a hand-edited address, beside the filter too, and clears it", async () => {
    const refusal = {
      error: {
        id: "invalid_input",
        message: "Some fields need attention.",
        details: { formErrors: ["Unknown filter: colour."], fieldErrors: { reviewState: ['reviewState is one of "not_submitted", "waiting", "approved", "returned".'] } },
      },
    };
    const seen: string[] = [];
    stubApi(lead, optionsAnswers, queueAnswers(seen, [buildRow()], (params) => (params.has("colour") || params.get("reviewState") === "pending" ? json(refusal, { status: 400 }) : json({ rows: [buildRow()], total: 1, page: 1, pageSize: 25 }))));
    const { router } = renderApp("/review?reviewState=pending&colour=red");
    const problem = await screen.findByRole("alert", {}, { timeout: 5000 });
    expect(within(problem).getByText("This view of the queue cannot be shown.")).toBeInTheDocument();
    expect(within(problem).getByText("Unknown filter: colour.")).toBeInTheDocument();
    expect(screen.getByRole("combobox", { name: "Review" })).toHaveAccessibleDescription('reviewState is one of "not_submitted", "waiting", "approved", "returned".');
    await userEvent.setup().click(within(problem).getByRole("link", { name: "Clear filters" }));
    await waitFor(() => expect(router.state.location.search).toBe("?page=1"));
    expect(await screen.findByRole("link", { name: "WO 1042" })).toBeInTheDocument();
  });
});
