import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { lockFirmBilling } from "@/server/repositories/firm-billing";
import { stripeClient } from "./stripe-client";

/**
 * The firm's Stripe customer id, creating the customer on first use. The billing row stays
 * locked while Stripe is asked, so two admins clicking at once still make one customer; the
 * idempotency key makes a retried call after a lost answer return the same customer.
 */
export async function ensureStripeCustomer(actor: Actor): Promise<string> {
  return db().transaction(async (trx) => {
    const billing = await lockFirmBilling(trx, actor.firm.id);
    if (billing.stripe_customer_id) return billing.stripe_customer_id;
    const customer = await stripeClient().customers.create(
      { name: actor.firm.name, ...(actor.email ? { email: actor.email } : {}), metadata: { firm_id: actor.firm.id } },
      { idempotencyKey: `filmsheet-customer-${actor.firm.id}` },
    );
    await trx("firm_billing").where({ firm_id: actor.firm.id }).update({ stripe_customer_id: customer.id, updated_at: trx.fn.now(), version: trx.raw("version + 1") });
    return customer.id;
  });
}
