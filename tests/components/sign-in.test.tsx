import { screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi, type FakeRoute } from "./render-app.tsx";

const signInAnswers =
  (answer: () => Response): FakeRoute =>
  ({ url, method }) =>
    url === "/api/auth/sign-in" && method === "POST" ? answer() : undefined;

async function fillAndSubmit(email: string, password: string) {
  const user = userEvent.setup();
  await user.type(await screen.findByRole("textbox", { name: "E-mail" }), email);
  await user.type(screen.getByLabelText("Password"), password);
  await user.click(screen.getByRole("button", { name: "Sign in" }));
  return user;
}

describe("sign-in page", () => {
  it("shows each field's error beside it when submitted empty", async () => {
    stubApi(meAnswers(null));
    renderApp("/sign-in");
    const user = userEvent.setup();
    await user.click(await screen.findByRole("button", { name: "Sign in" }));

    const email = screen.getByRole("textbox", { name: "E-mail" });
    expect(email).toHaveAttribute("aria-invalid", "true");
    expect(email).toHaveAccessibleDescription("Enter your e-mail address, for example name@shop.example.");
    const password = screen.getByLabelText("Password");
    expect(password).toHaveAttribute("aria-invalid", "true");
    expect(password).toHaveAccessibleDescription("Enter your password.");
    expect(email).toHaveFocus();
  });

  it("says the e-mail and password do not match, without saying which, and keeps what was typed", async () => {
    const fetchMock = stubApi(
      meAnswers(null),
      signInAnswers(() => json({ error: { id: "invalid_credentials", message: "Wrong." } }, { status: 401 })),
    );
    renderApp("/sign-in");
    await fillAndSubmit("Ana@Shop.example", "wrong-password");

    expect(await screen.findByRole("alert")).toHaveTextContent("That e-mail and password do not match an account.");
    expect(screen.getByRole("textbox", { name: "E-mail" })).toHaveValue("Ana@Shop.example");
    expect(screen.getByLabelText("Password")).toHaveValue("wrong-password");
    expect(screen.getByRole("textbox", { name: "E-mail" })).not.toHaveAttribute("aria-invalid");
    const [, init] = fetchMock.mock.calls.find(([url]) => url === "/api/auth/sign-in") ?? [];
    expect(init).toMatchObject({ method: "POST", credentials: "same-origin" });
    expect(JSON.parse(String(init?.body))).toEqual({ email: "ana@shop.example", password: "wrong-password" });
  });

  it("tells how many minutes to wait after too many attempts", async () => {
    stubApi(
      meAnswers(null),
      signInAnswers(() =>
        json({ error: { id: "too_many_attempts", message: "Slow down." } }, { status: 429, headers: { "Retry-After": "840" } }),
      ),
    );
    renderApp("/sign-in");
    await fillAndSubmit("ana@shop.example", "secret-secret");

    const alert = await screen.findByRole("alert");
    expect(alert).toHaveTextContent("Too many sign-in attempts.");
    expect(alert).toHaveTextContent("Wait 14 minutes, then try again.");
  });

  it("says the server cannot be reached when the network fails", async () => {
    stubApi(meAnswers(null), ({ url }) => {
      if (url === "/api/auth/sign-in") throw new TypeError("Failed to fetch");
      return undefined;
    });
    renderApp("/sign-in");
    await fillAndSubmit("ana@shop.example", "secret-secret");

    expect(await screen.findByRole("alert")).toHaveTextContent("Benchpath cannot reach the shop's server.");
    expect(screen.getByRole("textbox", { name: "E-mail" })).toHaveValue("ana@shop.example");
  });

  it("puts the server's field errors beside the fields", async () => {
    stubApi(
      meAnswers(null),
      signInAnswers(() =>
        json(
          {
            error: {
              id: "invalid_input",
              message: "Check the form.",
              details: { fieldErrors: { password: ["That password is too long."] }, formErrors: [] },
            },
          },
          { status: 400 },
        ),
      ),
    );
    renderApp("/sign-in");
    await fillAndSubmit("ana@shop.example", "secret-secret");

    expect(await screen.findByText("That password is too long.")).toBeInTheDocument();
    expect(screen.getByLabelText("Password")).toHaveAccessibleDescription("That password is too long.");
    expect(screen.queryByRole("alert")).not.toBeInTheDocument();
  });

  it("goes where the person was heading once signed in", async () => {
    let me: ReturnType<typeof signedInAs> | null = null;
    stubApi(
      ({ url }) => (url === "/api/auth/me" ? meAnswers(me)({ url, method: "GET", body: undefined }) : undefined),
      signInAnswers(() => {
        me = signedInAs("apprentice");
        return json(me);
      }),
    );
    const { router } = renderApp("/sign-in?next=%2Fwork-orders");
    await fillAndSubmit("ana@shop.example", "secret-secret");

    expect(await screen.findByRole("heading", { level: 1, name: "Work orders" })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe("/work-orders");
  });

  it("shows and hides the password with a real button", async () => {
    stubApi(meAnswers(null));
    renderApp("/sign-in");
    const user = userEvent.setup();
    const password = await screen.findByLabelText("Password");
    expect(password).toHaveAttribute("type", "password");
    expect(password).toHaveAttribute("autocomplete", "current-password");
    expect(screen.getByRole("textbox", { name: "E-mail" })).toHaveAttribute("autocomplete", "username");

    await user.click(screen.getByRole("button", { name: "Show password" }));
    expect(password).toHaveAttribute("type", "text");
    await user.click(screen.getByRole("button", { name: "Hide password" }));
    expect(password).toHaveAttribute("type", "password");
  });

  it("sends someone already signed in to their home", async () => {
    stubApi(meAnswers(signedInAs("shop_lead")));
    const { router } = renderApp("/sign-in");
    expect(await screen.findByRole("heading", { level: 1, name: "Review" })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe("/review");
  });
});
