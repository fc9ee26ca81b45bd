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
 * Refused below the seats in use and while a payment is overdue. The new quantity is written at
 * once from Stripe's answer; the webhook that follows confirms it.
 */
export async function changeSeats(actor: Actor, input: TSeats): Promise<{ seats: number }> {
  return db().transaction(async (trx) => {
    const billing = await lockFirmBilling(trx, actor.firm.id);
    if (!billing.stripe_subscription_id || !["active", "trialing"].includes(billing.subscription_status ?? "")) {
      const overdue = billing.subscription_status === "past_due" || billing.subscription_status === "unpaid";
      throw new AppError(
        "conflict",
        overdue ? "A payment is overdue: settle it under “Manage payment” before changing seats" : "This firm has no paid subscription yet: buy seats through Checkout first",
        [{ field: "seats", message: overdue ? "Payment overdue" : "No subscription" }],
      );
    }
    await assertSeatsCoverMembers(trx, actor.firm.id, input.seats);
    const stripe = stripeClient();
    const current = await stripe.subscriptions.retrieve(billing.stripe_subscription_id);
    const item = current.items.data[0];
    if (!item) throw new AppError("unavailable", "The subscription has no seat item at Stripe");
    if (item.quantity === input.seats) return { seats: input.seats };
    const updated = await stripe.subscriptions.update(current.id, { items: [{ id: item.id, quantity: input.seats }], proration_behavior: "create_prorations" });
    await applySubscription(trx, actor.firm.id, updated);
    return { seats: input.seats };
  });
}
