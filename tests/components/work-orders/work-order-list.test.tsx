import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi } from "../render-app.tsx";
import { answers, buildSummary } from "./fakes.ts";

const apprentice = meAnswers(signedInAs("apprentice"));
const orders = [
  buildSummary(),
  buildSummary({ id: "wo-2", number: 1043, state: "diagnosing", customerName: "Priya Okafor", equipmentKind: "chainsaw", make: "Marrow & Pike", model: "CS-40" }),
];

function listAnswers(seen: string[]) {
  return answers("GET", "/api/work-orders", (_body, url) => {
    seen.push(url);
    const search = new URL(url, "http://shop.test").searchParams.get("search")?.toLowerCase();
    return json({ workOrders: search ? orders.filter((o) => `${o.customerName} ${o.make} ${o.model} ${o.number}`.toLowerCase().includes(search)) : orders });
  });
}

describe("the work-order list", () => {
  it("shows open work orders with their number and state in words", async () => {
    const seen: string[] = [];
    stubApi(apprentice, listAnswers(seen));
    renderApp("/work-orders");
    const first = await screen.findByRole("link", { name: /WO 1042/ }, { timeout: 5000 });
    expect(within(first).getByText("Waiting for diagnosis")).toBeInTheDocument();
    expect(within(first).getByText("Hollis TR-22 string trimmer")).toBeInTheDocument();
    expect(within(first).getByText("3 days in the shop")).toBeInTheDocument();
    expect(within(screen.getByRole("link", { name: /WO 1043/ })).getByText("Diagnosing")).toBeInTheDocument();
    expect(first).toHaveAttribute("href", "/work-orders/wo-1");
    expect(seen).toEqual(["/api/work-orders?state=open"]);
  });

  it("keeps the search in the address and asks the server with it", async () => {
    const seen: string[] = [];
    stubApi(apprentice, listAnswers(seen));
    const { router } = renderApp("/work-orders");
    await screen.findByRole("link", { name: /WO 1042/ }, { timeout: 5000 });
    await userEvent.setup().type(screen.getByRole("searchbox", { name: "Find a work order" }), "marrow");

    await waitFor(() => expect(router.state.location.search).toBe("?q=marrow"));
    await waitFor(() => expect(screen.queryByRole("link", { name: /WO 1042/ })).not.toBeInTheDocument());
    expect(screen.getByRole("link", { name: /WO 1043/ })).toBeInTheDocument();
    expect(seen.at(-1)).toBe("/api/work-orders?state=open&search=marrow");
  });

  it("reads the search back from the address after a reload", async () => {
    const seen: string[] = [];
    stubApi(apprentice, listAnswers(seen));
    renderApp("/work-orders?q=WO%201043&state=all");
    await screen.findByRole("link", { name: /WO 1043/ }, { timeout: 5000 });
    expect(screen.getByRole("searchbox", { name: "Find a work order" })).toHaveValue("WO 1043");
    expect(screen.getByRole("radio", { name: "All" })).toBeChecked();
    expect(seen).toEqual(["/api/work-orders?state=all&search=1043"]);
  });

  it("says what to do next when nothing matches", async () => {
    stubApi(apprentice, listAnswers([]));
    renderApp("/work-orders?q=zzz");
    expect(await screen.findByText("No work order matches “zzz”.", {}, { timeout: 5000 })).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Search picked-up work orders too" })).toBeInTheDocument();
  });
});

describe("the bench home", () => {
  it("offers check-in and lists the units waiting for a check or being checked", async () => {
    const seen: string[] = [];
    stubApi(
      apprentice,
      answers("GET", "/api/work-orders", (_body, url) => {
        seen.push(url);
        const state = new URL(url, "http://shop.test").searchParams.get("state");
        return json({ workOrders: orders.filter((o) => o.state === state) });
      }),
    );
    renderApp("/bench");
    expect(await screen.findByRole("heading", { name: "Waiting for diagnosis (2)" }, { timeout: 5000 })).toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Check in a unit" })).toHaveAttribute("href", "/work-orders/new");
    expect(screen.getByRole("link", { name: /WO 1043/ })).toBeInTheDocument();
    expect(seen.sort()).toEqual(["/api/work-orders?state=diagnosing", "/api/work-orders?state=waiting_for_diagnosis"]);
  });
});
