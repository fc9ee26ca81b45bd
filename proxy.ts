// Runs before every page and API request: gives the request a fresh CSP nonce. Next.js reads the
// policy from the request to put the nonce on its own scripts; the layout reads x-nonce for the
// theme script; the browser gets the same policy on the response. (Kept here, not in src/server:
// the proxy bundle is not a React server environment, where "server-only" would throw.)
import { NextResponse, type NextRequest } from "next/server";

/**
 * The Content-Security-Policy of every page, with this request's nonce. Scripts run only when
 * they carry the nonce (Next.js puts it on its own bootstrap and chunk scripts, app/layout.tsx on
 * the theme script), and what they load inherits the trust ('strict-dynamic'): no
 * 'unsafe-inline' for scripts, so injected markup cannot run. Styles keep 'unsafe-inline' (the
 * grid and the charts set style attributes, which nonces cannot cover). Every page is rendered
 * per request already (the root layout reads the session), so the nonce costs no static pages.
 *
 * @param dev development adds 'unsafe-eval' (React's debugging uses eval there only).
 */
export function contentSecurityPolicy(nonce: string, dev = false): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** A fresh nonce: 128 random bits, base64. */
export function newNonce(): string {
  return Buffer.from(crypto.getRandomValues(new Uint8Array(16))).toString("base64");
}

export function proxy(request: NextRequest) {
  const nonce = newNonce();
  const policy = contentSecurityPolicy(nonce, process.env.NODE_ENV === "development");
  const headers = new Headers(request.headers);
  headers.set("x-nonce", nonce);
  headers.set("content-security-policy", policy);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set("content-security-policy", policy);
  return response;
}

export const config = {
  // Pages only. Static files need no policy (a policy governs documents), and the API answers
  // with a fixed policy from next.config.ts: with a proxy in front, Next.js buffers every request
  // body (up to 10 MB, and cuts it there), which uploads, imports and webhooks must not suffer.
  matcher: [{ source: "/((?!api/|_next/static|_next/image|favicon.ico|icon.svg).*)" }],
};
