import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import type { Role } from "../../shared/schemas/users.ts";
import { json, meAnswers, renderApp, signedInAs, stubApi } from "./render-app.tsx";
import { answers } from "./work-orders/fakes.ts";

const navigationByRole: [Role, string, string[], string][] = [
  ["apprentice", "/bench", ["Bench", "Work orders"], "Check in a unit"],
  ["senior_tech", "/flows", ["Flows", "Bench", "Work orders"], "No flows yet. Make one, or import a flow file."],
  ["shop_lead", "/review", ["Review", "Flows", "Shop insight", "Work orders", "Shop settings", "People"], "Nothing is waiting for sign-off."],
];

describe("app shell", () => {
  it.each(navigationByRole)("shows the %s role only its own areas and opens the first one", async (role, home, labels, homeShows) => {
    stubApi(
      meAnswers(signedInAs(role)),
      answers("GET", "/api/flows", () => json({ flows: [] })),
      answers("GET", "/api/review/sessions", () => json({ rows: [], total: 0, page: 1, pageSize: 25 })),
      answers("GET", "/api/review/options", () => json({ techs: [], flows: [] })),
    );
    const { router } = renderApp("/");

    // The first lazy route import in a run can take over a second to transform.
    const nav = await screen.findByRole("navigation", { name: "Areas" }, { timeout: 5000 });
    const links = within(nav).getAllByRole("link");
    expect(links.map((link) => link.textContent)).toEqual(labels);
    expect(router.state.location.pathname).toBe(home);
    expect(within(nav).getByRole("link", { name: labels[0] })).toHaveAttribute("aria-current", "page");
    expect(screen.getByRole("heading", { level: 1, name: labels[0] })).toBeInTheDocument();
    expect(await screen.findByText(homeShows, {}, { timeout: 5000 })).toBeInTheDocument();
  });

  it("shows the shop, the person and their role in the header", async () => {
    stubApi(meAnswers(signedInAs("senior_tech", { name: "Tomás Reyes" })));
    renderApp("/bench");
    const header = await screen.findByRole("banner");
    expect(within(header).getByText("Millbrook Mower & Saw")).toBeInTheDocument();
    expect(within(header).getByText("Tomás Reyes")).toBeInTheDocument();
    expect(within(header).getByText("Senior tech")).toBeInTheDocument();
    expect(within(header).getByRole("button", { name: "Sign out" })).toBeInTheDocument();
  });

  it("tells an apprentice that shop settings are not for their role, with a way home", async () => {
    stubApi(meAnswers(signedInAs("apprentice")));
    renderApp("/settings");
    expect(await screen.findByRole("heading", { level: 1, name: "Not for your role" })).toBeInTheDocument();
    expect(screen.getByText(/The Shop settings area is open to shop leads\./)).toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Go to Bench" })).toHaveAttribute("href", "/bench");
  });

  it("shows a plain not-found page for an unknown address", async () => {
    stubApi(meAnswers(signedInAs("shop_lead")));
    renderApp("/carburettor-museum");
    expect(await screen.findByRole("heading", { level: 1, name: "No page here" })).toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Go to Review" })).toHaveAttribute("href", "/review");
  });

  it("sends a signed-out visitor to sign in, remembering where they were going", async () => {
    stubApi(meAnswers(null));
    const { router } = renderApp("/work-orders");
    expect(await screen.findByRole("heading", { level: 1, name: "Sign in" })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe("/sign-in");
    expect(router.state.location.search).toBe("?next=%2Fwork-orders");
  });

  it("signs out, forgets the session and returns to sign-in", async () => {
    let me: ReturnType<typeof signedInAs> | null = signedInAs("apprentice");
    const fetchMock = stubApi(({ url, method }) => {
      if (url === "/api/auth/sign-out" && method === "POST") {
        me = null;
        return new Response(null, { status: 204 });
      }
      return meAnswers(me)({ url, method, body: undefined });
    });
    const { queryClient } = renderApp("/bench");
    const user = userEvent.setup();
    await user.click(await screen.findByRole("button", { name: "Sign out" }));

    expect(await screen.findByRole("heading", { level: 1, name: "Sign in" })).toBeInTheDocument();
    expect(fetchMock).toHaveBeenCalledWith("/api/auth/sign-out", expect.objectContaining({ method: "POST" }));
    expect(queryClient.getQueryCache().findAll().every((query) => query.state.data == null)).toBe(true);
  });

  it("switches to the high-contrast theme and remembers it", async () => {
    stubApi(meAnswers(signedInAs("apprentice")));
    renderApp("/bench");
    const user = userEvent.setup();
    const toggle = await screen.findByRole("button", { name: /High contrast/ });
    expect(toggle).toHaveAttribute("aria-pressed", "false");

    await user.click(toggle);
    expect(toggle).toHaveAttribute("aria-pressed", "true");
    expect(document.documentElement).toHaveAttribute("data-theme", "contrast");
    expect(window.localStorage.getItem("benchpath.theme")).toBe("contrast");
  });
});
