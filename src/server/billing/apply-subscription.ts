import "server-only";
import type { Knex } from "knex";
import type Stripe from "stripe";
import { FREE_PLAN, isPaidStatus } from "@/schemas/billing";

/**
 * Writes a Stripe subscription's state onto the firm: status, seat quantity, period, and the
 * seats the firm may fill (the quantity while paid, the free allowance once lapsed). Nothing
 * else changes: a lapsed firm keeps every member, project and row, and is held to the free
 * limits until it pays again. The caller holds the firm_billing row lock.
 *
 * @param eventAt creation time of the webhook event being applied; kept for ordering (left as it
 *   was when the state comes from our own API call, whose clock is not Stripe's).
 */
export async function applySubscription(trx: Knex.Transaction, firmId: string, subscription: Stripe.Subscription, eventAt?: Date): Promise<void> {
  const item = subscription.items.data[0];
  const quantity = item?.quantity ?? 1;
  const paid = isPaidStatus(subscription.status);
  await trx("firm_billing")
    .where({ firm_id: firmId })
    .update({
      stripe_subscription_id: subscription.id,
      subscription_status: subscription.status,
      subscription_seats: quantity,
      current_period_end: item ? new Date(item.current_period_end * 1000) : null,
      cancel_at_period_end: subscription.cancel_at_period_end,
      ...(eventAt ? { synced_event_at: eventAt } : {}),
      updated_at: trx.fn.now(),
      version: trx.raw("version + 1"),
    });
  await trx("firms")
    .where({ id: firmId })
    .update({ seats: paid ? quantity : FREE_PLAN.seats, updated_at: trx.fn.now(), version: trx.raw("version + 1") });
}
