// A work order whose check has reached a finding, ready for its estimate; and reading the estimate e-mail back from the sink.
import { desc } from "drizzle-orm";
import type { Database } from "../../../server/db/client.ts";
import { capturedMail, type CapturedMailRow } from "../../../server/db/schema.ts";
import { buildSession } from "../../factories/sessions.ts";
import { buildCustomer, buildWorkOrder } from "../../factories/work-orders.ts";

/** The handheld 2-stroke check's finding with two repairs: rebuild the carburettor, or replace it. */
export const CARB_VARNISH = "prime/fuel/carb-varnish";

export async function workOrderWithFinding(db: Database, findingStepId = CARB_VARNISH, email = "ada.fenwick@example.com") {
  const customer = await buildCustomer(db, { name: "Ada Fenwick", email });
  const wo = await buildWorkOrder(db, { customerId: customer.id, state: "waiting_for_approval" });
  const session = await buildSession(db, { workOrderId: wo.id, status: "completed", findingStepId, currentStepId: findingStepId, completedAt: new Date(), reviewState: "waiting" });
  return { wo, session, customer };
}

/** The newest message the sink received for the address. */
export async function lastMailTo(db: Database, to: string): Promise<CapturedMailRow | undefined> {
  const rows = await db.select().from(capturedMail).orderBy(desc(capturedMail.receivedAt), desc(capturedMail.id));
  return rows.find((row) => row.rcptTo.includes(to));
}

export function linkToken(text: string): string {
  const token = /\/estimate\/([A-Za-z0-9_-]{16,})/.exec(text)?.[1];
  if (!token) throw new Error(`no estimate link in:\n${text}`);
  return token;
}

/** The carburettor options as a tech prices them; the hand-worked totals are in the tests. */
export function pricedCarbOptions(ids: string[]) {
  return [
    {
      id: ids[0],
      title: "Clean and rebuild the carburettor",
      labourHours: 1.5,
      parts: [
        { partNumber: "KC-RK-118", description: "carburettor rebuild kit", quantity: 1, unitPriceCents: 2495 },
        { partNumber: "KC-FF-02", description: "fuel filter", quantity: 2, unitPriceCents: 650 },
      ],
    },
    {
      id: ids[1],
      title: "Replace the carburettor",
      labourHours: 0.8,
      parts: [
        { partNumber: "KC-CB-260", description: "carburettor", quantity: 1, unitPriceCents: 3899 },
        { partNumber: "KC-GS-260", description: "carburettor gaskets", quantity: 1, unitPriceCents: 349 },
        { partNumber: "KC-FF-02", description: "fuel filter", quantity: 1, unitPriceCents: 650 },
      ],
    },
  ];
}
