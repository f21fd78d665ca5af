import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import type { SessionDetail } from "../../../shared/schemas/sessions.ts";
import { json, meAnswers, renderApp, signedInAs, stubApi, type FakeRoute } from "../render-app.tsx";
import { answers } from "../work-orders/fakes.ts";
import { buildReviewSession, flagsAnswers, optionsAnswers, PHOTOS, queueAnswers } from "./fakes.ts";

const lead = (unitSystem: "imperial" | "metric" = "imperial") => meAnswers(signedInAs("shop_lead", { name: "Rosa Lindqvist", unitSystem }));

/** The session's own fake: GET answers whatever `current()` gives, so a test can change it after a decision. */
function sessionAnswers(current: () => SessionDetail, gets: { count: number } = { count: 0 }): FakeRoute {
  return answers("GET", "/api/sessions/se-1", () => {
    gets.count += 1;
    return json(current());
  });
}
const open = async () => screen.findByRole("heading", { level: 1, name: /WO 1042/ }, { timeout: 5000 });
const entry = (title: string, nth = 0) => screen.getAllByRole("listitem", { name: title })[nth]!;

describe("a session under review", () => {
  it("heads the page with the work order, customer, unit, tech, flow and times", async () => {
    stubApi(lead(), sessionAnswers(() => buildReviewSession()), flagsAnswers());
    renderApp("/review/sessions/se-1");
    expect(await open()).toHaveTextContent("WO 1042 · Marlow Ashby");
    for (const [term, value] of [["Unit", "Fernhill FT-25 string trimmer"], ["Tech", "Alder Quinn"], ["Flow", "Trimmer no-start v.2"]] as const) {
      expect(screen.getByText(term, { selector: "dt" }).nextElementSibling).toHaveTextContent(value);
    }
    expect(screen.getAllByText("Waiting for sign-off").length).toBeGreaterThan(0);
    expect(screen.getByRole("link", { name: "Back to the queue" })).toHaveAttribute("href", "/review");
  });

  it("lists the flags first with their reasons, and jumps to the flagged step", async () => {
    stubApi(lead(), sessionAnswers(() => buildReviewSession()), flagsAnswers());
    renderApp("/review/sessions/se-1");
    await open();
    const flags = await screen.findByRole("region", { name: "Flags (2)" });
    expect(within(flags).getByText("Step done too fast")).toBeInTheDocument();
    expect(within(flags).getByText(`"Look the plug over" was done in 5 seconds; it takes at least 30 seconds.`)).toBeInTheDocument();
    expect(within(flags).getByText("Open too long")).toBeInTheDocument();
    // Only a flag about a step has a way to it.
    const jumps = within(flags).getAllByRole("button", { name: "Show the step" });
    expect(jumps).toHaveLength(1);
    const timeline = screen.getByRole("region", { name: "Step by step" });
    expect(flags.compareDocumentPosition(timeline) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    await userEvent.setup().click(jumps[0]!);
    expect(entry("Look the plug over")).toHaveFocus();
  });

  it("tells each step's answer, the time on it, notes, cautions and the finding", async () => {
    stubApi(lead(), sessionAnswers(() => buildReviewSession()), flagsAnswers());
    renderApp("/review/sessions/se-1");
    await open();
    const guard = entry("Is the spark plug cap off?");
    expect(within(guard).getByText("Yes, the cap is off")).toBeInTheDocument();
    expect(within(guard).getByText("WARNING")).toBeInTheDocument();
    expect(guard).toHaveTextContent(/WARNING caution acknowledged at/);
    // Hand-worked from the log: the answer at 45 s came 25 s after the acknowledgement at 20 s.
    expect(guard).toHaveTextContent("25 s on the step");
    const inspect = entry("Look the plug over");
    expect(within(inspect).getByText("Done")).toBeInTheDocument();
    expect(within(inspect).getByText("Plug boot is cracked.")).toBeInTheDocument();
    // 400 s − 280 s on the gauge.
    expect(entry("Record the highest gauge reading", 1)).toHaveTextContent("2 min 00 s on the step");
    const finding = entry("Compression is healthy");
    expect(finding).toHaveTextContent("Finding");
    expect(finding).toHaveTextContent("Likely");
  });

  it("shows a revised answer struck through as what it changed from, and marks the one taken back", async () => {
    stubApi(lead(), sessionAnswers(() => buildReviewSession()), flagsAnswers());
    renderApp("/review/sessions/se-1");
    await open();
    const first = entry("Measure the plug gap", 0);
    const again = entry("Measure the plug gap", 1);
    expect(first).toHaveTextContent("Taken back: the tech later went back, so this answer no longer stands.");
    expect(within(again).getByText("0.9 mm")).toBeInTheDocument();
    const struck = within(again).getByText("0.76 mm");
    expect(struck.tagName).toBe("DEL");
    expect(again).toHaveTextContent("Changed from 0.76 mm");
    expect(entry("Record the highest gauge reading", 0)).toHaveTextContent("Went back to the step before");
  });

  it("gives readings in the viewer's own units beside what the tech entered, with the verdict", async () => {
    stubApi(lead("imperial"), sessionAnswers(() => buildReviewSession()), flagsAnswers());
    const { unmount } = renderApp("/review/sessions/se-1");
    await open();
    // Source: NIST SP 811 (2008), Appendix B.8, p. 50 — 1 in = 25.4 mm; 0.9 mm = 0.035433 in.
    expect(within(entry("Measure the plug gap", 1)).getByText("(0.03543 in)")).toBeInTheDocument();
    expect(within(entry("Measure the plug gap", 1)).getByText("Good")).toBeInTheDocument();
    expect(within(entry("Measure the plug gap", 1)).getByText("“In range”")).toBeInTheDocument();
    expect(within(entry("Record the highest gauge reading", 1)).getByText("120 psi")).toBeInTheDocument();
    expect(within(entry("Record the highest gauge reading", 1)).queryByText(/kPa/)).not.toBeInTheDocument();
    unmount();

    stubApi(lead("metric"), sessionAnswers(() => buildReviewSession()), flagsAnswers());
    renderApp("/review/sessions/se-1");
    await open();
    // Source: NIST SP 811 (2008), Appendix B.8, p. 53 — 1 psi = 6.894 757 kPa; 120 psi = 827.37 kPa.
    expect(within(entry("Record the highest gauge reading", 1)).getByText("(827.4 kPa)")).toBeInTheDocument();
    // Entered in millimetres, the metric viewer's own unit: nothing to convert.
    expect(within(entry("Measure the plug gap", 1)).getByText("0.9 mm").parentElement).toHaveTextContent(/^Reading:0\.9 mm$/);
  });

  it("opens a photo full size, steps between the session's photos, and closes with Escape or the button", async () => {
    stubApi(lead(), sessionAnswers(() => buildReviewSession()), flagsAnswers());
    renderApp("/review/sessions/se-1");
    await open();
    const user = userEvent.setup();
    const thumb = screen.getByRole("button", { name: /Photo 1 of 2/ });
    await user.click(thumb);
    const viewer = screen.getByRole("dialog", { name: "Photo 1 of 2" });
    expect(viewer).toHaveAttribute("aria-modal", "true");
    expect(viewer).toHaveAccessibleDescription(/Taken at “Look the plug over”/);
    expect(within(viewer).getByRole("img")).toHaveAttribute("src", `/api/attachments/${PHOTOS[0]}`);
    expect(within(viewer).getByRole("button", { name: "Close" })).toHaveFocus();
    expect(within(viewer).getByRole("button", { name: "Previous photo" })).toBeDisabled();

    await user.click(within(viewer).getByRole("button", { name: "Next photo" }));
    expect(screen.getByRole("dialog", { name: "Photo 2 of 2" })).toBeInTheDocument();
    expect(within(viewer).getByRole("img")).toHaveAttribute("src", `/api/attachments/${PHOTOS[1]}`);
    await user.keyboard("{ArrowLeft}");
    expect(screen.getByRole("dialog", { name: "Photo 1 of 2" })).toBeInTheDocument();

    // Tab stays inside the viewer: from its last control back to its first.
    within(viewer).getByRole("button", { name: "Next photo" }).focus();
    await user.tab();
    expect(within(viewer).getByRole("button", { name: "Close" })).toHaveFocus();
    await user.tab({ shift: true });
    expect(within(viewer).getByRole("button", { name: "Next photo" })).toHaveFocus();

    await user.keyboard("{Escape}");
    expect(screen.queryByRole("dialog")).not.toBeInTheDocument();
    expect(thumb).toHaveFocus();
    await user.click(screen.getByRole("button", { name: /Photo 2 of 2/ }));
    await user.click(screen.getByRole("button", { name: "Close" }));
    expect(screen.queryByRole("dialog")).not.toBeInTheDocument();
  });
});

describe("signing a session off", () => {
  it("approves, says so, shows the decision and asks the server again for the session and the queue", async () => {
    let detail = buildReviewSession();
    const gets = { count: 0 };
    const posted: unknown[] = [];
    const seen: string[] = [];
    stubApi(
      lead(),
      optionsAnswers,
      queueAnswers(seen),
      sessionAnswers(() => detail, gets),
      flagsAnswers(),
      answers("POST", "/api/sessions/se-1/review", (body) => {
        posted.push(body);
        detail = { ...detail, reviewState: "approved", reviewerName: "Rosa Lindqvist", reviewedAt: "2026-03-02T11:00:00.000Z" };
        return json(detail);
      }),
    );
    const { router } = renderApp("/review?reviewState=waiting");
    await userEvent.setup().click(await screen.findByRole("link", { name: "WO 1042" }, { timeout: 5000 }));
    await open();
    expect(screen.getByRole("link", { name: "Back to the queue" })).toHaveAttribute("href", "/review?reviewState=waiting");
    const before = { gets: gets.count, queue: seen.length };
    await userEvent.setup().click(screen.getByRole("button", { name: "Approve" }));
    expect(await screen.findByRole("status")).toHaveTextContent("Signed off. The check has left the list waiting for sign-off.");
    expect(posted).toEqual([{ decision: "approve", comment: "" }]);
    expect(screen.queryByRole("button", { name: "Approve" })).not.toBeInTheDocument();
    expect(screen.getByRole("region", { name: "Sign-off" })).toHaveTextContent(/Signed off by Rosa Lindqvist on/);
    await waitFor(() => expect(gets.count).toBeGreaterThan(before.gets));
    // The queue is asked again when it is next shown.
    await userEvent.setup().click(screen.getByRole("link", { name: "Back to the queue" }));
    await waitFor(() => expect(seen.length).toBeGreaterThan(before.queue));
    expect(router.state.location.search).toBe("?reviewState=waiting");
  });

  it("will not return a session without a comment, and says so beside the field", async () => {
    const posted: unknown[] = [];
    stubApi(lead(), sessionAnswers(() => buildReviewSession()), flagsAnswers(), answers("POST", "/api/sessions/se-1/review", (body) => (posted.push(body), json({}))));
    renderApp("/review/sessions/se-1");
    await open();
    const user = userEvent.setup();
    await user.type(screen.getByRole("textbox", { name: "Comment for the tech" }), "   ");
    await user.click(screen.getByRole("button", { name: "Return to the tech" }));
    const field = screen.getByRole("textbox", { name: "Comment for the tech" });
    expect(field).toHaveAttribute("aria-invalid", "true");
    expect(field).toHaveAccessibleDescription(/Say what the tech should look at again before returning the session\./);
    expect(field).toHaveFocus();
    expect(posted).toEqual([]);
  });

  it("returns a session with the comment and says it went back to the tech", async () => {
    let detail = buildReviewSession();
    const posted: unknown[] = [];
    stubApi(
      lead(),
      sessionAnswers(() => detail),
      flagsAnswers(),
      answers("POST", "/api/sessions/se-1/review", (body) => {
        posted.push(body);
        detail = { ...detail, reviewState: "returned", reviewComment: "Measure the gap once, with a feeler gauge.", reviewerName: "Rosa Lindqvist", reviewedAt: "2026-03-02T11:00:00.000Z" };
        return json(detail);
      }),
    );
    renderApp("/review/sessions/se-1");
    await open();
    const user = userEvent.setup();
    await user.type(screen.getByRole("textbox", { name: "Comment for the tech" }), "Measure the gap once, with a feeler gauge.");
    await user.click(screen.getByRole("button", { name: "Return to the tech" }));
    expect(await screen.findByRole("status")).toHaveTextContent("Sent back to Alder Quinn. Your comment shows on their bench.");
    expect(posted).toEqual([{ decision: "return", comment: "Measure the gap once, with a feeler gauge." }]);
    const panel = screen.getByRole("region", { name: "Sign-off" });
    expect(panel).toHaveTextContent(/Sent back to Alder Quinn by Rosa Lindqvist on/);
    expect(within(panel).getByText("Measure the gap once, with a feeler gauge.")).toBeInTheDocument();
  });

  it.each([
    ["a 400 about the comment", 400, { id: "invalid_input", message: "Some fields need attention.", details: { formErrors: [], fieldErrors: { comment: ["Keep the comment to 2000 characters."] } } }, "Keep the comment to 2000 characters."],
    ["a 409 when someone signed it off first", 409, { id: "not_waiting_for_review", message: "Only a completed session waiting for review can be signed off." }, "Only a completed session waiting for review can be signed off."],
  ])("shows the server's message beside the field on %s", async (_name, status, error, message) => {
    stubApi(lead(), sessionAnswers(() => buildReviewSession()), flagsAnswers(), answers("POST", "/api/sessions/se-1/review", () => json({ error }, { status })));
    renderApp("/review/sessions/se-1");
    await open();
    const user = userEvent.setup();
    await user.type(screen.getByRole("textbox", { name: "Comment for the tech" }), "Looks right.");
    await user.click(screen.getByRole("button", { name: "Approve" }));
    await waitFor(() => expect(screen.getByRole("textbox", { name: "Comment for the tech" })).toHaveAccessibleDescription(new RegExp(message.replace(/[.()]/g, "\\$&"))));
    expect(screen.getByRole("textbox", { name: "Comment for the tech" })).toHaveValue("Looks right.");
  });

  it("offers no sign-off on a session still on the bench, and shows an earlier decision with its comment", async () => {
    stubApi(lead(), sessionAnswers(() => buildReviewSession({ status: "open", reviewState: "not_submitted", completedAt: null, events: buildReviewSession().events.slice(0, 3) })), flagsAnswers());
    const { unmount } = renderApp("/review/sessions/se-1");
    await open();
    expect(screen.queryByRole("button", { name: "Approve" })).not.toBeInTheDocument();
    expect(screen.getByRole("region", { name: "Sign-off" })).toHaveTextContent("Alder Quinn has not completed this check yet");
    expect(entry("Look the plug over")).toHaveTextContent("The session stands here");
    unmount();

    const returned = buildReviewSession({ reviewState: "returned", reviewComment: "Photograph the plug before you clean it.", reviewerName: "Rosa Lindqvist", reviewedAt: "2026-03-02T11:00:00.000Z" });
    stubApi(lead(), sessionAnswers(() => returned), flagsAnswers());
    renderApp("/review/sessions/se-1");
    await open();
    expect(screen.queryByRole("button", { name: "Return to the tech" })).not.toBeInTheDocument();
    const panel = screen.getByRole("region", { name: "Sign-off" });
    expect(panel).toHaveTextContent(/Sent back to Alder Quinn by Rosa Lindqvist on/);
    expect(within(panel).getByText("Photograph the plug before you clean it.")).toBeInTheDocument();
  });
});
