import { screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";
import { json, renderApp, signedInAs } from "../render-app.tsx";
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

  it("opens a returned check again at its finding, keeps the comment in view, and lets the tech step back from the finding", async () => {
    const events = storedEvents([
      { type: "caution.acknowledge", stepId: "guard", signal: "WARNING" },
      { type: "step.answer", stepId: "guard", value: "on" },
    ]);
    const comment = "Check the cap again: the photo shows it off.";
    const returned = { ...buildSession(events), status: "completed" as const, reviewState: "returned" as const, reviewComment: comment, currentStepId: "cap-on", findingStepId: "cap-on", completedAt: "2026-03-02T09:10:00.000Z" };
    const posted: string[] = [];
    vi.stubGlobal(
      "fetch",
      vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
        const url = String(input);
        const method = init?.method ?? "GET";
        posted.push(`${method} ${url}`);
        if (url === "/api/auth/me") return json(signedInAs("apprentice"));
        if (url === "/api/sessions/se-1" && method === "GET") return json(posted.some((p) => p.endsWith("/reopen")) ? { ...returned, status: "open", completedAt: null } : returned);
        if (url === "/api/sessions/se-1/reopen" && method === "POST") return json({ ...returned, status: "open", completedAt: null });
        if (url === "/api/bench/home") return json({ open: [], waitingForReview: [], returned: [] });
        throw new Error(`No fake answer for ${method} ${url}`);
      }),
    );
    renderApp("/bench/sessions/se-1");
    await userEvent.click(await screen.findByRole("button", { name: "Open the check again to revise it" }, { timeout: 5000 }));
    // The live check stands at its finding, with the way back and the lead's words above it.
    expect(await screen.findByRole("button", { name: /back one step/i }, { timeout: 5000 })).toBeInTheDocument();
    expect(screen.getByRole("region", { name: "The shop lead says" })).toHaveTextContent(comment);
    expect(screen.getByRole("heading", { name: "Cap left on" })).toBeInTheDocument();
    expect(posted).toContain("POST /api/sessions/se-1/reopen");
  });
});
