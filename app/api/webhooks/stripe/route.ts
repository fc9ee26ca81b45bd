// POST /api/webhooks/stripe: Stripe's (or the local stand-in's) signed events → the firm's plan and seats.
import { handleStripeWebhook } from "@/server/billing/handle-stripe-webhook";
import { readCappedBody } from "@/server/http/read-bytes";
import { route } from "@/server/http/route";

// Stripe's events are a few kilobytes; anyone can post here, so the body is read through a 1 MB
// cap before the signature is checked (413 beyond it).
const MAX_WEBHOOK_BYTES = 1024 * 1024;

// The raw body is what the signature covers, so it is read as text, never parsed first.
export const POST = route({ auth: "public" }, async ({ req }) => {
  const payload = new TextDecoder().decode(await readCappedBody(req, MAX_WEBHOOK_BYTES, "Webhook body"));
  return { received: true, ...(await handleStripeWebhook(payload, req.headers.get("stripe-signature"))) };
});
