import "server-only";
import Stripe from "stripe";
import { env } from "@/server/env";

let cached: { key: string; client: Stripe } | undefined;

/**
 * The official Stripe SDK, pointed at STRIPE_API_URL: the local stand-in in development and tests
 * (host, port and protocol from the URL), https://api.stripe.com in production. The same calls go
 * to both, so nothing here knows which it talks to.
 */
export function stripeClient(): Stripe {
  const e = env();
  const key = `${e.STRIPE_API_URL} ${e.STRIPE_SECRET_KEY}`;
  if (cached?.key === key) return cached.client;
  const url = new URL(e.STRIPE_API_URL);
  const protocol = url.protocol === "http:" ? "http" : "https";
  const local = ["127.0.0.1", "localhost", "[::1]"].includes(url.hostname);
  const client = new Stripe(e.STRIPE_SECRET_KEY, {
    host: url.hostname,
    port: url.port || (protocol === "http" ? 80 : 443),
    protocol,
    // Real Stripe asks clients to retry network failures (with idempotency keys, which the SDK
    // adds); the stand-in on loopback either answers or is down, and a test should see that at once.
    maxNetworkRetries: local ? 0 : 2,
    timeout: 15_000,
    telemetry: false,
    appInfo: { name: "Filmsheet" },
  });
  cached = { key, client };
  return client;
}
