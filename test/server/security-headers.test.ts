// The headers of the built app: a Content-Security-Policy whose script-src has a fresh nonce per
// request and no 'unsafe-inline' (every script the page carries has that nonce, the theme script
// included), and Strict-Transport-Security on every answer of the production build.
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb } from "../support/db";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
const api = () => request(app.server);

beforeAll(async () => {
  app = await startBuiltApp();
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

const scriptSrc = (policy: string) => policy.split(";").map((d) => d.trim()).find((d) => d.startsWith("script-src"))!;
const nonceOf = (policy: string) => /'nonce-([A-Za-z0-9+/=]+)'/.exec(scriptSrc(policy))?.[1];

describe("Content-Security-Policy", () => {
  test.each(["/", "/sign-in", "/methods"])("%s: scripts need this request's nonce; no 'unsafe-inline'; every script tag carries it", async (path) => {
    const res = await api().get(path);
    expect(res.status).toBe(200);
    const policy = res.headers["content-security-policy"] as string;
    expect(scriptSrc(policy)).not.toContain("'unsafe-inline'");
    expect(scriptSrc(policy)).toContain("'strict-dynamic'");
    const nonce = nonceOf(policy);
    expect(nonce).toMatch(/^[A-Za-z0-9+/]{22}==$/);
    const tags = res.text.match(/<script\b[^>]*>/g) ?? [];
    expect(tags.length).toBeGreaterThan(1);
    for (const tag of tags) expect(tag).toContain(`nonce="${nonce}"`);
    // The theme script, run before first paint, is among them.
    expect(res.text).toMatch(new RegExp(`<script nonce="${nonce!.replace(/[+/=]/g, "\\$&")}">try\\{var t=localStorage`));
  });

  test("the API answers with a policy that lets nothing run, and is not passed through the proxy", async () => {
    const res = await api().get("/api/health");
    expect(res.headers["content-security-policy"]).toBe("default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'self'");
  });

  test("the nonce is fresh for every request", async () => {
    const nonces = new Set<string | undefined>();
    for (let i = 0; i < 3; i++) nonces.add(nonceOf((await api().get("/sign-in")).headers["content-security-policy"] as string));
    expect(nonces.size).toBe(3);
  });
});

describe("Strict-Transport-Security", () => {
  test.each(["/sign-in", "/api/health"])("%s carries it in the production build", async (path) => {
    const res = await api().get(path);
    expect(res.headers["strict-transport-security"]).toBe("max-age=63072000; includeSubDomains");
  });
});
