import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { auditLog, shopSettings } from "../../../server/db/schema.ts";
import { demoShop } from "../../../server/db/seed/demo.ts";
import { flagLimits } from "../../../server/services/settings.ts";
import { settingsFormSchema, settingsSchema, settingsToForm, type Settings, type SettingsResponse } from "../../../shared/schemas/settings.ts";

let t: TestApp;
let lead: Awaited<ReturnType<typeof signedInAs>>;
let senior: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  t = await createTestApp();
  lead = await signedInAs(t, "shop_lead");
  senior = await signedInAs(t, "senior_tech");
});
afterAll(() => t.close());

const valid: Settings = settingsSchema.parse({
  ...demoShop,
  taxLabour: false,
  replaceThresholdPercent: 50,
  estimateValidDays: 15,
  reviewOpenHours: 24,
  warrantyNote: "30 days on parts and labour; blades, belts and cords excluded.",
});

describe("GET /api/settings", () => {
  it("answers the table's defaults with no name before the shop is set up", async () => {
    const res = await senior.agent.get("/api/settings");
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: "", currency: "USD", reviewOpenHours: 24, updatedAt: null });
  });
});

describe("PUT /api/settings", () => {
  it("stores the settings, answers them and audits the changed field names", async () => {
    const res = await lead.agent.put("/api/settings").send(valid);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ ...valid, currency: "USD" });
    const changed = await lead.agent.put("/api/settings").send({ ...valid, currency: "eur", reviewOpenHours: 36 });
    expect(changed.status).toBe(200);
    expect((changed.body as SettingsResponse).currency).toBe("EUR");
    const [row] = await t.ctx.db.select().from(shopSettings);
    expect(row).toMatchObject({ currency: "EUR", reviewOpenHours: 36, name: demoShop.name });
    // The review queue reads its limit from the same row.
    expect(await flagLimits(t.ctx)).toEqual({ openHours: 36 });
    const audits = await t.ctx.db.select().from(auditLog).where(and(eq(auditLog.action, "settings.updated"), eq(auditLog.userId, lead.user.id)));
    expect(audits.at(-1)!.details).toEqual({ changed: ["currency", "reviewOpenHours"] });
    expect((await senior.agent.get("/api/settings")).body.currency).toBe("EUR");
  });

  it("refuses an unknown currency beside the field and keeps the stored row", async () => {
    const res = await lead.agent.put("/api/settings").send({ ...valid, currency: "XYZ" });
    expect(res.status).toBe(400);
    // Source: ISO 4217 (via ICU's list) has no XYZ; EUR is the euro.
    expect(res.body.error.details.fieldErrors.currency).toEqual(["“XYZ” is not an ISO 4217 currency code. Use three letters such as USD, EUR or CAD."]);
    const [row] = await t.ctx.db.select().from(shopSettings);
    expect(row!.currency).toBe("EUR");
  });

  it("gives a message per field for each bad value", async () => {
    const res = await lead.agent.put("/api/settings").send({
      ...valid,
      name: " ",
      email: "desk-at-shop",
      labourRateCents: -1,
      taxRateBasisPoints: 10_001,
      altitudeM: 9000,
      replaceThresholdPercent: 0,
      estimateValidDays: 400,
      reviewOpenHours: 0,
      warrantyNote: "x".repeat(2001),
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.details.fieldErrors).sort()).toEqual(
      ["altitudeM", "email", "estimateValidDays", "labourRateCents", "name", "replaceThresholdPercent", "reviewOpenHours", "taxRateBasisPoints", "warrantyNote"].sort(),
    );
    expect(res.body.error.details.fieldErrors.name).toEqual(["Enter the shop's name."]);
  });

  it("is the shop lead's alone", async () => {
    const res = await senior.agent.put("/api/settings").send(valid);
    expect(res.status).toBe(403);
  });
});

describe("the settings form", () => {
  const form = settingsToForm(valid);

  it("turns a tax rate in percent into basis points by hand-worked digits", () => {
    // 8.25 % = 8.25 × 100 basis points = 825 (1 basis point is 0.01 %).
    expect(settingsFormSchema.parse({ ...form, taxPercent: "8.25" }).taxRateBasisPoints).toBe(825);
    // 7 % = 700; 0.5 % = 50; 100 % = 10 000.
    expect(settingsFormSchema.parse({ ...form, taxPercent: "7" }).taxRateBasisPoints).toBe(700);
    expect(settingsFormSchema.parse({ ...form, taxPercent: "0.5" }).taxRateBasisPoints).toBe(50);
    expect(settingsFormSchema.parse({ ...form, taxPercent: "100" }).taxRateBasisPoints).toBe(10_000);
    expect(settingsFormSchema.safeParse({ ...form, taxPercent: "100.01" }).success).toBe(false);
    expect(settingsFormSchema.safeParse({ ...form, taxPercent: "8.255" }).success).toBe(false);
    expect(settingsToForm({ ...valid, taxRateBasisPoints: 825 }).taxPercent).toBe("8.25");
  });

  it("turns decimal money into cents, and feet into metres", () => {
    // 85.50 → 85 × 100 + 50 = 8550 cents; 45 → 4500.
    const out = settingsFormSchema.parse({ ...form, labourRate: "85.50", diagnosticFee: "45" });
    expect(out).toMatchObject({ labourRateCents: 8550, diagnosticFeeCents: 4500 });
    // Source: 1 ft = 0.3048 m exactly; 1345 ft × 0.3048 = 409.956 m → 410 m.
    expect(settingsFormSchema.parse({ ...form, defaultUnitSystem: "imperial", altitude: "1345" }).altitudeM).toBe(410);
    expect(settingsFormSchema.parse({ ...form, defaultUnitSystem: "metric", altitude: "410" }).altitudeM).toBe(410);
    // 5000 m is 16 404 ft: 17 000 ft is beyond the limit and the message speaks feet.
    const high = settingsFormSchema.safeParse({ ...form, defaultUnitSystem: "imperial", altitude: "17000" });
    expect(high.error?.issues.find((i) => i.path[0] === "altitude")?.message).toBe("Use -1640 to 16404 ft above sea level.");
  });

  it("accepts EUR and refuses XYZ for the currency", () => {
    expect(settingsFormSchema.parse({ ...form, currency: "EUR" }).currency).toBe("EUR");
    const bad = settingsFormSchema.safeParse({ ...form, currency: "XYZ" });
    expect(bad.error?.issues.map((i) => i.path.join("."))).toEqual(["currency"]);
  });
});
