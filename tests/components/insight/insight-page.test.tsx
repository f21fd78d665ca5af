import { fireEvent, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi, type FakeRoute } from "../render-app.tsx";
import { buildInsight } from "./fakes.ts";
import type { InsightResponse } from "../../../shared/schemas/insight.ts";

const lead = meAnswers(signedInAs("shop_lead"));

function insightAnswers(seen: string[], answer: (url: string) => Response = (url) => json(buildInsight(rangeOf(url)))): FakeRoute {
  return ({ url, method }) => {
    if (method !== "GET" || url.split("?")[0] !== "/api/insight") return undefined;
    seen.push(url);
    return answer(url);
  };
}
const rangeOf = (url: string): Partial<InsightResponse> => {
  const params = new URL(url, "http://shop.test").searchParams;
  return { from: params.get("from")!, to: params.get("to")! };
};

/** A table's body rows as cell texts, found by its caption; each row is named by its first cell. */
function tableRows(caption: string) {
  const table = screen.getByRole("table", { name: caption });
  expect(within(table).getAllByRole("columnheader").length).toBeGreaterThan(1);
  return within(table)
    .getAllByRole("row")
    .slice(1)
    .map((row) => {
      expect(within(row).getByRole("rowheader")).toBe(row.firstElementChild);
      return [...row.children].map((cell) => cell.textContent);
    });
}

beforeEach(() => {
  // Only the clock is fixed: 20 May 2026, mid-afternoon UTC.
  vi.useFakeTimers({ toFake: ["Date"], now: new Date("2026-05-20T15:30:00Z") });
});
afterEach(() => {
  vi.useRealTimers();
});

describe("shop insight", () => {
  it("asks for the range in the address and shows the answer's figures in its tables", async () => {
    const seen: string[] = [];
    stubApi(lead, insightAnswers(seen));
    renderApp("/insight?from=2026-03-01&to=2026-03-31");
    expect(await screen.findByRole("table", { name: "Completed sessions per flow and finding" }, { timeout: 5000 })).toBeInTheDocument();
    expect(seen).toEqual(["/api/insight?from=2026-03-01&to=2026-03-31"]);
    expect(screen.getByText("Figures for sessions started 1 Mar 2026 to 31 Mar 2026")).toBeInTheDocument();

    expect(tableRows("Completed sessions per flow and finding")).toEqual([
      ["Trimmer will not start", "Stale fuel in the tank", "21"],
      ["Trimmer will not start", 'Carb "float" stuck, needle worn', "14"],
      ["Mower will not start", "Fouled spark plug", "13"],
    ]);
    expect(tableRows("Completed sessions per kind of equipment and finding")).toEqual([
      ["String trimmer", "Stale fuel in the tank", "17"],
      ["Walk-behind mower", "Fouled spark plug", "13"],
      ["Chainsaw", 'Carb "float" stuck, needle worn', "14"],
    ]);
    expect(tableRows("Median time from start to finding per flow")).toEqual([
      ["Mower will not start", "13", "18 min"],
      ["Trimmer will not start", "35", "1 h 05 min"],
    ]);
    expect(tableRows("Sessions started and completed per tech")).toEqual([
      ["Ines Calloway", "30", "26", "4"],
      ["Oren Blakely", "20", "16", "4"],
      ["Pia Nakamura", "7", "6", "1"],
    ]);
    // 3 of 22 is 13.6 %, 6 of 14 is 42.9 %: whole percentages.
    expect(tableRows("Reviews, sent-back rate and flags per tech")).toEqual([
      ["Ines Calloway", "22", "3", "14%", "7", "5"],
      ["Oren Blakely", "14", "6", "43%", "9", "6"],
      ["Pia Nakamura", "0", "0", "none reviewed", "0", "0"],
    ]);

    const headline = screen.getByText("Median time to a finding", { selector: "dt" }).parentElement!;
    expect(within(headline).getByText("1 h 05 min")).toBeInTheDocument();
    const sentBack = screen.getByText("Sent back after review", { selector: "dt" }).parentElement!;
    expect(within(sentBack).getByText("23%")).toBeInTheDocument();
    expect(within(sentBack).getByText("9 of 40 reviewed")).toBeInTheDocument();
    expect(within(screen.getByText("Sessions started", { selector: "dt" }).parentElement!).getByText("57")).toBeInTheDocument();
    expect(within(screen.getByText("Flagged sessions", { selector: "dt" }).parentElement!).getByText("11")).toBeInTheDocument();
  });

  it("opens on the last 90 days up to today, and a quick range goes into the address", async () => {
    const seen: string[] = [];
    stubApi(lead, insightAnswers(seen));
    const { router } = renderApp("/insight");
    await screen.findByRole("table", { name: "Completed sessions per flow and finding" }, { timeout: 5000 });
    // From memory: 89 days before 20 May 2026 is 20 February 2026 (19 + 30 + 31 + 9 days back).
    expect(seen).toEqual(["/api/insight?from=2026-02-20&to=2026-05-20"]);
    expect(screen.getByRole("button", { name: "Last 90 days" })).toHaveAttribute("aria-pressed", "true");
    expect(screen.getByLabelText("First day")).toHaveValue("2026-02-20");

    await userEvent.setup().click(screen.getByRole("button", { name: "Last 30 days" }));
    await waitFor(() => expect(router.state.location.search).toBe("?from=2026-04-21&to=2026-05-20"));
    await waitFor(() => expect(seen.at(-1)).toBe("/api/insight?from=2026-04-21&to=2026-05-20"));
    expect(screen.getByRole("button", { name: "Last 30 days" })).toHaveAttribute("aria-pressed", "true");

    await userEvent.setup().click(screen.getByRole("button", { name: "This year" }));
    await waitFor(() => expect(seen.at(-1)).toBe("/api/insight?from=2026-01-01&to=2026-05-20"));
  });

  it("takes a typed day into the address and asks again", async () => {
    const seen: string[] = [];
    stubApi(lead, insightAnswers(seen));
    const { router } = renderApp("/insight?from=2026-03-01&to=2026-03-31");
    await screen.findByRole("table", { name: "Completed sessions per flow and finding" }, { timeout: 5000 });
    fireEvent.change(screen.getByLabelText("Last day"), { target: { value: "2026-04-15" } });
    await waitFor(() => expect(router.state.location.search).toBe("?from=2026-03-01&to=2026-04-15"));
    await waitFor(() => expect(seen.at(-1)).toBe("/api/insight?from=2026-03-01&to=2026-04-15"));
  });

  it("shows what is wrong with a range beside the field and asks nothing", async () => {
    const seen: string[] = [];
    stubApi(lead, insightAnswers(seen));
    renderApp("/insight?from=2026-03-31&to=2026-03-01");
    const last = await screen.findByLabelText("Last day", {}, { timeout: 5000 });
    expect(last).toHaveAttribute("aria-invalid", "true");
    expect(last).toHaveAccessibleDescription(expect.stringContaining("The last day must be on or after the first day."));
    expect(screen.getByLabelText("First day")).not.toHaveAttribute("aria-invalid");
    expect(screen.getByText("Fix the dates above to see the figures.")).toBeInTheDocument();
    expect(seen).toEqual([]);
  });

  it("says a day that is not a date is not one", async () => {
    const seen: string[] = [];
    stubApi(lead, insightAnswers(seen));
    renderApp("/insight?from=2026-02-30&to=2026-03-31");
    const first = await screen.findByLabelText("First day", {}, { timeout: 5000 });
    expect(first).toHaveAccessibleDescription(expect.stringContaining("Enter the first day as a full date."));
    expect(seen).toEqual([]);
  });

  it("says so when no session was started in the range", async () => {
    const empty = buildInsight({
      totals: { sessions: 0, completed: 0, abandoned: 0, open: 0, reviewed: 0, returned: 0, returnRate: null, medianMinutesToFinding: null, flaggedSessions: 0 },
      findingsByFlow: [], findingsByEquipment: [], timeToFinding: [], techs: [],
    });
    stubApi(lead, insightAnswers([], () => json(empty)));
    renderApp("/insight?from=2026-03-01&to=2026-03-31");
    expect(await screen.findByText("No sessions in this range", {}, { timeout: 5000 })).toBeInTheDocument();
    expect(screen.queryByRole("table")).not.toBeInTheDocument();
  });

  it("says what to do when the figures do not load", async () => {
    stubApi(lead, insightAnswers([], () => json({ error: { id: "internal", message: "Something went wrong." } }, { status: 500 })));
    renderApp("/insight?from=2026-03-01&to=2026-03-31");
    expect(await screen.findByRole("alert", {}, { timeout: 5000 })).toHaveTextContent("The figures did not load.");
  });

  it("downloads a table as CSV named by its range, quoting what needs quoting", async () => {
    stubApi(lead, insightAnswers([]));
    const blobs: Blob[] = [];
    const names: string[] = [];
    vi.stubGlobal("URL", Object.assign(URL, { createObjectURL: (blob: Blob) => (blobs.push(blob), "blob:insight"), revokeObjectURL: () => {} }));
    const click = vi.spyOn(HTMLAnchorElement.prototype, "click").mockImplementation(function (this: HTMLAnchorElement) {
      names.push(this.download);
    });
    renderApp("/insight?from=2026-03-01&to=2026-03-31");
    const section = (await screen.findByRole("heading", { name: "Findings per flow" }, { timeout: 5000 })).closest("section")!;
    await userEvent.setup().click(within(section).getByRole("button", { name: "Download CSV" }));

    expect(click).toHaveBeenCalledTimes(1);
    expect(names).toEqual(["benchpath-findings-per-flow-2026-03-01-to-2026-03-31.csv"]);
    expect(blobs[0]!.type).toBe("text/csv;charset=utf-8");
    const text = (await blobs[0]!.text()).replace(/^\uFEFF/, "");
    // Source: RFC 4180, section 2 (rules 5-7): fields with commas or double quotes are enclosed in double quotes, inner quotes doubled; records end in CRLF.
    expect(text).toBe(
      "Flow,Finding,Sessions\r\n" +
        "Trimmer will not start,Stale fuel in the tank,21\r\n" +
        'Trimmer will not start,"Carb ""float"" stuck, needle worn",14\r\n' +
        "Mower will not start,Fouled spark plug,13\r\n",
    );
  });

  it("writes minutes and percentages as plain numbers in the CSV", async () => {
    stubApi(lead, insightAnswers([]));
    const blobs: Blob[] = [];
    vi.stubGlobal("URL", Object.assign(URL, { createObjectURL: (blob: Blob) => (blobs.push(blob), "blob:insight"), revokeObjectURL: () => {} }));
    vi.spyOn(HTMLAnchorElement.prototype, "click").mockImplementation(() => {});
    renderApp("/insight?from=2026-03-01&to=2026-03-31");
    const time = (await screen.findByRole("heading", { name: "Time to a finding" }, { timeout: 5000 })).closest("section")!;
    await userEvent.setup().click(within(time).getByRole("button", { name: "Download CSV" }));
    const reviews = screen.getByRole("heading", { name: "Sent back and flagged, per tech" }).closest("section")!;
    await userEvent.setup().click(within(reviews).getByRole("button", { name: "Download CSV" }));
    const [timeCsv, reviewCsv] = await Promise.all(blobs.map(async (b) => (await b.text()).replace(/^\uFEFF/, "")));
    expect(timeCsv).toBe("Flow,Completed sessions,Median minutes to a finding\r\nMower will not start,13,18.2\r\nTrimmer will not start,35,65\r\n");
    expect(reviewCsv).toBe(
      "Tech,Reviewed,Sent back,Sent-back rate (%),Flags,Flagged sessions\r\nInes Calloway,22,3,14,7,5\r\nOren Blakely,14,6,43,9,6\r\nPia Nakamura,0,0,,0,0\r\n",
    );
  });

  it("draws the charts once the page has a width", async () => {
    // jsdom lays nothing out: this observer reports a tablet-width column.
    class ResizeObserverStub {
      constructor(private callback: ResizeObserverCallback) {}
      observe(target: Element) {
        this.callback([{ target, contentRect: { width: 704, height: 400 } } as unknown as ResizeObserverEntry], this as unknown as ResizeObserver);
      }
      unobserve() {}
      disconnect() {}
    }
    vi.stubGlobal("ResizeObserver", ResizeObserverStub);
    stubApi(lead, insightAnswers([]));
    renderApp("/insight?from=2026-03-01&to=2026-03-31");
    const chart = await screen.findByRole("img", { name: /findings per flow/ }, { timeout: 5000 });
    await waitFor(() => expect(chart.querySelectorAll(".recharts-bar-rectangle")).toHaveLength(3));
    expect(within(chart).getByText("21")).toBeInTheDocument();
    expect(within(screen.getByRole("img", { name: /median time/ })).getByText("1 h 05 min")).toBeInTheDocument();
  });
});
