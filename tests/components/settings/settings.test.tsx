import { screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi, type FakeRoute } from "../render-app.tsx";
import type { Settings, SettingsResponse } from "../../../shared/schemas/settings.ts";

const lead = meAnswers(signedInAs("shop_lead"));

const stored: SettingsResponse = {
  name: "Millbrook Mower & Saw",
  phone: "555-0142",
  email: "desk@millbrook.example",
  address: "3 Weir Lane",
  labourRateCents: 8500,
  diagnosticFeeCents: 4500,
  creditDiagnosticFee: true,
  taxRateBasisPoints: 725,
  taxLabour: false,
  currency: "USD",
  defaultUnitSystem: "imperial",
  altitudeM: 410,
  replaceThresholdPercent: 50,
  estimateValidDays: 30,
  reviewOpenHours: 24,
  warrantyNote: "",
  updatedAt: "2026-03-01T08:00:00.000Z",
};

function settingsServer(onPut: (body: Settings) => Response): FakeRoute {
  return ({ url, method, body }) => {
    if (url !== "/api/settings") return undefined;
    if (method === "GET") return json(stored);
    if (method === "PUT") return onPut(body as Settings);
    return undefined;
  };
}

async function openSettings() {
  renderApp("/settings");
  await screen.findByRole("heading", { level: 1, name: "Shop settings" }, { timeout: 5000 });
}

describe("the shop settings screen", () => {
  it("shows the stored values in the shop's own terms: decimals, percent and feet", async () => {
    stubApi(lead, settingsServer(() => json(stored)));
    await openSettings();
    expect(screen.getByRole("textbox", { name: "Labour rate per hour" })).toHaveValue("85.00");
    expect(screen.getByRole("textbox", { name: /Tax rate/ })).toHaveValue("7.25");
    // Source: 1 ft = 0.3048 m; 410 m / 0.3048 = 1345.1 ft → 1345.
    expect(screen.getByRole("textbox", { name: /Altitude/ })).toHaveValue("1345");
    for (const name of ["Shop and contact", "Money", "Units and place", "Estimates", "Review"]) expect(screen.getByRole("heading", { level: 2, name })).toBeInTheDocument();
  });

  it("refuses an unknown currency beside the field and sends nothing", async () => {
    let puts = 0;
    stubApi(
      lead,
      settingsServer(() => {
        puts += 1;
        return json(stored);
      }),
    );
    await openSettings();
    const user = userEvent.setup();
    const currency = screen.getByRole("textbox", { name: "Currency" });
    await user.clear(currency);
    await user.type(currency, "XYZ");
    await user.click(screen.getByRole("button", { name: "Save settings" }));
    await waitFor(() => expect(currency).toHaveAttribute("aria-invalid", "true"));
    expect(currency).toHaveAccessibleDescription(expect.stringContaining("“XYZ” is not an ISO 4217 currency code."));
    expect(puts).toBe(0);
  });

  it("shows the server's message beside the field it names, and confirms a save", async () => {
    const sent: Settings[] = [];
    stubApi(
      lead,
      settingsServer((body) => {
        sent.push(body);
        if (sent.length === 1) return json({ error: { id: "invalid_input", message: "Some fields need attention.", details: { fieldErrors: { taxRateBasisPoints: ["Use 0 to 10000 for the tax rate in basis points."] }, formErrors: [] } } }, { status: 400 });
        return json({ ...stored, ...body, updatedAt: "2026-03-05T10:00:00.000Z" });
      }),
    );
    await openSettings();
    const user = userEvent.setup();
    const tax = screen.getByRole("textbox", { name: /Tax rate/ });
    await user.clear(tax);
    await user.type(tax, "8.25");
    await user.clear(screen.getByRole("textbox", { name: "Currency" }));
    await user.type(screen.getByRole("textbox", { name: "Currency" }), "eur");
    await user.click(screen.getByRole("button", { name: "Save settings" }));
    await waitFor(() => expect(tax).toHaveAccessibleDescription(expect.stringContaining("Use 0 to 10000 for the tax rate in basis points.")));
    // 8.25 % → 825 basis points; the currency goes upper-case.
    expect(sent[0]).toMatchObject({ taxRateBasisPoints: 825, currency: "EUR", labourRateCents: 8500, altitudeM: 410 });

    await user.click(screen.getByRole("button", { name: "Save settings" }));
    expect(await screen.findByText("Settings saved.")).toBeInTheDocument();
    expect(screen.queryByText("Changes not saved yet.")).toBeNull();
  });

  it("keeps the height when the unit system changes", async () => {
    stubApi(lead, settingsServer(() => json(stored)));
    await openSettings();
    await userEvent.setup().click(screen.getByText("Metric (kPa, mm, °C, m)"));
    expect(screen.getByRole("textbox", { name: /Altitude/ })).toHaveValue("410");
    expect(screen.getByText("Changes not saved yet.")).toBeInTheDocument();
  });
});
