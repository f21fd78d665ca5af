import { screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { json, meAnswers, renderApp, stubApi, type FakeRoute } from "../render-app.tsx";
import type { PublicEstimate } from "../../../shared/schemas/estimates.ts";

const token = "Zm9yLXRoZS1jb21wb25lbnQtdGVzdHMtb25seS0wMDAx";
const totals = { partsCents: 1900, labourCents: 5100, diagnosticFeeCents: 4500, diagnosticCreditCents: 4500, subtotalCents: 7000, taxCents: 138, totalCents: 7138 };

const estimate: PublicEstimate = {
  shop: { name: "Millbrook Mower & Saw", phone: "555-0199", email: "desk@millbrook.example", address: "2 Weir Lane" },
  workOrderNumber: 1042,
  unit: { equipmentKind: "string_trimmer", make: "Hollis", model: "TR-22" },
  findingTitle: "Spark plug fouled",
  note: "",
  currency: "USD",
  revision: 1,
  validUntil: "2027-01-01T12:00:00.000Z",
  options: [
    {
      id: "0190f0c0-0000-7000-8000-0000000000a1",
      title: "Fit a new plug and air filter",
      lines: [
        { kind: "part", description: "KC-SP-7 spark plug", quantity: 1, unitPriceCents: 450, amountCents: 450 },
        { kind: "part", description: "KC-AF-12 air filter", quantity: 2, unitPriceCents: 725, amountCents: 1450 },
        { kind: "labour", description: "Labour", quantity: 0.6, unitPriceCents: 8500, amountCents: 5100 },
        { kind: "diagnostic_fee", description: "Diagnostic fee", quantity: 1, unitPriceCents: 4500, amountCents: 4500 },
        { kind: "diagnostic_credit", description: "Diagnostic fee credited to the repair", quantity: 1, unitPriceCents: -4500, amountCents: -4500 },
      ],
      totals,
      repairOrReplace: null,
    },
  ],
};

function publicApi(answer: () => Response, decided?: (body: unknown) => Response): FakeRoute {
  return ({ url, method, body }) => {
    if (url === `/api/public/estimates/${token}` && method === "GET") return answer();
    if (url === `/api/public/estimates/${token}/decision` && method === "POST" && decided) return decided(body);
    return undefined;
  };
}

describe("the customer's estimate page", () => {
  it("shows the shop, the unit and each option's lines and total, and declines only after the confirmation", async () => {
    let posted: unknown;
    stubApi(
      meAnswers(null),
      publicApi(
        () => json(estimate),
        (body) => {
          posted = body;
          return json({ decision: "declined", optionTitle: null, shopName: "Millbrook Mower & Saw", shopPhone: "555-0199" });
        },
      ),
    );
    renderApp(`/estimate/${token}`);
    expect(await screen.findByRole("heading", { level: 1, name: "Your estimate" }, { timeout: 5000 })).toBeInTheDocument();
    expect(screen.getByText("Millbrook Mower & Saw")).toBeInTheDocument();
    expect(screen.getByText(/Hollis TR-22 string trimmer, work order 1042/)).toBeInTheDocument();
    const option = screen.getByRole("listitem", { name: "Fit a new plug and air filter" });
    expect(within(option).getByText("0.6 h at $85.00 an hour")).toBeInTheDocument();
    expect(within(option).getByText("2 × $7.25")).toBeInTheDocument();
    expect(within(option).getByText("−$45.00")).toBeInTheDocument();
    expect(within(option).getByText("$71.38")).toBeInTheDocument();

    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Decline the estimate" }));
    expect(posted).toBeUndefined();
    expect(screen.getByRole("heading", { name: "Decline the estimate?" })).toBeInTheDocument();
    await user.type(screen.getByLabelText("A word for the shop (optional)"), "Buying a new one.");
    await user.click(screen.getByRole("button", { name: "Yes, decline" }));
    expect(await screen.findByRole("heading", { name: "Thank you for your answer" })).toBeInTheDocument();
    expect(posted).toEqual({ decision: "decline", comment: "Buying a new one." });
  });

  it("goes back from the confirmation without answering", async () => {
    const fetchMock = stubApi(meAnswers(null), publicApi(() => json(estimate)));
    renderApp(`/estimate/${token}`);
    const user = userEvent.setup();
    await user.click(await screen.findByRole("button", { name: "Approve this option" }, { timeout: 5000 }));
    expect(screen.getByText(/for/, { selector: "p" })).toHaveTextContent("Fit a new plug and air filter for $71.38, tax included.");
    await user.click(screen.getByRole("button", { name: "Go back" }));
    expect(screen.getByRole("button", { name: "Approve this option" })).toBeInTheDocument();
    expect(fetchMock.mock.calls.filter(([, init]) => init?.method === "POST")).toEqual([]);
  });

  it("says plainly when the link was used, replaced, has expired or is unknown", async () => {
    for (const [status, id, heading] of [
      [410, "link_used", "Already answered"],
      [410, "link_revoked", "A newer e-mail replaced this link"],
      [410, "link_expired", "Past its date"],
      [404, "not_found", "Link not found"],
    ] as const) {
      const message = `The server's own words for ${id}.`;
      stubApi(meAnswers(null), publicApi(() => json({ error: { id, message } }, { status })));
      const view = renderApp(`/estimate/${token}`);
      expect(await screen.findByRole("heading", { level: 1, name: heading }, { timeout: 5000 })).toBeInTheDocument();
      expect(screen.getByText(message)).toBeInTheDocument();
      await waitFor(() => expect(screen.queryByRole("button")).toBeNull());
      view.unmount();
    }
  });
});
