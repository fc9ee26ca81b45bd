import "server-only";

/**
 * The caller's address for the per-address sign-in limit: the last hop in X-Forwarded-For, which
 * Next.js fills from the socket when no proxy did, and which a load balancer in front appends.
 */
export function clientAddress(headers: Headers): string {
  const hops = (headers.get("x-forwarded-for") ?? "").split(",").map((h) => h.trim()).filter(Boolean);
  const last = hops.at(-1) ?? headers.get("x-real-ip") ?? "unknown";
  return last.replace(/^::ffff:/, "").slice(0, 64);
}
