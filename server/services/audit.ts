import { v7 as uuidv7 } from "uuid";
import type { Database } from "../db/client.ts";
import { auditLog } from "../db/schema.ts";

export interface AuditEntry {
  userId: string | null;
  action: string;
  recordType: string;
  recordId?: string | null;
  details?: Record<string, unknown>;
}

/** Appends to the audit log; pass the transaction when inside one. */
export async function recordAudit(db: Pick<Database, "insert">, entry: AuditEntry): Promise<void> {
  await db.insert(auditLog).values({
    id: uuidv7(),
    userId: entry.userId,
    action: entry.action,
    recordType: entry.recordType,
    recordId: entry.recordId ?? null,
    details: entry.details ?? {},
  });
}
