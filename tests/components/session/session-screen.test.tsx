import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { renderApp } from "../render-app.tsx";
import { buildSession, stubSessionApi, storedAnswer, storedEvents } from "./session-fakes.ts";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-7[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

async function openSession() {
  const view = renderApp("/bench/sessions/se-1");
  // The first lazy route import in a run can take over a second to transform.
  await screen.findByRole("heading", { level: 1 }, { timeout: 5000 });
  return view;
}

const atGauge = () => storedEvents([{ type: "caution.acknowledge", stepId: "guard", signal: "WARNING" }, { type: "step.answer", stepId: "guard", value: "off" }]);

describe("the guided step screen", () => {
  it("keeps the answers shut until the WARNING is acknowledged, and saves the acknowledgement", async () => {
    const posted = stubSessionApi(buildSession(), storedAnswer);
    await openSession();
    const answers = screen.getByRole("group", { name: "Answers" });
    for (const button of within(answers).getAllByRole("button")) expect(button).toBeDisabled();
    expect(screen.getByText(/Read the WARNING panel and press/)).toBeInTheDocument();

    await userEvent.setup().click(screen.getByRole("button", { name: "Read and understood" }));
    for (const button of within(answers).getAllByRole("button")) expect(button).toBeEnabled();
    await waitFor(() => expect(posted).toHaveLength(1));
    expect(posted[0]).toMatchObject({ seq: 1, event: { type: "caution.acknowledge", stepId: "guard", signal: "WARNING" } });
  });

  it("appends a choice with a fresh id, the next seq and the option's value, and shows the next step at once", async () => {
    const posted = stubSessionApi(buildSession(storedEvents([{ type: "caution.acknowledge", stepId: "guard", signal: "WARNING" }])), storedAnswer);
    await openSession();
    await userEvent.setup().click(screen.getByRole("button", { name: "Yes, the cap is off" }));
    expect(screen.getByRole("heading", { level: 1, name: "Record the highest gauge reading" })).toBeInTheDocument();
    await waitFor(() => expect(posted).toHaveLength(1));
    expect(posted[0]!.id).toMatch(UUID);
    expect(posted[0]).toMatchObject({ seq: 2, event: { type: "step.answer", stepId: "guard", value: "off" } });
  });

  it("refuses what is not a number or out of range beside the keypad, then shows the verdict with its reason", async () => {
    stubSessionApi(buildSession(atGauge()), storedAnswer);
    await openSession();
    const user = userEvent.setup();
    const display = screen.getByLabelText("Reading in psi");
    await user.type(display, "abc");
    await user.click(screen.getByRole("button", { name: "Record the reading" }));
    expect(screen.getByText("Enter the reading as a number.")).toBeInTheDocument();

    await user.click(screen.getByRole("button", { name: "Clear" }));
    for (const key of ["2", "0", "0", "0"]) await user.click(screen.getByRole("button", { name: key }));
    await user.click(screen.getByRole("button", { name: "Record the reading" }));
    expect(screen.getByText(/2000 psi is above 1015\.26 psi: no small engine/)).toBeInTheDocument();

    await user.click(screen.getByRole("button", { name: "Clear" }));
    for (const key of ["1", "2", "0"]) await user.click(screen.getByRole("button", { name: key }));
    await user.click(screen.getByRole("button", { name: "Record the reading" }));
    const card = screen.getByRole("region", { name: "Reading recorded" });
    expect(within(card).getByText("Good")).toBeInTheDocument();
    expect(within(card).getByText(/within the usual range for a handheld 2-stroke/)).toBeInTheDocument();
    await user.click(within(card).getByRole("button", { name: "Go on to the next step" }));
    expect(screen.getByRole("heading", { level: 1, name: "Compression is healthy" })).toBeInTheDocument();
  });

  it("says saving, then waiting for the connection while the server is unreachable, then saved", async () => {
    let mode: "hang" | "down" | "up" = "hang";
    let release: (() => void) | null = null;
    stubSessionApi(buildSession(atGauge().slice(0, 1)), async (request) => {
      if (mode === "hang") await new Promise<void>((resolve) => (release = resolve));
      if (mode === "down") throw new TypeError("Failed to fetch");
      return storedAnswer(request);
    });
    await openSession();
    expect(screen.getByText("Saved")).toBeInTheDocument();
    await userEvent.setup().click(screen.getByRole("button", { name: "No, it is still on" }));
    await waitFor(() => expect(screen.getByText("Saving…")).toBeInTheDocument());
    mode = "down";
    release!();
    // The hung request now answers as if the server were gone: the answer stays on the tablet.
    await waitFor(() => expect(screen.getByText("Waiting for the connection (1 answer kept on this tablet)")).toBeInTheDocument(), { timeout: 3000 });
    mode = "up";
    await waitFor(() => expect(screen.getByText("Saved")).toBeInTheDocument(), { timeout: 5000 });
  });
});
