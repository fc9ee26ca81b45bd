// Session cookies, the cross-site check, what a session may carry, how API tokens are stored
// and used, and the security headers on the sign-in pages.
import { createHash } from "node:crypto";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";
import { signInWithPassword } from "../support/sessions";
import { bearer } from "../support/tokens";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let origin: string;
let admin: string;
const PASSWORD = process.env.DEMO_PASSWORD || "filmsheet-demo";
const api = () => request(app.server);

beforeAll(async () => {
  app = await startBuiltApp();
  origin = `http://127.0.0.1:${(app.server.address() as { port: number }).port}`;
  const result = await signInWithPassword(app.server, "admin@demo.filmsheet.test", PASSWORD);
  admin = result.cookie!;
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

describe("session cookie", () => {
  test("is httpOnly and SameSite=Lax (Secure is set when APP_URL is https, see the env tests)", async () => {
    const csrf = await api().get("/api/auth/csrf");
    const res = await api()
      .post("/api/auth/callback/credentials")
      .set("cookie", [csrf.headers["set-cookie"]].flat().map((c: string) => c.split(";")[0]).join("; "))
      .type("form")
      .send({ email: "viewer@demo.filmsheet.test", password: PASSWORD, csrfToken: csrf.body.csrfToken });
    const session = [res.headers["set-cookie"]].flat().find((c: string) => c.startsWith("authjs.session-token="));
    expect(session).toBeDefined();
    expect(session).toMatch(/; HttpOnly/);
    expect(session).toMatch(/; SameSite=Lax/);
    expect(session).not.toMatch(/; Secure/);
  });

  test("the session and /api/me never carry the password hash", async () => {
    const session = await api().get("/api/auth/session").set("cookie", admin);
    expect(session.body.user).toEqual({ id: expect.any(String), name: "Maren Tarnbrook", email: "admin@demo.filmsheet.test", emailVerified: null });
    const me = await api().get("/api/me").set("cookie", admin);
    for (const text of [session.text, me.text]) expect(text).not.toMatch(/password|\$2[aby]\$/);
  });
});

describe("cross-site requests", () => {
  // Creating a token is a state change with no other precondition (no seats involved).
  const newToken = { name: "cross-site probe", role: "viewer", expiresInDays: 7 };

  test("a state change with the session cookie from another site is refused", async () => {
    const res = await api().post("/api/firm/tokens").set("cookie", admin).set("origin", "http://evil.example").send(newToken);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("cross_site_request");
    const fetchMeta = await api().post("/api/firm/tokens").set("cookie", admin).set("sec-fetch-site", "cross-site").send(newToken);
    expect(fetchMeta.status).toBe(403);
  });

  test("the same request from Filmsheet's own origin passes; reading is never blocked", async () => {
    expect((await api().post("/api/firm/tokens").set("cookie", admin).set("origin", origin).send(newToken)).status).toBe(201);
    expect((await api().get("/api/me").set("cookie", admin).set("origin", "http://evil.example")).status).toBe(200);
  });

  test("a token-authenticated request is not subject to the Origin check", async () => {
    const created = await api().post("/api/firm/tokens").set("cookie", admin).set("origin", origin).send({ name: "script", role: "admin", expiresInDays: 7 });
    const spare = await api().post("/api/firm/tokens").set("cookie", admin).set("origin", origin).send(newToken);
    // Revoking is a state change a token may make (making tokens is for people only).
    const res = await api().delete(`/api/firm/tokens/${spare.body.token.id}`).set(bearer(created.body.secret)).set("origin", "http://evil.example");
    expect(res.status).toBe(200);
  });
});

describe("API tokens", () => {
  test("the secret is shown once, stored only as its SHA-256, and its use is recorded", async () => {
    const created = await api().post("/api/firm/tokens").set("cookie", admin).set("origin", origin).send({ name: "nightly export", role: "viewer", expiresInDays: 30 });
    expect(created.status).toBe(201);
    const { secret, token } = created.body;
    expect(secret).toMatch(/^fst_[A-Za-z0-9_-]{43}$/);
    expect(created.headers["cache-control"]).toContain("no-store");

    const row = await testDb()("api_tokens").where({ id: token.id }).first();
    expect(row.token_hash).toBe(createHash("sha256").update(secret).digest("hex"));
    expect(JSON.stringify(row)).not.toContain(secret);
    const listed = await api().get("/api/firm/tokens").set("cookie", admin);
    expect(listed.text).not.toContain(secret);
    expect(listed.text).not.toContain(row.token_hash);
    expect(listed.body.tokens.find((t: { id: string }) => t.id === token.id).last_used_at).toBeNull();

    const me = await api().get("/api/me").set(bearer(secret));
    expect(me.body).toMatchObject({ via: "token", user: null, roles: ["viewer"], firm: { name: "Tarnbrook & Sill Building Services" } });
    const after = await api().get("/api/firm/tokens").set("cookie", admin);
    expect(after.body.tokens.find((t: { id: string }) => t.id === token.id).last_used_at).not.toBeNull();

    expect((await api().delete(`/api/firm/tokens/${token.id}`).set("cookie", admin).set("origin", origin)).status).toBe(200);
    const refused = await api().get("/api/me").set(bearer(secret));
    expect(refused.status).toBe(401);
    expect(refused.body.error.message).toBe("API token has been revoked");
  });

  test.each([
    ["an unknown token", "Bearer fst_AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA", "API token not recognised"],
    ["a header without Bearer", "Token abc", "Authorization header must be `Bearer <token>`"],
  ])("%s is 401 with a message that says why", async (_label, header, message) => {
    const res = await api().get("/api/projects").set("authorization", header);
    expect(res.status).toBe(401);
    expect(res.body.error.message).toBe(message);
  });
});

describe("pages", () => {
  test("the sign-in page carries the Content-Security-Policy and works with Auth.js", async () => {
    const res = await api().get("/sign-in");
    expect(res.status).toBe(200);
    expect(res.headers["content-security-policy"]).toContain("form-action 'self'");
    expect(res.text).toContain("Sign in");
  });

  test("a signed-in page sends visitors without a session to sign-in and back", async () => {
    const res = await api().get("/firm/members");
    expect(res.status).toBe(307);
    expect(res.headers.location).toContain("/sign-in?callbackUrl=%2Ffirm%2Fmembers");
  });
});
