import "server-only";
import type { TSeats } from "@/schemas/billing";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { lockFirmBilling } from "@/server/repositories/firm-billing";
import { applySubscription } from "./apply-subscription";
import { assertSeatsCoverMembers } from "./assert-seats-cover-members";
import { stripeClient } from "./stripe-client";

/**
 * Sets the seat quantity of the firm's subscription (prorated by Stripe on the next invoice).
 * Checkout only starts subscriptions, so a firm that already pays changes its seats here.
 * Refused below the seats in use and while a payment is overdue.
 *
 * No transaction is open while Stripe is asked: the billing row is read, Stripe is called (with
 * an idempotency key naming the row's version and the seats, so a retried click changes nothing
 * twice), and Stripe's answer is written in a short transaction — only if the row still names
 * the same subscription; the webhook that follows confirms it either way.
 */
export async function changeSeats(actor: Actor, input: TSeats): Promise<{ seats: number }> {
  const billing = await db()("firm_billing").where({ firm_id: actor.firm.id }).first("stripe_subscription_id", "subscription_status", "version");
  if (!billing?.stripe_subscription_id || !["active", "trialing"].includes(billing.subscription_status ?? "")) {
    const overdue = billing?.subscription_status === "past_due" || billing?.subscription_status === "unpaid";
    throw new AppError(
      "conflict",
      overdue ? "A payment is overdue: settle it under “Manage payment” before changing seats" : "This firm has no paid subscription yet: buy seats through Checkout first",
      [{ field: "seats", message: overdue ? "Payment overdue" : "No subscription" }],
    );
  }
  await assertSeatsCoverMembers(db(), actor.firm.id, input.seats);
  const stripe = stripeClient();
  const current = await stripe.subscriptions.retrieve(billing.stripe_subscription_id);
  const item = current.items.data[0];
  if (!item) throw new AppError("unavailable", "The subscription has no seat item at Stripe");
  if (item.quantity === input.seats) return { seats: input.seats };
  const updated = await stripe.subscriptions.update(
    current.id,
    { items: [{ id: item.id, quantity: input.seats }], proration_behavior: "create_prorations" },
    { idempotencyKey: `filmsheet-seats-${actor.firm.id}-${billing.version}-${input.seats}` },
  );
  await db().transaction(async (trx) => {
    const now = await lockFirmBilling(trx, actor.firm.id);
    // Another change (or a webhook) replaced the subscription meanwhile: its own state stands.
    if (now.stripe_subscription_id !== updated.id) return;
    await applySubscription(trx, actor.firm.id, updated);
  });
  return { seats: input.seats };
}
