// GET /api/health against the built app and the real test database.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startBuiltApp } from "../support/built-app";

let app: Awaited<ReturnType<typeof startBuiltApp>>;

beforeAll(async () => {
  app = await startBuiltApp();
});
afterAll(async () => {
  await app?.close();
});

describe("GET /api/health with PostgreSQL up", () => {
  test("answers 200 {status: ok, db: ok}", async () => {
    const res = await request(app.server).get("/api/health");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: "ok", db: "ok" });
    expect(res.headers["cache-control"]).toContain("no-store");
  });

  test("carries the security headers: API answers take the fixed policy that allows nothing to load", async () => {
    const res = await request(app.server).get("/api/health");
    // Pages get a per-request nonce policy from proxy.ts; API answers load nothing at all.
    expect(res.headers["content-security-policy"]).toContain("default-src 'none'");
    expect(res.headers["content-security-policy"]).toContain("frame-ancestors 'none'");
    expect(res.headers["x-content-type-options"]).toBe("nosniff");
    expect(res.headers["x-powered-by"]).toBeUndefined();
  });

  test("the home page is served with its heading", async () => {
    const res = await request(app.server).get("/");
    expect(res.status).toBe(200);
    expect(res.text).toMatch(/<h1[^>]*>Filmsheet<\/h1>/);
  });
});
