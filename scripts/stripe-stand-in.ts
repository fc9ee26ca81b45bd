// Local Stripe stand-in: a small HTTP server of our own that the official stripe SDK is pointed
// at (host/port/protocol) in development and tests. It answers the API calls the app makes
// (customers, Checkout sessions, subscriptions with a seat quantity, the billing portal,
// invoices, events), serves stand-in Checkout and portal pages, and posts signed webhooks.
// The logic lives in scripts/stripe-stand-in/; this file starts it from the command line.
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { startStandIn, type StandIn, type StandInOptions } from "./stripe-stand-in/server";

export type { StandIn, StandInOptions };

/** Starts the stand-in (loopback unless told otherwise); port 0 picks a free port (tests). */
export function startStripeStandIn(options: StandInOptions | number): Promise<StandIn> {
  return startStandIn(typeof options === "number" ? { port: options } : options);
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const port = Number(process.env.STRIPE_STAND_IN_PORT ?? 12111);
  // Inside a container (docker-compose.dev.yml) it must listen on 0.0.0.0 to be reachable.
  const host = process.env.STRIPE_STAND_IN_HOST ?? "127.0.0.1";
  const stateFile = process.env.STRIPE_STAND_IN_STATE === "memory" ? undefined : (process.env.STRIPE_STAND_IN_STATE ?? join(process.cwd(), ".data", "stripe-stand-in.json"));
  const standIn = await startStripeStandIn({ port, host, webhookUrl: process.env.STRIPE_WEBHOOK_URL, webhookSecret: process.env.STRIPE_WEBHOOK_SECRET, stateFile });
  console.log(`Stripe stand-in listening on ${standIn.url}; webhooks to ${process.env.STRIPE_WEBHOOK_URL ?? "(nowhere)"}; state ${stateFile ?? "in memory"}`);
  const close = () => standIn.server.close(() => process.exit(0));
  process.on("SIGTERM", close);
  process.on("SIGINT", close);
}
