import { render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { describe, expect, it } from "vitest";
import { json, stubApi } from "../render-app.tsx";
import { EstimateBuilder } from "../../../src/features/estimates/components/estimate-builder.tsx";
import type { EstimateView } from "../../../shared/schemas/estimates.ts";

const zero = { partsCents: 0, labourCents: 0, diagnosticFeeCents: 4500, diagnosticCreditCents: 4500, subtotalCents: 0, taxCents: 0, totalCents: 0 };

function draft(overrides: Partial<EstimateView> = {}): EstimateView {
  return {
    id: "0190f0c0-0000-7000-8000-0000000000e1",
    workOrderId: "wo-1",
    revision: 1,
    revisesId: null,
    status: "draft",
    findingTitle: "Spark plug fouled",
    currency: "USD",
    rates: { labourRateCents: 8500, diagnosticFeeCents: 4500, creditDiagnosticFee: true, taxRateBasisPoints: 725, taxLabour: false },
    replaceThresholdPercent: 50,
    replacementPriceCents: null,
    note: "",
    options: [
      { id: "0190f0c0-0000-7000-8000-0000000000a1", position: 0, title: "Replace the spark plug", labourHours: 0.2, parts: [{ partNumber: "", description: "spark plug", quantity: 1, unitPriceCents: 0 }], totals: { ...zero, labourCents: 1700, subtotalCents: 1700, totalCents: 1700 }, repairOrReplace: null },
    ],
    createdAt: "2026-12-01T10:00:00.000Z",
    updatedAt: "2026-12-01T10:00:00.000Z",
    sentAt: null,
    sentByName: null,
    validUntil: null,
    decidedAt: null,
    approvedOptionId: null,
    customerComment: "",
    lastSend: null,
    ...overrides,
  };
}

function renderBuilder(estimate: EstimateView) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={queryClient}>
      <EstimateBuilder estimate={estimate} customerEmail="dana@example.com" workOrderKey={["work-orders", "detail", "wo-1"]} />
    </QueryClientProvider>,
  );
}

const option = (n: number) => screen.getByRole("group", { name: `Option ${n}` });
const part = (n: number, p: number) => within(option(n)).getByRole("group", { name: `Part ${p}` });

describe("the estimate builder", () => {
  it("totals an option as the prices are typed, with the fee, its credit and tax", async () => {
    stubApi();
    renderBuilder(draft());
    const user = userEvent.setup();
    await user.clear(within(part(1, 1)).getByLabelText("Unit price"));
    await user.type(within(part(1, 1)).getByLabelText("Unit price"), "4.50");
    // Parts 4.50; labour 0.2 h × 85.00 = 17.00; fee 45.00 credited back; subtotal 21.50;
    // tax 7.25 % of 4.50 = 0.32625 → 0.33; total 21.83.
    // Common practice (no published source): tax on the parts only, rounded once to the cent.
    expect(within(option(1)).getByTestId("option-total")).toHaveTextContent("$21.83");
    expect(within(option(1)).getByText("Diagnostic fee credited to the repair").nextSibling).toHaveTextContent("−$45.00");
    expect(within(option(1)).getByText("Tax, 7.25 % on parts").nextSibling).toHaveTextContent("$0.33");

    await user.type(screen.getByLabelText(/Price of a new unit/), "40");
    // 21.83 / 40.00 = 54.575 %, shown cut to the tenth as 54.5 %: at or above the 50 % line. Common practice (consumer advice, no published source): the 50 % rule of thumb.
    expect(within(option(1)).getByText("The repair ($21.83) is 54.5 % of a new unit ($40.00): at or above the 50 % line, so consider replacing it.")).toBeInTheDocument();
  });

  it("refuses a negative quantity and price beside their fields, withholds the total and saves nothing", async () => {
    const fetchMock = stubApi();
    renderBuilder(draft());
    const user = userEvent.setup();
    const quantity = within(part(1, 1)).getByLabelText("Quantity");
    await user.clear(quantity);
    await user.type(quantity, "-2");
    expect(quantity).toHaveAccessibleDescription("The quantity must be above zero.");
    const price = within(part(1, 1)).getByLabelText("Unit price");
    await user.clear(price);
    await user.type(price, "-3");
    expect(price).toHaveAccessibleDescription("The unit price cannot be negative.");
    expect(within(option(1)).queryByTestId("option-total")).toBeNull();

    await user.click(screen.getByRole("button", { name: "Save the draft" }));
    expect(screen.getByRole("alert")).toHaveTextContent("Some fields need attention.");
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it("saves a second option with its parts in cents, then sends, and shows why a send failed with a way to send again", async () => {
    let saved: unknown;
    let sends = 0;
    const failed = draft({ lastSend: { to: "dana@example.com", status: "failed", error: "Could not reach the mail server at smtp://mail.shop.example:587: it refused the connection.", at: "2026-12-02T15:00:00.000Z" } });
    stubApi(({ url, method, body }) => {
      if (method === "PUT" && url.endsWith("/api/estimates/0190f0c0-0000-7000-8000-0000000000e1")) {
        saved = body;
        return json(draft());
      }
      if (method === "POST" && url.endsWith("/send")) {
        sends += 1;
        return json({ estimate: failed, mail: { status: "failed", to: "dana@example.com", error: failed.lastSend!.error } });
      }
      if (method === "GET" && url.startsWith("/api/")) return json({});
      return undefined;
    });
    const view = renderBuilder(draft());
    const user = userEvent.setup();
    await user.click(screen.getByRole("button", { name: "Add another option" }));
    await user.type(within(option(2)).getByLabelText("What the repair is"), "Replace the plug and the air filter");
    await user.clear(within(option(2)).getByLabelText("Labour hours"));
    await user.type(within(option(2)).getByLabelText("Labour hours"), "0.4");
    await user.click(within(option(2)).getByRole("button", { name: "Add a part" }));
    await user.type(within(part(2, 1)).getByLabelText("Part number"), "KC-AF-12");
    await user.type(within(part(2, 1)).getByLabelText("Description"), "air filter");
    await user.clear(within(part(2, 1)).getByLabelText("Unit price"));
    await user.type(within(part(2, 1)).getByLabelText("Unit price"), "7.25");

    await user.click(screen.getByRole("button", { name: "Save and send the estimate" }));
    await waitFor(() => expect(sends).toBe(1));
    expect(saved).toEqual({
      options: [
        { id: "0190f0c0-0000-7000-8000-0000000000a1", title: "Replace the spark plug", labourHours: 0.2, parts: [{ partNumber: "", description: "spark plug", quantity: 1, unitPriceCents: 0 }] },
        { title: "Replace the plug and the air filter", labourHours: 0.4, parts: [{ partNumber: "KC-AF-12", description: "air filter", quantity: 1, unitPriceCents: 725 }] },
      ],
      note: "",
      replacementPriceCents: null,
    });

    // The list is asked again and now carries the failed attempt.
    view.rerender(
      <QueryClientProvider client={new QueryClient()}>
        <EstimateBuilder estimate={failed} customerEmail="dana@example.com" workOrderKey={["work-orders", "detail", "wo-1"]} />
      </QueryClientProvider>,
    );
    expect(await screen.findByText(/Could not reach the mail server at smtp:\/\/mail\.shop\.example:587/)).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Send again" })).toBeEnabled();
  });
});
