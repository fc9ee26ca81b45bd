import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { lockFirmBilling } from "@/server/repositories/firm-billing";
import { stripeClient } from "./stripe-client";

/**
 * The firm's Stripe customer id, creating the customer on first use. No transaction is open
 * while Stripe is asked (a slow Stripe must not hold a row lock or a pooled connection): the id
 * is read, Stripe is called with an idempotency key per firm — so two admins clicking at once,
 * or a retry after a lost answer, get the same customer — and the id is then written in a short
 * transaction that keeps whichever id was stored first.
 */
export async function ensureStripeCustomer(actor: Actor): Promise<string> {
  const stored = await db()("firm_billing").where({ firm_id: actor.firm.id }).first("stripe_customer_id");
  if (stored?.stripe_customer_id) return stored.stripe_customer_id;
  const customer = await stripeClient().customers.create(
    { name: actor.firm.name, ...(actor.email ? { email: actor.email } : {}), metadata: { firm_id: actor.firm.id } },
    { idempotencyKey: `filmsheet-customer-${actor.firm.id}` },
  );
  return db().transaction(async (trx) => {
    const billing = await lockFirmBilling(trx, actor.firm.id);
    if (billing.stripe_customer_id) return billing.stripe_customer_id;
    await trx("firm_billing").where({ firm_id: actor.firm.id }).update({ stripe_customer_id: customer.id, updated_at: trx.fn.now(), version: trx.raw("version + 1") });
    return customer.id;
  });
}
