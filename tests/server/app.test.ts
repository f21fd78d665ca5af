import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestApp, HOST, type TestApp } from "./helpers/test-app.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("the API's edges", () => {
  it("reports the database in GET /api/health", async () => {
    const res = await t.agent().get("/api/health");
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: "ok", database: { ok: true, kind: expect.any(String) } });
  });

  it("answers an unknown /api path with a JSON 404", async () => {
    const res = await t.agent().get("/api/no-such-thing");
    expect(res.status).toBe(404);
    expect(res.headers["content-type"]).toMatch(/application\/json/);
    expect(res.body.error.id).toBe("not_found");
  });

  it("answers malformed JSON with a JSON 400, never a stack trace", async () => {
    const res = await t.agent().post("/api/auth/sign-in").set("Content-Type", "application/json").send('{"email": "a@b.test",');
    expect(res.status).toBe(400);
    expect(res.body.error.id).toBe("malformed_json");
    expect(res.text).not.toMatch(/at .*\.js|<pre>|<html/i);
  });

  it("answers a body over 100 kB with 413", async () => {
    const res = await t.agent().post("/api/auth/sign-in").send({ email: "a@b.test", password: "x".repeat(120_000) });
    expect(res.status).toBe(413);
    expect(res.body.error.id).toBe("payload_too_large");
  });

  it("refuses a state-changing request without an Origin, or from another origin, with 403", async () => {
    const missing = await request(t.app).post("/api/auth/sign-in").set("Host", HOST).send({ email: "a@b.test", password: "x" });
    expect(missing.status).toBe(403);
    expect(missing.body.error.id).toBe("origin_missing");
    const foreign = await request(t.app).post("/api/auth/sign-in").set("Host", HOST).set("Origin", "http://evil.test").send({ email: "a@b.test", password: "x" });
    expect(foreign.status).toBe(403);
    expect(foreign.body.error.id).toBe("origin_forbidden");
  });

  it("lets a GET through without an Origin", async () => {
    expect((await request(t.app).get("/api/health").set("Host", HOST)).status).toBe(200);
  });

  it("sends a CSP that works over plain HTTP and a request id", async () => {
    const res = await t.agent().get("/api/health");
    const csp = String(res.headers["content-security-policy"]);
    expect(csp).toContain("default-src 'self'");
    expect(csp).not.toContain("upgrade-insecure-requests");
    expect(res.headers["strict-transport-security"]).toBeUndefined();
    expect(res.headers["x-request-id"]).toMatch(/^[0-9a-f-]{36}$/);
    expect(res.headers["x-powered-by"]).toBeUndefined();
  });

  it("answers 503 with JSON when the database is gone", async () => {
    const broken = await createTestApp();
    await broken.handle.close();
    const res = await broken.agent().get("/api/health");
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ status: "degraded", database: { ok: false } });
  });
});
