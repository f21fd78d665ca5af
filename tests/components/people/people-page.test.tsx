import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi } from "../render-app.tsx";
import { answer, peopleAnswers, person } from "./fakes.ts";

const me = signedInAs("shop_lead", { id: "0190f0c0-0000-7000-8000-0000000000a1" });
const lead = person();
const tech = person({ id: "0190f0c0-0000-7000-8000-0000000000b2", name: "Tam Okafor", email: "tam@shop.example", role: "apprentice" });

describe("the People screen", () => {
  it("shows each problem beside its field when the invitation is sent empty", async () => {
    const fetchMock = stubApi(meAnswers(me), peopleAnswers([lead, tech]));
    renderApp("/people");
    const user = userEvent.setup();
    await user.click(await screen.findByRole("button", { name: "Send the invitation" }));
    expect(screen.getByRole("textbox", { name: /^Name/ })).toHaveAccessibleDescription("Enter their name.");
    expect(screen.getByRole("textbox", { name: /^E-mail/ })).toHaveAccessibleDescription("Enter an e-mail address, for example name@shop.example.");
    expect(fetchMock.mock.calls.some(([url]) => url === "/api/users/invites")).toBe(false);
  });

  it("puts the server's 'address taken' beside the e-mail field and keeps what was typed", async () => {
    stubApi(
      meAnswers(me),
      peopleAnswers([lead, tech]),
      answer({ url: "/api/users/invites", method: "POST" }, () =>
        json({ error: { id: "email_taken", message: "Taken.", details: { fieldErrors: { email: ["Someone in this shop already uses that e-mail address."] }, formErrors: [] } } }, { status: 409 }),
      ),
    );
    renderApp("/people");
    const user = userEvent.setup();
    await user.type(await screen.findByRole("textbox", { name: /^Name/ }), "Tam Again");
    await user.type(screen.getByRole("textbox", { name: /^E-mail/ }), "tam@shop.example");
    await user.click(screen.getByRole("button", { name: "Send the invitation" }));
    const email = screen.getByRole("textbox", { name: /^E-mail/ });
    await expect.poll(() => email.getAttribute("aria-invalid")).toBe("true");
    expect(email).toHaveAccessibleDescription("Someone in this shop already uses that e-mail address.");
    expect(email).toHaveValue("tam@shop.example");
    expect(screen.getByRole("textbox", { name: /^Name/ })).toHaveValue("Tam Again");
    expect(screen.queryByRole("alert")).toBeNull();
  });

  it("says plainly when the invitation e-mail failed and offers to send it again", async () => {
    const invited = person({ id: "0190f0c0-0000-7000-8000-0000000000c3", name: "Una Pike", email: "una@shop.example", role: "apprentice", active: false, status: "invited", invitedAt: "2026-12-01T09:00:00.000Z", inviteExpiresAt: "2099-12-08T09:00:00.000Z", lastSignInAt: null });
    const failed = { status: "failed", error: "Could not reach the mail server at smtp://mail.shop.example:587: it refused the connection." };
    const fetchMock = stubApi(
      meAnswers(me),
      peopleAnswers([lead, invited]),
      answer({ url: "/api/users/invites", method: "POST" }, () => json({ person: invited, mail: failed }, { status: 201 })),
      answer({ url: `/api/users/${invited.id}/invites`, method: "POST" }, () => json({ person: invited, mail: { status: "sent", error: null } })),
    );
    renderApp("/people");
    const user = userEvent.setup();
    await user.type(await screen.findByRole("textbox", { name: /^Name/ }), "Una Pike");
    await user.type(screen.getByRole("textbox", { name: /^E-mail/ }), "una@shop.example");
    await user.click(screen.getByRole("button", { name: "Send the invitation" }));
    const alert = await screen.findByRole("alert");
    expect(alert).toHaveTextContent("The invitation to Una Pike was not sent.");
    expect(alert).toHaveTextContent(failed.error);
    await user.click(within(alert).getByRole("button", { name: "Send it again" }));
    expect(await screen.findByText("An invitation is on its way to Una Pike at una@shop.example.")).toBeInTheDocument();
    expect(fetchMock.mock.calls.filter(([url]) => url === `/api/users/${invited.id}/invites`)).toHaveLength(1);
  });

  it("asks before deactivating, and shows the last-shop-lead refusal beside the person", async () => {
    const fetchMock = stubApi(
      meAnswers(me),
      peopleAnswers([lead, tech]),
      answer({ url: `/api/users/${lead.id}`, method: "PATCH" }, () =>
        json({ error: { id: "last_shop_lead", message: "You are the only active shop lead. Make someone else shop lead first, so the shop is never left without one." } }, { status: 409 }),
      ),
    );
    renderApp("/people");
    const user = userEvent.setup();
    const row = await screen.findByRole("listitem", { name: "Rosa Lindqvist" });
    await user.click(within(row).getByRole("button", { name: "Deactivate" }));
    const dialog = screen.getByRole("dialog", { name: "Deactivate your own account?" });
    await user.click(within(dialog).getByRole("button", { name: "Keep as it is" }));
    expect(fetchMock.mock.calls.some(([, init]) => init?.method === "PATCH")).toBe(false);

    await user.click(within(row).getByRole("button", { name: "Deactivate" }));
    await user.click(within(screen.getByRole("dialog")).getByRole("button", { name: "Deactivate" }));
    expect(await within(row).findByText(/You are the only active shop lead/)).toBeInTheDocument();
    const patch = fetchMock.mock.calls.find(([, init]) => init?.method === "PATCH");
    expect(JSON.parse(String(patch?.[1]?.body))).toEqual({ active: false });
  });

  it("changes a role after confirming it", async () => {
    const fetchMock = stubApi(
      meAnswers(me),
      peopleAnswers([lead, tech]),
      answer({ url: `/api/users/${tech.id}`, method: "PATCH" }, (body) => json({ person: { ...tech, ...(body as object) } })),
    );
    renderApp("/people");
    const user = userEvent.setup();
    const row = await screen.findByRole("listitem", { name: "Tam Okafor" });
    await user.selectOptions(within(row).getByRole("combobox", { name: "Role" }), "senior_tech");
    await user.click(within(screen.getByRole("dialog", { name: "Make Tam Okafor senior tech?" })).getByRole("button", { name: "Change the role" }));
    await expect.poll(() => fetchMock.mock.calls.filter(([, init]) => init?.method === "PATCH").length).toBe(1);
    const patch = fetchMock.mock.calls.find(([, init]) => init?.method === "PATCH");
    expect(JSON.parse(String(patch?.[1]?.body))).toEqual({ role: "senior_tech" });
  });
});
