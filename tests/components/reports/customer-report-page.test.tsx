import { screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it, vi } from "vitest";
import { json, meAnswers, renderApp, signedInAs, stubApi, type FakeRoute } from "../render-app.tsx";
import { buildCustomerReport } from "../../../shared/report/customer-report.ts";
import type { CustomerReport } from "../../../shared/schemas/report.ts";

const apprentice = meAnswers(signedInAs("apprentice"));

function buildReport(): CustomerReport {
  const report = buildCustomerReport({
    generatedAt: "2026-12-02T15:00:00.000Z",
    shop: { name: "Millbrook Mower & Saw", phone: "555-0199", email: "desk@millbrook.example", address: "2 Weir Lane", warrantyNote: "Ninety days on parts and labour.", unitSystem: "imperial" },
    workOrder: { id: "wo-1", number: 1042, state: "waiting_for_approval", complaint: "Pulls over but will not start", createdAt: "2026-11-28T09:00:00.000Z", updatedAt: "2026-11-29T09:00:00.000Z" },
    customerName: "Dana Okafor",
    unit: { equipmentKind: "chainsaw", make: "Hollis", model: "CS-40", engineModel: "", engineType: "", engineSerial: "HC40-551", cycle: 2, displacementCc: 40, hours: null },
    sessions: [],
    estimate: {
      id: "es-1",
      revision: 2,
      status: "approved",
      currency: "USD",
      findingTitle: "Low compression",
      note: "",
      sentAt: "2026-11-29T10:00:00.000Z",
      validUntil: "2026-12-29T10:00:00.000Z",
      decidedAt: "2026-11-30T10:00:00.000Z",
      approvedOptionId: "op-2",
      labourRateCents: 8000,
      diagnosticFeeCents: 0,
      creditDiagnosticFee: false,
      taxRateBasisPoints: 0,
      taxLabour: false,
      options: [
        { id: "op-1", position: 1, title: "Top-end overhaul", labourHours: 3, parts: [{ partNumber: "HL-1", description: "Ring kit", quantity: 1, unitPriceCents: 5000 }] },
        { id: "op-2", position: 2, title: "Short block", labourHours: 2, parts: [{ partNumber: "HL-2", description: "Short block", quantity: 1, unitPriceCents: 15000 }] },
      ],
    },
  });
  report.findings = [
    {
      sessionId: "se-1",
      flowTitle: "Handheld 2-stroke: will not start",
      stepId: "compression/worn",
      title: "Low compression: worn rings or cylinder",
      certainty: "likely",
      certaintyLabel: "Likely, from the checks so far",
      explanation: "The engine is not holding compression.",
      completedAt: "2026-11-29T09:30:00.000Z",
      readings: [
        {
          stepId: "compression/reading",
          title: "Record the highest gauge reading",
          entered: { value: 430, unit: "kPa", unitLabel: "kPa" },
          converted: { value: 62.37, unit: "psi", unitLabel: "psi" },
          verdict: "low",
          verdictLabel: "Low",
          band: null,
          reason: "well under the usual range",
        },
      ],
      repairs: [{ title: "Top-end overhaul", labourHours: 3, parts: ["ring kit"] }],
      followUp: [],
    },
  ];
  return report;
}

const reportAnswers =
  (report: CustomerReport | null): FakeRoute =>
  ({ url, method }) => {
    if (method !== "GET" || url !== "/api/work-orders/wo-1/report") return undefined;
    return report ? json(report) : json({ error: { id: "not_found", message: "There is no such work order." } }, { status: 404 });
  };

async function openReport(path = "/work-orders/wo-1/report") {
  const view = renderApp(path);
  await screen.findByRole("heading", { level: 1, name: /Customer report/ }, { timeout: 5000 });
  return view;
}

describe("the customer report page", () => {
  it("shows the report: the shop, the work order, the unit, the finding's reading, the approved option and the safety panels", async () => {
    stubApi(apprentice, reportAnswers(buildReport()));
    await openReport();
    const sheet = screen.getByRole("article", { name: /Customer report/ });
    expect(within(sheet).getByText("Millbrook Mower & Saw")).toBeInTheDocument();
    expect(screen.getByRole("heading", { level: 1 })).toHaveTextContent("WO 1042");
    expect(screen.getByRole("heading", { level: 2, name: "The unit: Hollis CS-40 chainsaw" })).toBeInTheDocument();
    expect(screen.getByText("Pulls over but will not start")).toBeInTheDocument();
    expect(screen.getByText("430 kPa (62.37 psi)")).toBeInTheDocument();
    const approved = screen.getByRole("article", { name: "Option 2: Short block" });
    expect(within(approved).getByText("Approved")).toBeInTheDocument();
    // 150.00 parts + 2 h × 80.00 labour, no fee and no tax = 310.00.
    expect(within(approved).getByText("Total").nextElementSibling).toHaveTextContent("$310.00");
    expect(within(screen.getByRole("article", { name: "Option 1: Top-end overhaul" })).queryByText("Approved")).toBeNull();
    expect(screen.getByText("You approved option 2: Short block.")).toBeInTheDocument();
    expect(screen.getByRole("region", { name: "WARNING" })).toHaveTextContent("Fuel can catch fire");
    expect(screen.getByRole("region", { name: "CAUTION" })).toHaveTextContent("Sharp cutting attachment");
    expect(screen.queryByRole("button", { name: "Read and understood" })).toBeNull();
  });

  it("prints and downloads on the paper chosen, A4 unless the address says otherwise", async () => {
    stubApi(apprentice, reportAnswers(buildReport()));
    const print = vi.spyOn(window, "print").mockImplementation(() => {});
    const { router, container } = await openReport();
    const download = screen.getByRole("link", { name: "Download PDF (A4)" });
    expect(download).toHaveAttribute("href", "/api/work-orders/wo-1/report.pdf?paper=a4");
    expect(download).toHaveAttribute("download", "customer-report-wo-1042.pdf");
    expect(container.ownerDocument.querySelector("style")?.textContent ?? "").toContain("size: A4");

    const user = userEvent.setup();
    await user.click(screen.getByRole("radio", { name: "Letter" }));
    expect(router.state.location.search).toBe("?paper=letter");
    expect(await screen.findByRole("link", { name: "Download PDF (Letter)" }, { timeout: 5000 })).toHaveAttribute("href", "/api/work-orders/wo-1/report.pdf?paper=letter");
    expect([...container.querySelectorAll("style")].map((s) => s.textContent).join("")).toContain("size: letter");

    await user.click(screen.getByRole("button", { name: "Print" }));
    expect(print).toHaveBeenCalledTimes(1);
  });

  it("takes Letter from the address and falls back to A4 for paper it does not know", async () => {
    stubApi(apprentice, reportAnswers(buildReport()));
    const first = await openReport("/work-orders/wo-1/report?paper=letter");
    expect(screen.getByRole("radio", { name: "Letter" })).toBeChecked();
    first.unmount();
    await openReport("/work-orders/wo-1/report?paper=a5");
    expect(screen.getByRole("radio", { name: "A4" })).toBeChecked();
  });

  it("says what to do when the work order does not exist", async () => {
    stubApi(apprentice, reportAnswers(null));
    renderApp("/work-orders/wo-1/report");
    expect(await screen.findByRole("alert", {}, { timeout: 5000 })).toHaveTextContent("There is no such work order.");
    expect(screen.queryByRole("button", { name: "Print" })).toBeNull();
  });
});
