import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import type { AdviceResponse } from "../../../shared/schemas/flows.ts";
import { json, renderApp, stubApi } from "../render-app.tsx";
import { buildDetail, editorOpened, fakeFlowServer, flowId, seniorTech } from "./fakes.ts";

const tooLittle: AdviceResponse = { sessionCount: 7, minimumSessions: 20, enough: false, findings: [], checks: [], suggestion: null };

describe("trying a draft", () => {
  it("runs the draft in the bench's screens from the flow's editor, and sends nothing but reads", async () => {
    const server = fakeFlowServer(buildDetail());
    const fetchMock = stubApi(seniorTech, server.route);
    renderApp(`/flows/${flowId}`);
    await editorOpened();
    const user = userEvent.setup();
    await user.click(screen.getByRole("link", { name: "Try the draft" }));
    expect(await screen.findByText("Trial run: nothing you enter here is saved, and no work order is touched.", {}, { timeout: 5000 })).toBeInTheDocument();

    // An altitude out of range is refused beside its field.
    const altitude = screen.getByLabelText("Shop altitude (m)");
    await user.clear(altitude);
    await user.type(altitude, "20000");
    await user.click(screen.getByRole("button", { name: "Start the trial run" }));
    expect(screen.getByText("Enter the altitude in metres, from -500 to 11000.")).toBeInTheDocument();
    await user.clear(altitude);
    await user.type(altitude, "300");
    await user.click(screen.getByRole("button", { name: "Start the trial run" }));

    expect(await screen.findByRole("heading", { level: 1, name: "Take out the spark plug" })).toBeInTheDocument();
    await user.click(screen.getByRole("button", { name: "I have done this" }));
    await user.click(screen.getByRole("button", { name: "No spark" }));
    expect(await screen.findByRole("button", { name: "Run it again" })).toBeInTheDocument();
    await user.click(screen.getByRole("button", { name: "Run it again" }));
    expect(await screen.findByRole("heading", { level: 1, name: "Take out the spark plug" })).toBeInTheDocument();

    const writes = fetchMock.mock.calls.filter(([, init]) => (init?.method ?? "GET") !== "GET");
    expect(writes).toEqual([]);
  });
});

describe("check-order advice in the editor", () => {
  it("says there is too little history instead of advising", async () => {
    const server = fakeFlowServer(buildDetail());
    stubApi(seniorTech, server.route, ({ url }) => (url === `/api/flows/${flowId}/advice` ? json(tooLittle) : undefined));
    renderApp(`/flows/${flowId}`);
    await editorOpened();
    await userEvent.setup().click(screen.getByRole("button", { name: "Check-order advice" }));
    expect(await screen.findByText("Too little history to advise: 7 finished checks on this flow, and advice needs at least 20.")).toBeInTheDocument();
  });

  it("applies the suggested order of the checks to the draft", async () => {
    // Two checks run one after the other from the start: the history says air before spark is quicker.
    const definition = {
      formatVersion: 1,
      id: flowId,
      title: "Spark plug check",
      appliesTo: { equipment: ["chainsaw"], cycle: 2 },
      start: "prepare",
      steps: {
        prepare: { kind: "instruction", title: "Make the bench safe", next: "spark" },
        spark: { kind: "section", section: "spark-check", next: "air" },
        air: { kind: "section", section: "air-and-exhaust", next: "end" },
        end: { kind: "finding", title: "Nothing found", certainty: "likely", explanation: "All checks passed.", repairs: [{ title: "Ask the customer", labourHours: 0, parts: [] }] },
      },
    };
    const advice: AdviceResponse = {
      sessionCount: 40,
      minimumSessions: 20,
      enough: true,
      findings: [{ stepId: "air/blocked", title: "Blocked air filter", count: 30, share: 0.75 }],
      checks: [
        { stepId: "spark", title: "Spark check", medianMinutes: 10, samples: 40 },
        { stepId: "air", title: "Air and exhaust", medianMinutes: 4, samples: 38 },
      ],
      suggestion: { current: ["spark", "air"], suggested: ["air", "spark"], expectedMinutesNow: 14, expectedMinutesSuggested: 6.5, explanation: "Air and exhaust finds the fault more often for its time." },
    };
    const server = fakeFlowServer(buildDetail({}, definition));
    stubApi(seniorTech, server.route, ({ url }) => (url === `/api/flows/${flowId}/advice` ? json(advice) : undefined));
    renderApp(`/flows/${flowId}`);
    await editorOpened();
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Check-order advice" }));
    const box = await screen.findByRole("region", { name: "A quicker order" });
    expect(within(box).getByText("Suggested: Air and exhaust → Spark check, about 6.5 min.")).toBeInTheDocument();
    await user.click(within(box).getByRole("button", { name: "Use this order in the draft" }));
    expect(within(box).getByRole("button", { name: "The draft already uses this order" })).toBeDisabled();
    await waitFor(() => expect(server.saves.length).toBeGreaterThan(0), { timeout: 8000 });
    const saved = server.saves.at(-1)!.definition as typeof definition;
    expect(saved.steps.prepare.next).toBe("air");
    expect(saved.steps.air.next).toBe("spark");
    expect(saved.steps.spark.next).toBe("end");
  });
});
