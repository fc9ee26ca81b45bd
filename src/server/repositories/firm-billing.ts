import "server-only";
import type { Knex } from "knex";

export interface FirmBillingRow {
  firm_id: string;
  stripe_customer_id: string | null;
  stripe_subscription_id: string | null;
  subscription_status: string | null;
  subscription_seats: number | null;
  current_period_end: Date | null;
  cancel_at_period_end: boolean;
  synced_event_at: Date | null;
  version: number;
}

/** The firm's billing row, created empty on first use and locked for this transaction. */
export async function lockFirmBilling(trx: Knex.Transaction, firmId: string): Promise<FirmBillingRow> {
  await trx("firm_billing").insert({ firm_id: firmId }).onConflict("firm_id").ignore();
  return trx("firm_billing").where({ firm_id: firmId }).forUpdate().first();
}

/** The billing row of the firm that owns a Stripe customer, if any firm does. */
export async function firmBillingByCustomer(q: Knex | Knex.Transaction, customerId: string): Promise<FirmBillingRow | undefined> {
  return q("firm_billing").where({ stripe_customer_id: customerId }).first();
}
