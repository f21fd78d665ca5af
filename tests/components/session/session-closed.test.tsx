import { screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { renderApp } from "../render-app.tsx";
import { buildSession, stubSessionApi, storedAnswer, storedEvents } from "./session-fakes.ts";

describe("a closed check", () => {
  it("shows the shop lead's comment on a check sent back, with its finding", async () => {
    const events = storedEvents([
      { type: "caution.acknowledge", stepId: "guard", signal: "WARNING" },
      { type: "step.answer", stepId: "guard", value: "on" },
    ]);
    const returned = { ...buildSession(events), status: "completed" as const, reviewState: "returned" as const, reviewComment: "Photograph the plug cap before you pull it." };
    stubSessionApi(returned, storedAnswer);
    renderApp("/bench/sessions/se-1");
    expect(await screen.findByText("The shop lead sent this check back.", {}, { timeout: 5000 })).toBeInTheDocument();
    expect(screen.getByRole("region", { name: "The shop lead says" })).toHaveTextContent("Photograph the plug cap before you pull it.");
    expect(screen.getByRole("heading", { name: "Cap left on" })).toBeInTheDocument();
  });
});
