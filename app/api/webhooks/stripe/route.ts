// POST /api/webhooks/stripe: Stripe's (or the local stand-in's) signed events → the firm's plan and seats.
import { handleStripeWebhook } from "@/server/billing/handle-stripe-webhook";
import { route } from "@/server/http/route";

// The raw body is what the signature covers, so it is read as text, never parsed first.
export const POST = route({ auth: "public" }, async ({ req }) => ({ received: true, ...(await handleStripeWebhook(await req.text(), req.headers.get("stripe-signature"))) }));
