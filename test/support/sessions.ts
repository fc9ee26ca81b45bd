import type { Server } from "node:http";
import request from "supertest";

/** `name=value` pairs from Set-Cookie headers, as one Cookie header. */
export function cookieHeader(setCookie: string[] | string | undefined, previous = ""): string {
  const jar = new Map(previous.split("; ").filter(Boolean).map((c) => c.split("=", 2) as [string, string]));
  for (const line of [setCookie ?? []].flat()) {
    const [pair] = line.split(";");
    const i = pair!.indexOf("=");
    jar.set(pair!.slice(0, i), pair!.slice(i + 1));
  }
  return [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
}

export interface SignInResult {
  status: number;
  location: string;
  /** Cookie header carrying the session, when sign-in succeeded. */
  cookie: string | undefined;
  /** The `code` Auth.js put on the sign-in page address after a refusal (invalid, rate_limited). */
  code: string | null;
}

/**
 * Signs in exactly as the browser form does: fetch the CSRF token, then post e-mail and password
 * to Auth.js's credentials callback. `address` is sent as X-Forwarded-For. `server` is an
 * in-process server or the base URL of a running one.
 */
export async function signInWithPassword(server: Server | string, email: string, password: string, address = "127.0.0.1"): Promise<SignInResult> {
  const csrf = await request(server).get("/api/auth/csrf").set("x-forwarded-for", address);
  const jar = cookieHeader(csrf.headers["set-cookie"]);
  const res = await request(server)
    .post("/api/auth/callback/credentials")
    .set("cookie", jar)
    .set("x-forwarded-for", address)
    .type("form")
    .send({ email, password, csrfToken: csrf.body.csrfToken, callbackUrl: "/projects" });
  const setCookie = [res.headers["set-cookie"] ?? []].flat() as string[];
  const session = setCookie.some((c) => /session-token=[^;]+/.test(c) && !/session-token=;/.test(c));
  const location = String(res.headers.location ?? "");
  return {
    status: res.status,
    location,
    cookie: session ? cookieHeader(setCookie, jar) : undefined,
    code: location.includes("?") ? new URL(location, "http://x").searchParams.get("code") : null,
  };
}

/** Signs in and returns the Cookie header, failing the test if sign-in was refused. */
export async function sessionCookie(server: Server | string, email: string, password: string): Promise<string> {
  const result = await signInWithPassword(server, email, password);
  if (!result.cookie) throw new Error(`Sign-in as ${email} failed: ${result.status} ${result.location}`);
  return result.cookie;
}
