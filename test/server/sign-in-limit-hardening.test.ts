// Issue 12: the sign-in limits cannot be dodged. With no trusted proxy (TRUSTED_PROXIES=0, the
// default) the caller's address is the socket's, whatever X-Forwarded-For says; and a burst of
// parallel guesses is counted before bcrypt runs, so no more than the limit are ever compared.
// Each test connects from an address of its own in 127.0.0.0/8 (all loopback on Linux).
import { Agent } from "node:http";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";
import { cookieHeader } from "../support/sessions";

process.env.TRUSTED_PROXIES = "0"; // before the app reads its environment

let app: Awaited<ReturnType<typeof startBuiltApp>>;
const run = `${process.pid}-${Date.now()}`;
const password = "correct-horse-staple";
const pid = process.pid % 250;

/** Signs in as the form does, over a connection from `localAddress`, with any X-Forwarded-For. */
async function signInFrom(localAddress: string, email: string, guess: string, forwardedFor?: string) {
  const agent = new Agent({ localAddress });
  const withHeaders = <T extends request.Test>(r: T) => (forwardedFor === undefined ? r : r.set("x-forwarded-for", forwardedFor));
  const csrf = await withHeaders(request(app.server).get("/api/auth/csrf").agent(agent));
  const res = await withHeaders(
    request(app.server)
      .post("/api/auth/callback/credentials")
      .agent(agent)
      .set("cookie", cookieHeader(csrf.headers["set-cookie"]))
      .type("form")
      .send({ email, password: guess, csrfToken: csrf.body.csrfToken, callbackUrl: "/projects" }),
  );
  agent.destroy();
  const location = String(res.headers.location ?? "");
  const signedIn = [res.headers["set-cookie"] ?? []].flat().some((c: string) => /session-token=[^;]+/.test(c));
  return { signedIn, code: location.includes("?") ? new URL(location, "http://x").searchParams.get("code") : null };
}

async function newAccount(tag: string): Promise<string> {
  const email = `${tag}-${run}@hardening.test`;
  const res = await request(app.server).post("/api/sign-up").send({ firmName: `Hardening ${tag}`, name: "Hard", email, password });
  expect(res.status, res.text).toBe(201);
  return email;
}

beforeAll(async () => {
  app = await startBuiltApp();
});
afterAll(async () => {
  await app?.close();
  await closeTestDb();
});

describe("parallel guesses", () => {
  test("30 wrong passwords at once: at most 5 reach bcrypt, the rest are refused unchecked", async () => {
    const email = await newAccount("burst");
    const from = `127.31.${pid}.1`;
    const results = await Promise.all(Array.from({ length: 30 }, (_, i) => signInFrom(from, email, `wrong-${i}`)));
    expect(results.every((r) => !r.signedIn)).toBe(true);
    const codes = results.map((r) => r.code);
    expect(codes.filter((c) => c === "invalid").length).toBeLessThanOrEqual(5);
    expect(codes.filter((c) => c === "rate_limited").length).toBeGreaterThanOrEqual(25);
    // "failed" rows are the attempts whose password was compared; none is left pending.
    const rows = await testDb()("sign_in_attempts").where({ email }).select("outcome", "address");
    expect(rows).toHaveLength(30);
    expect(rows.filter((r) => r.outcome === "failed").length).toBeLessThanOrEqual(5);
    expect(rows.filter((r) => r.outcome === "blocked").length).toBeGreaterThanOrEqual(25);
    expect(rows.filter((r) => r.outcome === "pending")).toEqual([]);
    expect(new Set(rows.map((r) => r.address))).toEqual(new Set([from]));
    // Locked even for the right password, as for sequential guesses.
    expect((await signInFrom(from, email, password)).code).toBe("rate_limited");
  });
});

describe("the caller's address", () => {
  test("a different X-Forwarded-For on every guess does not reset the per-address limit", async () => {
    const real = await newAccount("spoof");
    const from = `127.32.${pid}.1`;
    for (let i = 0; i < 20; i++) {
      // Each guess at another account (none locked on its own), each claiming another address.
      const r = await signInFrom(from, `probe${i}-${run}@hardening.test`, "guess", `203.0.113.${i + 1}`);
      expect(r.code).toBe("invalid");
    }
    const blocked = await signInFrom(from, real, password, "198.51.100.77");
    expect(blocked.code).toBe("rate_limited");
    const addresses = await testDb()("sign_in_attempts").where("email", "like", `probe%-${run}@hardening.test`).distinct("address");
    expect(addresses).toEqual([{ address: from }]);
    // Another place is not affected.
    expect((await signInFrom(`127.33.${pid}.1`, real, password)).signedIn).toBe(true);
  });
});
