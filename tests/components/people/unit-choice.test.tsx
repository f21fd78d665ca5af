import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi } from "../render-app.tsx";
import { answer } from "./fakes.ts";

describe("each person's units", () => {
  it("saves the choice and the app's own copy of the signed-in person follows", async () => {
    const me = signedInAs("shop_lead");
    const fetchMock = stubApi(meAnswers(me), answer({ url: "/api/users", method: "GET" }, () => json({ people: [] })), answer({ url: "/api/auth/me/units", method: "PUT" }, () => json({ user: { ...me.user, unitSystem: "metric" } })));
    const { queryClient } = renderApp("/people");
    const user = userEvent.setup();
    const group = await screen.findByRole("group", { name: "Measurement system" });
    expect(within(group).getByRole("button", { name: /Imperial/ })).toHaveAttribute("aria-pressed", "true");
    await user.click(within(group).getByRole("button", { name: /Metric/ }));
    await expect.poll(() => within(group).getByRole("button", { name: /Metric/ }).getAttribute("aria-pressed")).toBe("true");
    expect(queryClient.getQueryData<typeof me>(["auth", "me"])?.user.unitSystem).toBe("metric");
    const put = fetchMock.mock.calls.find(([url]) => url === "/api/auth/me/units");
    expect(JSON.parse(String(put?.[1]?.body))).toEqual({ unitSystem: "metric" });
  });
});
