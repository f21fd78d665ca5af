import { act, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { benchHomeQueryOptions } from "../../../src/features/bench/api/get-bench-home.ts";
import { json, meAnswers, renderApp, signedInAs, stubApi } from "../render-app.tsx";
import { answers, buildSummary } from "../work-orders/fakes.ts";
import { benchHomeAnswers, buildBenchSession, emptyQueue, todayAt } from "./fakes.ts";

const apprentice = meAnswers(signedInAs("apprentice"));

const carburettor = buildBenchSession();
const chainsaw = buildBenchSession({
  sessionId: "se-2",
  workOrderId: "wo-2",
  workOrderNumber: 1043,
  unit: { equipmentKind: "chainsaw", make: "Marrow & Pike", model: "CS-40" },
  flowTitle: "Chainsaw no-start",
  currentStepTitle: "Pull the plug and look at its tip",
  startedAt: todayAt(16, 10, 1),
});
const waitingBlower = buildBenchSession({
  sessionId: "se-3",
  workOrderId: "wo-3",
  workOrderNumber: 1038,
  unit: { equipmentKind: "leaf_blower", make: "Brackwater", model: "BL-9" },
  currentStepTitle: "Fouled spark plug",
  startedAt: todayAt(9, 30, 6),
});
const returnedMower = buildBenchSession({
  sessionId: "se-4",
  workOrderId: "wo-4",
  workOrderNumber: 1031,
  unit: { equipmentKind: "walk_behind_mower", make: "Fernhill", model: "WM-53" },
  flowTitle: "Walk-behind mower no-start",
  currentStepTitle: "Stale fuel in the bowl",
  reviewComment: "Drain the bowl into a clear jar and photograph it before you call it stale.",
  startedAt: todayAt(11, 0, 3),
});

async function section(name: RegExp) {
  return screen.findByRole("region", { name }, { timeout: 5000 });
}

describe("the bench home's own checks", () => {
  it("puts each session in its section: open, sent back, waiting for review", async () => {
    stubApi(apprentice, emptyQueue, benchHomeAnswers({ open: [carburettor, chainsaw], waitingForReview: [waitingBlower], returned: [returnedMower] }));
    renderApp("/bench");

    const open = await section(/^Your open checks/);
    expect(within(open).getByRole("heading", { level: 2 })).toHaveTextContent("Your open checks (2)");
    const openCards = within(open).getAllByRole("article");
    expect(openCards.map((card) => within(card).getByRole("heading", { level: 3 }).textContent)).toEqual([
      "WO 1042 Hollis TR-22 string trimmer",
      "WO 1043 Marrow & Pike CS-40 chainsaw",
    ]);
    const first = within(open).getByRole("article", { name: /WO 1042/ });
    expect(within(first).getByText("Handheld 2-stroke no-start")).toBeInTheDocument();
    expect(within(first).getByText("Watch the spark tester while you pull")).toBeInTheDocument();

    const review = screen.getByRole("region", { name: /^Waiting for the shop lead's review/ });
    expect(within(review).getByRole("heading", { level: 2 })).toHaveTextContent("(1)");
    expect(within(review).getAllByRole("article")).toHaveLength(1);
    expect(within(review).getByRole("article", { name: /WO 1038 Brackwater BL-9 leaf blower/ })).toBeInTheDocument();
    expect(within(review).getByText("Fouled spark plug")).toBeInTheDocument();
    expect(within(review).getByRole("link", { name: "See the check WO 1038" })).toHaveAttribute("href", "/bench/sessions/se-3");
    expect(within(review).queryByRole("link", { name: /Carry on/ })).not.toBeInTheDocument();

    const returned = screen.getByRole("region", { name: /^Sent back by the shop lead/ });
    expect(within(returned).getAllByRole("article")).toHaveLength(1);
    expect(within(returned).getByRole("article", { name: /WO 1031 Fernhill WM-53 walk-behind mower/ })).toBeInTheDocument();
    expect(within(returned).queryByRole("link", { name: /Carry on/ })).not.toBeInTheDocument();
  });

  it("shows the shop lead's comment on a session sent back, with the way to check it again", async () => {
    stubApi(apprentice, emptyQueue, benchHomeAnswers({ returned: [returnedMower] }));
    renderApp("/bench");

    const card = within(await section(/^Sent back by the shop lead/)).getByRole("article", { name: /WO 1031/ });
    const comment = within(card).getByRole("figure", { name: "The shop lead says" });
    expect(comment).toHaveTextContent("Drain the bowl into a clear jar and photograph it before you call it stale.");
    expect(within(card).getByText("Stale fuel in the bowl")).toBeInTheDocument();
    expect(within(card).getByRole("link", { name: "Open the work order WO 1031" })).toHaveAttribute("href", "/work-orders/wo-4");
    expect(within(card).getByRole("link", { name: "Revise the check WO 1031" })).toHaveAttribute("href", "/bench/sessions/se-4");
  });

  it("says so when the shop lead sent a session back without a comment", async () => {
    stubApi(apprentice, emptyQueue, benchHomeAnswers({ returned: [{ ...returnedMower, reviewComment: null }] }));
    renderApp("/bench");
    const card = within(await section(/^Sent back by the shop lead/)).getByRole("article", { name: /WO 1031/ });
    expect(within(card).getByRole("figure", { name: "The shop lead says" })).toHaveTextContent(/No comment was left\. Ask the shop lead what to change/);
  });

  it("carries on with an open session from its big button", async () => {
    stubApi(apprentice, emptyQueue, benchHomeAnswers({ open: [carburettor, chainsaw] }));
    renderApp("/bench");
    const open = await section(/^Your open checks/);
    expect(within(open).getByRole("link", { name: "Carry on WO 1042" })).toHaveAttribute("href", "/bench/sessions/se-1");
    expect(within(open).getByRole("link", { name: "Carry on WO 1043" })).toHaveAttribute("href", "/bench/sessions/se-2");
  });

  it("says when each session was started, in the tablet's own day", async () => {
    stubApi(apprentice, emptyQueue, benchHomeAnswers({ open: [carburettor, chainsaw], waitingForReview: [waitingBlower] }));
    renderApp("/bench");
    const open = await section(/^Your open checks/);
    expect(within(within(open).getByRole("article", { name: /WO 1042/ })).getByText(/^Started today at (08:05|0?8:05\sAM)$/)).toBeInTheDocument();
    expect(within(within(open).getByRole("article", { name: /WO 1043/ })).getByText(/^Started yesterday at (16:10|0?4:10\sPM)$/)).toBeInTheDocument();
    const older = within(screen.getByRole("article", { name: /WO 1038/ })).getByText(/^Started /);
    expect(older.textContent).not.toMatch(/today|yesterday/);
    expect(older.textContent).toMatch(/ at (09:30|0?9:30\sAM)$/);
  });

  it("says plainly when a section has nothing in it", async () => {
    stubApi(apprentice, emptyQueue, benchHomeAnswers({}));
    renderApp("/bench");
    expect(within(await section(/^Your open checks/)).getByText(/^No check in progress\./)).toBeInTheDocument();
    expect(screen.getByRole("heading", { level: 2, name: "Your open checks (0)" })).toBeInTheDocument();
    expect(within(screen.getByRole("region", { name: /^Sent back by the shop lead/ })).getByText("Nothing has been sent back to you.")).toBeInTheDocument();
    expect(within(screen.getByRole("region", { name: /^Waiting for the shop lead's review/ })).getByText("None of your finished checks is waiting for review.")).toBeInTheDocument();
    expect(screen.queryAllByRole("article")).toHaveLength(0);
  });

  it("shows that the checks are loading until the answer comes", async () => {
    let answer: (response: Response) => void = () => undefined;
    const pending = new Promise<Response>((resolve) => (answer = resolve));
    stubApi(apprentice, emptyQueue, ({ url }) => (url === "/api/bench/home" ? (pending as unknown as Response) : undefined));
    renderApp("/bench");
    expect(await screen.findByText("Loading your checks…", {}, { timeout: 5000 })).toBeInTheDocument();
    expect(screen.queryByRole("region", { name: /^Your open checks/ })).not.toBeInTheDocument();

    answer(json({ open: [carburettor], waitingForReview: [], returned: [] }));
    expect(await section(/^Your open checks \(1\)/)).toBeInTheDocument();
    expect(screen.queryByText("Loading your checks…")).not.toBeInTheDocument();
  });

  it("says the checks did not load when the server fails, and loads them on trying again", async () => {
    let fail = true;
    stubApi(
      apprentice,
      emptyQueue,
      answers("GET", "/api/bench/home", () =>
        fail ? json({ error: { id: "internal", message: "Something went wrong." } }, { status: 500 }) : json({ open: [carburettor], waitingForReview: [], returned: [returnedMower] }),
      ),
    );
    renderApp("/bench");

    const problem = await screen.findByRole("alert", {}, { timeout: 5000 });
    expect(problem).toHaveTextContent("Your checks did not load.");
    expect(screen.queryByRole("region", { name: /^Your open checks/ })).not.toBeInTheDocument();
    expect(screen.queryByText(/Nothing has been sent back/)).not.toBeInTheDocument();

    fail = false;
    await userEvent.setup().click(within(problem).getByRole("button", { name: "Try again" }));
    expect(await section(/^Your open checks \(1\)/)).toBeInTheDocument();
    expect(screen.getByRole("region", { name: /^Sent back by the shop lead \(1\)/ })).toBeInTheDocument();
    expect(screen.queryByRole("alert")).not.toBeInTheDocument();
  });

  it("keeps the last answer on screen, saying it may be out of date, when asking again fails", async () => {
    let fail = false;
    stubApi(
      apprentice,
      emptyQueue,
      answers("GET", "/api/bench/home", () =>
        fail ? json({ error: { id: "internal", message: "Something went wrong." } }, { status: 500 }) : json({ open: [carburettor], waitingForReview: [], returned: [] }),
      ),
    );
    const { queryClient } = renderApp("/bench");
    await section(/^Your open checks \(1\)/);

    fail = true;
    await act(() => queryClient.refetchQueries({ queryKey: benchHomeQueryOptions().queryKey }));
    expect(await screen.findByRole("alert")).toHaveTextContent("Your checks could not be brought up to date.");
    expect(screen.getByRole("link", { name: "Carry on WO 1042" })).toBeInTheDocument();
  });

  it("treats an answer it does not understand as a failure, not as an empty bench", async () => {
    stubApi(apprentice, emptyQueue, answers("GET", "/api/bench/home", () => json({ open: [{ sessionId: "se-1" }] })));
    renderApp("/bench");
    expect(await screen.findByRole("alert", {}, { timeout: 5000 })).toHaveTextContent("Your checks did not load.");
    expect(screen.queryByText(/^No check in progress/)).not.toBeInTheDocument();
  });

  it("keeps check-in and the units waiting for a check beside the sessions", async () => {
    stubApi(
      apprentice,
      benchHomeAnswers({ open: [carburettor] }),
      answers("GET", "/api/work-orders", (_body, url) =>
        json({ workOrders: new URL(url, "http://shop.test").searchParams.get("state") === "waiting_for_diagnosis" ? [buildSummary({ id: "wo-9", number: 1050 })] : [] }),
      ),
    );
    renderApp("/bench");
    expect(await screen.findByRole("heading", { name: "Waiting for diagnosis (1)" }, { timeout: 5000 })).toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Check in a unit" })).toHaveAttribute("href", "/work-orders/new");
    expect(screen.getByRole("link", { name: /WO 1050/ })).toHaveAttribute("href", "/work-orders/wo-9");
    expect(await section(/^Your open checks \(1\)/)).toBeInTheDocument();
  });
});
