import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { createTestApp, type TestApp } from "../helpers/test-app.ts";
import { signedInAs } from "../helpers/sign-in.ts";
import { buildWorkOrder } from "../../factories/work-orders.ts";
import { buildSession } from "../../factories/sessions.ts";
import { makeImage } from "../../factories/images.ts";
import { appendRequests } from "../../factories/session-events.ts";
import { attachments, workOrders } from "../../../server/db/schema.ts";
import { installBuiltInFlows } from "../../../server/services/flows.ts";

let t: TestApp;
let uploads: string;
let tech: Awaited<ReturnType<typeof signedInAs>>;
beforeAll(async () => {
  uploads = mkdtempSync(path.join(tmpdir(), "bp-uploads-"));
  t = await createTestApp({ UPLOADS_DIR: uploads });
  await installBuiltInFlows(t.ctx.db);
  tech = await signedInAs(t, "apprentice");
});
afterAll(async () => {
  await t.close();
  rmSync(uploads, { recursive: true, force: true });
});

const binary = (res: { body: unknown }) => res.body as Buffer;

describe("POST /api/sessions/:id/photos", () => {
  it("re-encodes a JPEG with EXIF to WebP without metadata, serves it and its thumbnail privately, and lets the tablet attach it", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id });
    const original = await makeImage("jpeg", { width: 3000, height: 1000, exif: true });
    expect((await sharp(original).metadata()).exif).toBeDefined();
    const res = await tech.agent.post(`/api/sessions/${session.id}/photos`).field("stepId", "prepare/as-received").attach("photo", original, { filename: "unit.jpg", contentType: "image/jpeg" });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ width: 2048, height: 683, url: `/api/attachments/${res.body.id}`, thumbUrl: `/api/attachments/${res.body.id}/thumb` });

    const full = await tech.agent.get(res.body.url).buffer(true);
    expect(full.status).toBe(200);
    expect(full.headers["content-type"]).toBe("image/webp");
    expect(full.headers["cache-control"]).toMatch(/^private/);
    const meta = await sharp(binary(full)).metadata();
    // Source: sharp docs, "Output metadata" — without withMetadata/keepExif no EXIF is written.
    expect(meta).toMatchObject({ format: "webp", width: 2048, height: 683 });
    expect(meta.exif).toBeUndefined();
    const thumb = await tech.agent.get(res.body.thumbUrl).buffer(true);
    expect(thumb.status).toBe(200);
    expect((await sharp(binary(thumb)).metadata()).width).toBe(320);

    const [row] = await t.ctx.db.select().from(attachments).where(eq(attachments.id, res.body.id));
    expect(row).toMatchObject({ ownerType: "session", ownerId: session.id, stepId: "prepare/as-received", mimeType: "image/webp", createdBy: tech.user.id });
    expect(row!.sha256).toMatch(/^[0-9a-f]{64}$/);

    const [ack] = appendRequests([{ type: "caution.acknowledge", stepId: "prepare/protect", signal: "WARNING" }]);
    expect((await tech.agent.post(`/api/sessions/${session.id}/events`).send(ack)).status).toBe(201);
    const [done] = appendRequests([{ type: "step.answer", stepId: "prepare/protect", value: "done" }], 2);
    expect((await tech.agent.post(`/api/sessions/${session.id}/events`).send(done)).status).toBe(201);
    const [attach] = appendRequests([{ type: "photo.attach", stepId: "prepare/as-received", attachmentId: res.body.id }], 3);
    expect((await tech.agent.post(`/api/sessions/${session.id}/events`).send(attach)).status).toBe(201);
  });

  it("refuses a text file named photo.jpg declared as image/jpeg with 415", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id });
    const res = await tech.agent.post(`/api/sessions/${session.id}/photos`).field("stepId", "prepare/as-received").attach("photo", Buffer.from("just some words, not a picture"), { filename: "photo.jpg", contentType: "image/jpeg" });
    expect(res.status).toBe(415);
    expect(res.body.error.id).toBe("unsupported_media_type");
  });

  it("refuses a file over 10 MB with 413", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id });
    const big = Buffer.alloc(11 * 1024 * 1024, 0xff);
    const res = await tech.agent.post(`/api/sessions/${session.id}/photos`).field("stepId", "prepare/as-received").attach("photo", big, { filename: "big.jpg", contentType: "image/jpeg" });
    expect(res.status).toBe(413);
    expect(res.body.error.id).toBe("payload_too_large");
  });

  it("answers 400 without a photo, and 422 for a step the flow does not have", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id });
    expect((await tech.agent.post(`/api/sessions/${session.id}/photos`).field("stepId", "prepare/as-received")).status).toBe(400);
    const png = await makeImage("png");
    const res = await tech.agent.post(`/api/sessions/${session.id}/photos`).field("stepId", "nowhere").attach("photo", png, { filename: "a.png", contentType: "image/png" });
    expect(res.status).toBe(422);
    expect(res.body.error.id).toBe("unknown_step");
  });

  it("stores a photo sent twice under the tablet's id once, and refuses that id on another step", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id });
    const png = await makeImage("png");
    const id = "0192f3a1-7c00-7000-8000-00000000a001";
    const send = (stepId: string) => tech.agent.post(`/api/sessions/${session.id}/photos`).field("stepId", stepId).field("id", id).attach("photo", png, { filename: "a.png", contentType: "image/png" });
    const first = await send("prepare/as-received");
    expect(first.status).toBe(201);
    expect(first.body.id).toBe(id);
    const again = await send("prepare/as-received");
    expect(again.status).toBe(200);
    expect(again.body).toEqual(first.body);
    expect(await t.ctx.db.select().from(attachments).where(eq(attachments.id, id))).toHaveLength(1);
    const elsewhere = await send("prepare/protect");
    expect(elsewhere.status).toBe(409);
    expect(elsewhere.body.error.id).toBe("attachment_id_taken");
    const badId = await tech.agent.post(`/api/sessions/${session.id}/photos`).field("stepId", "prepare/as-received").field("id", "not-a-uuid").attach("photo", png, { filename: "a.png", contentType: "image/png" });
    expect(badId.status).toBe(400);
  });

  it("hides another tech's session photos from an apprentice", async () => {
    const session = await buildSession(t.ctx.db, { techId: tech.user.id });
    const png = await makeImage("png");
    const up = await tech.agent.post(`/api/sessions/${session.id}/photos`).field("stepId", "prepare/as-received").attach("photo", png, { filename: "a.png", contentType: "image/png" });
    const other = await signedInAs(t, "apprentice");
    expect((await other.agent.get(up.body.url)).status).toBe(404);
    expect((await other.agent.post(`/api/sessions/${session.id}/photos`).attach("photo", png, { filename: "a.png", contentType: "image/png" })).status).toBe(404);
    const senior = await signedInAs(t, "senior_tech");
    expect((await senior.agent.get(up.body.thumbUrl)).status).toBe(200);
  });
});

describe("POST /api/work-orders/:id/intake-photo", () => {
  it("stores a PNG as the work order's intake photo", async () => {
    const wo = await buildWorkOrder(t.ctx.db);
    const res = await tech.agent.post(`/api/work-orders/${wo.id}/intake-photo`).attach("photo", await makeImage("png"), { filename: "tag.png", contentType: "image/png" });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ width: 64, height: 48 });
    const [row] = await t.ctx.db.select({ intakePhotoId: workOrders.intakePhotoId }).from(workOrders).where(eq(workOrders.id, wo.id));
    expect(row!.intakePhotoId).toBe(res.body.id);
  });
});

describe("GET /api/attachments/:id", () => {
  it("answers 401 to an anonymous caller and 404 for an unknown id", async () => {
    const wo = await buildWorkOrder(t.ctx.db);
    const up = await tech.agent.post(`/api/work-orders/${wo.id}/intake-photo`).attach("photo", await makeImage("png"), { filename: "tag.png", contentType: "image/png" });
    expect((await t.agent().get(up.body.url)).status).toBe(401);
    expect((await t.agent().get(up.body.thumbUrl)).status).toBe(401);
    expect((await tech.agent.get("/api/attachments/0190f0c0-0000-7000-8000-0000000000bb")).status).toBe(404);
  });
});
