// A work order as the customer report sees it: a finished check with readings, and an estimate.
import { eq } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { Database } from "../../../server/db/client.ts";
import { diagnosticSessions, estimateOptions, estimates, shopSettings, type EstimateRow } from "../../../server/db/schema.ts";
import { compiledVersion } from "../../../server/services/flows.ts";
import { buildAttachment } from "../../factories/attachments.ts";
import { appendRequests, gatedEvents, type Move } from "../../factories/session-events.ts";
import { buildWorkOrder } from "../../factories/work-orders.ts";
import type { TestApp } from "../helpers/test-app.ts";
import type { signedInAs } from "../helpers/sign-in.ts";
import { demoShop } from "../../../server/db/seed/demo.ts";
import type { EstimatePartLine } from "../../../shared/schemas/estimate-records.ts";

/** The demo shop at sea level, so readings stand as taken. */
export const SHOP = { ...demoShop, altitudeM: 0 };

export async function seedShop(db: Database) {
  await db.insert(shopSettings).values({ id: 1, ...SHOP });
}

/**
 * Through the handheld 2-stroke flow to "worn rings or cylinder": a first compression reading the
 * gauge cannot give (taken again), then 430 kPa, which is low for a 2-stroke.
 */
export const toWornRings: Move[] = [
  ["prepare/protect", "done"],
  ["prepare/as-received", "done"],
  ["prepare/secure", "done"],
  ["prepare/controls", "yes"],
  ["prepare/fuel-valve", "open"],
  ["prepare/fuel-tank", "fresh"],
  ["prepare/oil-level", "none"],
  ["prepare/reproduce", "done"],
  ["prepare/reproduce-result", "no"],
  ["spark/connect", "done"],
  ["spark/pull", "done"],
  ["spark/flash", "every"],
  ["spark/plug-remove", "done"],
  ["spark/plug-look", "dry"],
  ["air/filter", "done"],
  ["air/filter-result", "clean"],
  ["air/arrestor", "done"],
  ["air/arrestor-result", "clear"],
  ["air/two-stroke", "yes"],
  ["air/port", "done"],
  ["air/port-result", "no"],
  ["compression/prep", "done"],
  ["compression/crank", "done"],
  ["compression/reading", { value: 900, unit: "psi" }],
  ["compression/recheck", "done"],
  ["compression/crank", "done"],
  ["compression/reading", { value: 430, unit: "kPa" }],
  ["compression/bolts", "done"],
  ["compression/bolts-result", "no"],
];

type Agent = Awaited<ReturnType<typeof signedInAs>>["agent"];

/** A work order whose check by `tech` has run to the worn-rings finding and been completed. */
export async function finishedWorkOrder(t: TestApp, tech: Agent, overrides: Parameters<typeof buildWorkOrder>[1] = {}) {
  const db = t.ctx.db as Database;
  const wo = await buildWorkOrder(db, { complaint: "Starts, then dies after a few seconds and has no power up a slope", ...overrides });
  const started = await tech.post(`/api/work-orders/${wo.id}/sessions`).send({ flowId: "handheld-2-stroke-no-start" });
  if (started.status !== 201) throw new Error(`start: ${started.status} ${JSON.stringify(started.body)}`);
  const sessionId = started.body.id as string;
  const [session] = await db.select().from(diagnosticSessions).where(eq(diagnosticSessions.id, sessionId));
  const flow = await compiledVersion(db, session!.flowVersionId);
  const photos = new Map<string, string>();
  for (const step of Object.values(flow.steps)) {
    if (step.photo?.requirement === "required") photos.set(step.id, (await buildAttachment(db, { ownerType: "session", ownerId: sessionId, stepId: step.id })).id);
  }
  for (const body of appendRequests(gatedEvents(flow, toWornRings, (id) => photos.get(id)!))) {
    const res = await tech.post(`/api/sessions/${sessionId}/events`).send(body);
    if (res.status !== 201) throw new Error(`event ${JSON.stringify(body.event)}: ${res.status} ${JSON.stringify(res.body)}`);
  }
  const completed = await tech.post(`/api/sessions/${sessionId}/complete`);
  if (completed.status !== 200) throw new Error(`complete: ${completed.status} ${JSON.stringify(completed.body)}`);
  return { workOrder: wo, sessionId };
}

export interface OptionSpec {
  title: string;
  labourHours: number;
  parts: EstimatePartLine[];
}

/** An estimate revision written straight into its tables, at the shop's rates. */
export async function insertEstimate(
  db: Database,
  workOrderId: string,
  options: OptionSpec[],
  overrides: Partial<EstimateRow> = {},
): Promise<{ estimate: EstimateRow; optionIds: string[] }> {
  const [estimate] = await db
    .insert(estimates)
    .values({
      id: uuidv7(),
      workOrderId,
      revision: 1,
      findingTitle: "Low compression: worn rings or cylinder",
      status: "sent",
      currency: SHOP.currency,
      labourRateCents: SHOP.labourRateCents,
      diagnosticFeeCents: SHOP.diagnosticFeeCents,
      creditDiagnosticFee: SHOP.creditDiagnosticFee,
      taxRateBasisPoints: SHOP.taxRateBasisPoints,
      taxLabour: false,
      replaceThresholdPercent: 50,
      sentAt: new Date("2026-11-20T15:00:00Z"),
      validUntil: new Date("2026-12-20T15:00:00Z"),
      ...overrides,
    })
    .returning();
  const optionIds: string[] = [];
  for (const [i, option] of options.entries()) {
    const id = uuidv7();
    optionIds.push(id);
    await db.insert(estimateOptions).values({ id, estimateId: estimate!.id, position: i + 1, ...option });
  }
  return { estimate: estimate!, optionIds };
}

/** Two options for the worn-rings finding, with invented part numbers. */
export const wornRingOptions: OptionSpec[] = [
  {
    title: "Top-end overhaul: piston, rings and gaskets",
    labourHours: 3,
    parts: [
      { partNumber: "KC-PR-25", description: "Piston and ring kit", quantity: 1, unitPriceCents: 6450 },
      { partNumber: "KC-GS-25", description: "Gasket set", quantity: 1, unitPriceCents: 1295 },
    ],
  },
  {
    title: "Replace the short block",
    labourHours: 2,
    parts: [{ partNumber: "KC-SB-25", description: "Short block", quantity: 1, unitPriceCents: 18900 }],
  },
];
