import { randomUUID } from "node:crypto";
import { v7 as uuidv7 } from "uuid";
import type { Database } from "../../server/db/client.ts";
import { attachments, type AttachmentRow } from "../../server/db/schema.ts";

/** An attachment row (no file behind it unless the test writes one under its keys). */
export async function buildAttachment(db: Database, overrides: Partial<AttachmentRow> & Pick<AttachmentRow, "ownerType" | "ownerId">): Promise<AttachmentRow> {
  const [row] = await db
    .insert(attachments)
    .values({ id: uuidv7(), storageKey: randomUUID(), thumbKey: randomUUID(), stepId: null, mimeType: "image/webp", size: 100, width: 10, height: 10, sha256: "0".repeat(64), ...overrides })
    .returning();
  return row!;
}
