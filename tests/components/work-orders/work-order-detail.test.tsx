import { screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi } from "../render-app.tsx";
import { answers, buildDetail, detailAnswers } from "./fakes.ts";

const apprentice = meAnswers(signedInAs("apprentice"));

async function openDetail(path = "/work-orders/wo-1") {
  const view = renderApp(path);
  // The first lazy route import in a run can take over a second to transform.
  await screen.findByRole("heading", { level: 1, name: "Hollis TR-22 string trimmer" }, { timeout: 5000 });
  return view;
}

describe("a work order's screen", () => {
  it("shows the unit's facts and the checks that fit it", async () => {
    stubApi(apprentice, detailAnswers(buildDetail()));
    await openDetail();
    expect(screen.getByText("WO 1042")).toBeInTheDocument();
    expect(screen.getByText("Waiting for diagnosis")).toBeInTheDocument();
    expect(screen.getByText("Stale fuel")).toBeInTheDocument();
    expect(screen.getByText("25.4 cc")).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Handheld 2-stroke no-start" })).toHaveAccessibleDescription(
      "Spark, compression, then fuel delivery on a premix engine.",
    );
  });

  it("starts the chosen check and opens its session on the bench", async () => {
    let posted: unknown;
    stubApi(
      apprentice,
      detailAnswers(buildDetail()),
      answers("POST", "/api/work-orders/wo-1/sessions", (body) => {
        posted = body;
        return json({ id: "se-9" }, { status: 201 });
      }),
    );
    const { router } = await openDetail();
    await userEvent.setup().click(screen.getByRole("button", { name: /Handheld 2-stroke no-start/ }));

    // The bench screens are a lazy chunk of their own, loaded for the first time here.
    await waitFor(() => expect(router.state.location.pathname).toBe("/bench/sessions/se-9"), { timeout: 5000 });
    expect(posted).toEqual({ flowId: "handheld-2-stroke" });
  });

  it("opens the check already open on this unit instead of starting a second one", async () => {
    stubApi(
      apprentice,
      detailAnswers(buildDetail()),
      answers("POST", "/api/work-orders/wo-1/sessions", () =>
        json({ error: { id: "session_already_open", message: "A check is open.", details: { sessionId: "se-4" } } }, { status: 409 }),
      ),
    );
    const { router } = await openDetail();
    await userEvent.setup().click(screen.getByRole("button", { name: /Handheld 2-stroke no-start/ }));
    await waitFor(() => expect(router.state.location.pathname).toBe("/bench/sessions/se-4"));
  });

  it("says why no check fits when none is published for the kind and cycle", async () => {
    stubApi(apprentice, detailAnswers(buildDetail({ applicableFlows: [] })));
    await openDetail();
    expect(screen.getByText("No guided check fits a 2-stroke string trimmer yet.")).toBeInTheDocument();
    expect(screen.queryByRole("button", { name: /no-start/ })).not.toBeInTheDocument();
  });

  it("lists the checks already run, with who ran them and what they found", async () => {
    const sessions = [
      { id: "se-1", flowTitle: "Handheld 2-stroke no-start", flowVersion: 2, techId: "u-2", techName: "Ines Barrow", status: "completed" as const, findingTitle: "Varnished carburettor", startedAt: "2026-03-02T09:00:00.000Z" },
    ];
    stubApi(apprentice, detailAnswers(buildDetail({ sessions })));
    await openDetail();
    expect(screen.getByText("Finished")).toBeInTheDocument();
    expect(screen.getByText(/Ines Barrow, started/)).toBeInTheDocument();
    expect(screen.getByText("Finding: Varnished carburettor")).toBeInTheDocument();
  });

  it("offers only going on with the check already open on this unit", async () => {
    const sessions = [
      { id: "se-5", flowTitle: "Handheld 2-stroke no-start", flowVersion: 3, techId: "u-1", techName: "Rosa Lindqvist", status: "open" as const, findingTitle: null, startedAt: "2026-03-02T09:00:00.000Z" },
    ];
    stubApi(apprentice, detailAnswers(buildDetail({ state: "diagnosing", sessions })));
    await openDetail();
    expect(screen.getByRole("link", { name: "Go on with the check" })).toHaveAttribute("href", "/bench/sessions/se-5");
    expect(screen.queryByRole("button", { name: "Handheld 2-stroke no-start" })).not.toBeInTheDocument();
    expect(screen.getByText("Diagnosing")).toBeInTheDocument();
  });

  it("shows the plain not-found page for a work order that does not exist", async () => {
    stubApi(apprentice, answers("GET", "/api/work-orders/nope", () => json({ error: { id: "not_found", message: "No such work order." } }, { status: 404 })));
    renderApp("/work-orders/nope");
    expect(await screen.findByRole("heading", { level: 1, name: "No page here" }, { timeout: 5000 })).toBeInTheDocument();
  });
});
