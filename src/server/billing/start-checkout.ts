import "server-only";
import type { TSeats } from "@/schemas/billing";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { env } from "@/server/env";
import { AppError } from "@/server/http/app-error";
import { appUrl } from "@/server/http/app-url";
import { assertSeatsCoverMembers } from "./assert-seats-cover-members";
import { ensureStripeCustomer } from "./ensure-stripe-customer";
import { stripeClient } from "./stripe-client";

/** Statuses of a subscription that still bills: a firm with one changes seats instead of buying. */
const BILLING = new Set(["active", "trialing", "past_due", "unpaid", "paused"]);

/**
 * Opens a Stripe Checkout session for a monthly subscription of `seats` seats and returns its
 * address. Nothing changes here: the firm becomes paid when Stripe's webhook says the
 * subscription is active. Refused below the seats in use, and while a subscription still bills
 * (Checkout would start a second one; the seat count is changed on the existing one).
 */
export async function startCheckout(actor: Actor, input: TSeats): Promise<{ url: string; sessionId: string }> {
  await assertSeatsCoverMembers(db(), actor.firm.id, input.seats);
  const billing = await db()("firm_billing").where({ firm_id: actor.firm.id }).first("subscription_status");
  if (BILLING.has(billing?.subscription_status ?? "")) {
    throw new AppError("conflict", "This firm already has a subscription: change its seats instead of buying a second one", [{ field: "seats", message: "Use “Change seats”" }]);
  }
  const customer = await ensureStripeCustomer(actor);
  const session = await stripeClient().checkout.sessions.create({
    mode: "subscription",
    customer,
    client_reference_id: actor.firm.id,
    line_items: [{ price: env().STRIPE_SEAT_PRICE_ID, quantity: input.seats }],
    metadata: { firm_id: actor.firm.id },
    subscription_data: { metadata: { firm_id: actor.firm.id } },
    success_url: appUrl("/firm/billing?checkout=done"),
    cancel_url: appUrl("/firm/billing?checkout=cancelled"),
  });
  if (!session.url) throw new AppError("unavailable", "Stripe did not return a Checkout address; try again");
  return { url: session.url, sessionId: session.id };
}
