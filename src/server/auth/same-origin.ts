import "server-only";
import { env } from "@/server/env";
import { AppError } from "@/server/http/app-error";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Rejects a state-changing request that a browser sent from another site. Browsers always send
 * Origin (or Sec-Fetch-Site) on such requests, so a missing header means a non-browser client,
 * which carries no ambient cookies of ours. Token-authenticated requests skip this: a bearer
 * token is never sent by a browser on its own.
 */
export function assertSameOrigin(req: Request): void {
  if (SAFE_METHODS.has(req.method)) return;
  const origin = req.headers.get("origin");
  if (origin !== null) {
    let host: string | undefined;
    try {
      host = origin === "null" ? undefined : new URL(origin).host;
    } catch {
      host = undefined;
    }
    const allowed = [new URL(env().APP_URL).host, req.headers.get("x-forwarded-host"), req.headers.get("host")].filter(Boolean);
    if (host !== undefined && allowed.includes(host)) return;
    throw new AppError("cross_site_request", "Cross-site request refused: send it from Filmsheet itself or use an API token");
  }
  if (req.headers.get("sec-fetch-site") === "cross-site") {
    throw new AppError("cross_site_request", "Cross-site request refused: send it from Filmsheet itself or use an API token");
  }
}
