import { createHash, randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import type { Readable } from "node:stream";
import type { AppContext } from "../context.ts";
import { attachments, type AttachmentRow } from "../db/schema.ts";
import { can } from "../auth/policies.ts";
import { conflict, notFound } from "../lib/errors.ts";
import { storageFor } from "../storage/storage.ts";
import { recordAudit } from "./audit.ts";
import { processImage } from "./images.ts";
import { sessionFor } from "./sessions.ts";
import { setIntakePhoto } from "./work-orders.ts";
import type { UploadedPhoto } from "../../shared/schemas/sessions.ts";
import type { PublicUser } from "../../shared/schemas/users.ts";

type Ctx = Pick<AppContext, "db" | "env">;
export interface PhotoOwner {
  type: AttachmentRow["ownerType"];
  id: string;
  stepId: string | null;
}

export const photoUrls = (id: string) => ({ url: `/api/attachments/${id}`, thumbUrl: `/api/attachments/${id}/thumb` });

const uploaded = (row: AttachmentRow): UploadedPhoto => ({ id: row.id, width: row.width, height: row.height, ...photoUrls(row.id) });

/** The photo already stored under a tablet's id, if it is the same owner's and step's; another's id is a conflict. */
async function alreadyStored(ctx: Ctx, user: PublicUser, owner: PhotoOwner, id: string): Promise<UploadedPhoto | null> {
  const [row] = await ctx.db.select().from(attachments).where(eq(attachments.id, id));
  if (!row) return null;
  if (row.ownerType !== owner.type || row.ownerId !== owner.id || row.stepId !== owner.stepId || row.createdBy !== user.id) {
    throw conflict("attachment_id_taken", "Another photo already has this id; send it with a new one.");
  }
  return uploaded(row);
}

/**
 * Re-encodes and stores the photo, then records it; the image work and the writes happen before, never inside, the transaction.
 * With a tablet-chosen id the upload is idempotent: the same photo sent again returns the stored one (`created: false`).
 */
export async function savePhoto(ctx: Ctx, user: PublicUser, owner: PhotoOwner, bytes: Buffer, clientId?: string): Promise<UploadedPhoto & { created: boolean }> {
  if (clientId) {
    const existing = await alreadyStored(ctx, user, owner, clientId);
    if (existing) return { ...existing, created: false };
  }
  const image = await processImage(bytes);
  const storage = storageFor(ctx.env);
  const storageKey = `${randomUUID()}.webp`;
  const thumbKey = `${randomUUID()}.webp`;
  await storage.put(storageKey, image.main);
  await storage.put(thumbKey, image.thumb);
  const id = clientId ?? uuidv7();
  try {
    await ctx.db.transaction(async (tx) => {
      await tx.insert(attachments).values({
        id,
        storageKey,
        thumbKey,
        ownerType: owner.type,
        ownerId: owner.id,
        stepId: owner.stepId,
        mimeType: image.mimeType,
        size: image.main.length,
        width: image.width,
        height: image.height,
        sha256: createHash("sha256").update(image.main).digest("hex"),
        createdBy: user.id,
      });
      if (owner.type === "work_order") await setIntakePhoto(tx, user, owner.id, id);
      else await recordAudit(tx, { userId: user.id, action: "session.photo_uploaded", recordType: "diagnostic_session", recordId: owner.id, details: { attachmentId: id, stepId: owner.stepId } });
    });
  } catch (e) {
    await Promise.all([storage.delete(storageKey), storage.delete(thumbKey)]);
    // Two copies of the same upload at once: the one that lost the race answers with the winner's row.
    const existing = clientId ? await alreadyStored(ctx, user, owner, clientId).catch(() => null) : null;
    if (existing) return { ...existing, created: false };
    throw e;
  }
  return { id, width: image.width, height: image.height, ...photoUrls(id), created: true };
}

/** The attachment's bytes for a user allowed to read its owner record; anyone else is told it does not exist. */
export async function openAttachment(ctx: Ctx, user: PublicUser, id: string, which: "main" | "thumb"): Promise<{ row: AttachmentRow; stream: Readable }> {
  const [row] = await ctx.db.select().from(attachments).where(eq(attachments.id, id));
  if (!row) throw notFound("There is no such photo.");
  if (row.ownerType === "session") await sessionFor(ctx.db, user, row.ownerId, "session.read").catch(() => Promise.reject(notFound("There is no such photo.")));
  else if (!can(user, "work_order.read")) throw notFound("There is no such photo.");
  const stream = await storageFor(ctx.env).get(which === "main" ? row.storageKey : row.thumbKey);
  if (!stream) throw notFound("The photo's file is missing.");
  return { row, stream };
}
