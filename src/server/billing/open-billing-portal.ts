import "server-only";
import type { Actor } from "@/server/auth/actor";
import { appUrl } from "@/server/http/app-url";
import { ensureStripeCustomer } from "./ensure-stripe-customer";
import { stripeClient } from "./stripe-client";

/** A Stripe billing-portal session (card, overdue invoices, cancelling) that returns to the billing page. */
export async function openBillingPortal(actor: Actor): Promise<{ url: string }> {
  const customer = await ensureStripeCustomer(actor);
  const session = await stripeClient().billingPortal.sessions.create({ customer, return_url: appUrl("/firm/billing") });
  return { url: session.url };
}
