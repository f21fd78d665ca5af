import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi, type FakeRoute } from "../render-app.tsx";
import { workOrderStates, type WorkOrderState } from "../../../shared/schemas/work-orders.ts";
import type { BoardResponse, BoardTicket } from "../../../shared/schemas/board.ts";

const lead = meAnswers(signedInAs("shop_lead", { name: "June Halloway", id: "user-lead" }));

function ticket(overrides: Partial<BoardTicket> = {}): BoardTicket {
  return {
    id: "wo-1",
    number: 1042,
    state: "waiting_for_approval",
    customerName: "Dana Whitcombe",
    equipmentKind: "chainsaw",
    make: "Hollis",
    model: "CS-40",
    movedAt: "2026-03-02T09:30:00.000Z",
    movedBy: { id: "user-tech", name: "Wes Tannery" },
    secondsInState: 3 * 24 * 3600 + 60,
    ...overrides,
  };
}

function boardOf(tickets: BoardTicket[]): BoardResponse {
  return {
    at: new Date().toISOString(),
    columns: workOrderStates.map((state: WorkOrderState) => {
      const inState = tickets.filter((t) => t.state === state);
      return { state, total: inState.length, tickets: inState };
    }),
  };
}

/** A tiny board server: GET answers the current tickets, POST moves one (or answers what the test says). */
function boardServer(tickets: BoardTicket[], onMove?: (body: { to: WorkOrderState; expectedFrom: WorkOrderState }) => Response | undefined): FakeRoute {
  return ({ url, method, body }) => {
    if (method === "GET" && url === "/api/work-orders/board") return json(boardOf(tickets));
    const match = /^\/api\/work-orders\/([^/]+)\/moves$/.exec(url);
    if (method === "POST" && match) {
      const request = body as { to: WorkOrderState; expectedFrom: WorkOrderState };
      const refused = onMove?.(request);
      if (refused) return refused;
      const index = tickets.findIndex((t) => t.id === match[1]);
      const moved = { ...tickets[index]!, state: request.to, movedAt: "2026-03-05T14:05:00.000Z", movedBy: { id: "user-lead", name: "June Halloway" }, secondsInState: 0 };
      tickets[index] = moved;
      return json({ id: moved.id, number: moved.number, from: request.expectedFrom, state: request.to, movedAt: moved.movedAt, movedBy: moved.movedBy });
    }
    return undefined;
  };
}

const column = (name: string) => screen.getByRole("region", { name: new RegExp(`^${name}`) });

describe("the work-order board", () => {
  it("shows every state as a column, with each card's customer, unit, time in state and last mover", async () => {
    stubApi(lead, boardServer([ticket(), ticket({ id: "wo-2", number: 1043, state: "in_repair", customerName: "Arlo Penhallow", movedBy: null, secondsInState: 2 * 3600 })]));
    renderApp("/work-orders/board");
    await screen.findByRole("heading", { level: 1, name: "Work-order board" }, { timeout: 5000 });
    await screen.findByRole("article", { name: "WO 1042" });
    expect(screen.getAllByRole("heading", { level: 2 })).toHaveLength(10);
    const card = within(column("Waiting for approval")).getByRole("article", { name: "WO 1042" });
    expect(card).toHaveTextContent("Dana Whitcombe");
    expect(card).toHaveTextContent("Hollis CS-40 chainsaw");
    expect(card).toHaveTextContent("3 days in this state");
    expect(card).toHaveTextContent(/Moved by Wes Tannery, /);
    expect(within(column("In repair")).getByRole("article", { name: "WO 1043" })).toHaveTextContent("2 hours in this state");
    expect(within(column("Declined")).getByText("Nothing here.")).toBeInTheDocument();
  });

  it("offers only the allowed next states and moves the ticket with one tap, saying who moved it", async () => {
    let sent: unknown;
    stubApi(
      lead,
      boardServer([ticket()], (body) => {
        sent = body;
        return undefined;
      }),
    );
    renderApp("/work-orders/board");
    const card = await screen.findByRole("article", { name: "WO 1042" }, { timeout: 5000 });
    const user = userEvent.setup();
    await user.click(within(card).getByRole("button", { name: "Move to…" }));
    const choices = within(card).getByRole("group", { name: "Move WO 1042 to" });
    expect(within(choices).getAllByRole("button").map((b) => b.textContent)).toEqual(["Approved", "Declined", "Ready for pick-up", "Cancel"]);
    await user.click(within(choices).getByRole("button", { name: "Approved" }));

    expect(await screen.findByText("WO 1042 moved to Approved.")).toBeInTheDocument();
    expect(sent).toEqual({ to: "approved", expectedFrom: "waiting_for_approval" });
    await waitFor(() => expect(within(column("Approved")).getByRole("article", { name: "WO 1042" })).toHaveTextContent(/Moved by June Halloway, /));
  });

  it("says plainly why a move was refused and links to the work order", async () => {
    stubApi(
      lead,
      boardServer([ticket({ state: "test_run" })], () =>
        json({ error: { id: "test_run_needed", message: "WO 1042 needs a passed test run, recorded since it came into test run, before it is ready for pick-up. Record the test run on the work order." } }, { status: 409 }),
      ),
    );
    renderApp("/work-orders/board");
    const card = await screen.findByRole("article", { name: "WO 1042" }, { timeout: 5000 });
    const user = userEvent.setup();
    await user.click(within(card).getByRole("button", { name: "Move to…" }));
    await user.click(within(card).getByRole("button", { name: "Ready for pick-up" }));
    const alert = await screen.findByRole("alert");
    expect(alert).toHaveTextContent("WO 1042 was not moved.");
    expect(alert).toHaveTextContent("needs a passed test run");
    expect(within(alert).getByRole("link", { name: "Open WO 1042" })).toHaveAttribute("href", "/work-orders/wo-1");
    expect(within(column("Test run")).getByRole("article", { name: "WO 1042" })).toBeInTheDocument();
  });
});
