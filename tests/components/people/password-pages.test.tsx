import { screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, stubApi } from "../render-app.tsx";
import { answer } from "./fakes.ts";

const token = "abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQ";
const linkUrl = `/api/public/password-links/${token}`;
const validLink = answer({ url: linkUrl, method: "GET" }, () => json({ purpose: "invite", name: "Vic Harrow", expiresAt: "2099-01-01T00:00:00.000Z" }));

describe("the welcome and reset pages", () => {
  it("shows the password problems beside each field before anything is sent", async () => {
    const fetchMock = stubApi(meAnswers(null), validLink);
    renderApp(`/welcome/${token}`);
    const user = userEvent.setup();
    expect(await screen.findByRole("heading", { level: 1, name: "Welcome, Vic Harrow" })).toBeInTheDocument();
    await user.type(screen.getByLabelText("New password"), "short");
    await user.type(screen.getByLabelText("The same password again"), "shorts");
    await user.click(screen.getByRole("button", { name: "Join the shop" }));
    expect(screen.getByLabelText("New password")).toHaveAccessibleDescription(/Use at least 12 characters\./);
    expect(screen.getByLabelText("The same password again")).toHaveAccessibleDescription("The two passwords are not the same.");
    expect(fetchMock.mock.calls.some(([, init]) => init?.method === "POST")).toBe(false);
  });

  it("sets the password and then offers sign-in", async () => {
    const fetchMock = stubApi(meAnswers(null), validLink, answer({ url: linkUrl, method: "POST" }, () => json({ purpose: "invite", email: "vic@shop.example" })));
    renderApp(`/welcome/${token}`);
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText("New password"), "a-long-enough-password");
    await user.type(screen.getByLabelText("The same password again"), "a-long-enough-password");
    await user.click(screen.getByRole("button", { name: "Join the shop" }));
    expect(await screen.findByRole("heading", { level: 1, name: "Your password is set" })).toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Sign in" })).toHaveAttribute("href", "/sign-in");
    const post = fetchMock.mock.calls.find(([, init]) => init?.method === "POST");
    expect(JSON.parse(String(post?.[1]?.body))).toEqual({ password: "a-long-enough-password" });
  });

  it("shows a clear page for a used link", async () => {
    stubApi(meAnswers(null), answer({ url: linkUrl, method: "GET" }, () => json({ error: { id: "link_used", message: "This link has already been used. Sign in with the password you chose, or ask for a new link." } }, { status: 410 })));
    renderApp(`/reset-password/${token}`);
    expect(await screen.findByRole("heading", { level: 1, name: "This link has already been used" })).toBeInTheDocument();
    expect(screen.getByRole("link", { name: "Go to sign-in" })).toHaveAttribute("href", "/sign-in");
    expect(screen.queryByLabelText("New password")).toBeNull();
  });

  it("answers the forgot-password form the same way, and needs an address first", async () => {
    const fetchMock = stubApi(meAnswers(null), answer({ url: "/api/auth/password-resets", method: "POST" }, () => json({ message: "ok" }, { status: 202 })));
    renderApp("/sign-in");
    const user = userEvent.setup();
    await user.click(await screen.findByRole("link", { name: "Forgot your password?" }));
    await user.click(await screen.findByRole("button", { name: "Send me a link" }));
    expect(screen.getByRole("textbox", { name: "E-mail" })).toHaveAccessibleDescription("Enter an e-mail address, for example name@shop.example.");
    await user.type(screen.getByRole("textbox", { name: "E-mail" }), "Who@Shop.example");
    await user.click(screen.getByRole("button", { name: "Send me a link" }));
    expect(await screen.findByText(/If that address belongs to someone here, a link is on its way to who@shop.example/)).toBeInTheDocument();
    const post = fetchMock.mock.calls.find(([url]) => url === "/api/auth/password-resets");
    expect(JSON.parse(String(post?.[1]?.body))).toEqual({ email: "who@shop.example" });
  });
});
