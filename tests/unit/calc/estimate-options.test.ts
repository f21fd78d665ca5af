import { describe, expect, it } from "vitest";
import { optionTotals } from "../../../shared/calc/estimate.ts";
import { redactTokenInUrl } from "../../../server/lib/redact-url.ts";

describe("optionTotals", () => {
  // Hand-worked: parts 2 × 4.99 + 1 × 18.50 = 28.48; labour 1.5 h × 65.00 = 97.50;
  // fee 45.00 credited back (−45.00); subtotal 125.98; tax 7.25 % on the parts only:
  // 28.48 × 0.0725 = 2.0648 → 2.06; total 128.04.
  // Common practice (no published source): tax on separately stated parts, labour untaxed.
  it("prices an option at the estimate's rates, fee credited, tax on parts", () => {
    const totals = optionTotals(
      { labourRateCents: 6500, diagnosticFeeCents: 4500, creditDiagnosticFee: true, taxRateBasisPoints: 725, taxLabour: false },
      {
        labourHours: 1.5,
        parts: [
          { partNumber: "KC-118", description: "Fuel line, per foot", quantity: 2, unitPriceCents: 499 },
          { partNumber: "", description: "Carburettor rebuild kit", quantity: 1, unitPriceCents: 1850 },
        ],
      },
    );
    expect(totals.partsCents).toBe(2848);
    expect(totals.labourCents).toBe(9750);
    expect(totals.subtotalCents).toBe(12598);
    expect(totals.taxCents).toBe(206);
    expect(totals.totalCents).toBe(12804);
    expect(totals.lines[0]!.description).toBe("KC-118 Fuel line, per foot");
    expect(totals.lines[1]!.description).toBe("Carburettor rebuild kit");
  });

  it("keeps the fee when the shop does not credit it", () => {
    const totals = optionTotals({ labourRateCents: 6500, diagnosticFeeCents: 4500, creditDiagnosticFee: false, taxRateBasisPoints: 0, taxLabour: false }, { labourHours: 0, parts: [] });
    expect(totals.totalCents).toBe(4500);
  });
});

describe("redactTokenInUrl", () => {
  const token = "q3Zk8cY1m0p2Vb7nWx4Rt6Ls9Ad5Fh3Jg0Ke2Mi8Uo";
  it("keeps one-time tokens out of the request log", () => {
    expect(redactTokenInUrl(`/api/public/estimates/${token}`)).toBe("/api/public/estimates/[token]");
    expect(redactTokenInUrl(`/api/public/estimates/${token}/decision`)).toBe("/api/public/estimates/[token]/decision");
    expect(redactTokenInUrl(`/estimate/${token}`)).toBe("/estimate/[token]");
    expect(redactTokenInUrl(`/welcome/${token}`)).toBe("/welcome/[token]");
    expect(redactTokenInUrl(`/reset-password/${token}?x=1`)).toBe("/reset-password/[token]?x=1");
  });
  it("leaves other addresses alone", () => {
    expect(redactTokenInUrl("/api/work-orders/0193a1b2-0000-7000-8000-000000000001")).toBe("/api/work-orders/0193a1b2-0000-7000-8000-000000000001");
  });
});
