import "server-only";
import type { TPlan } from "@/schemas/billing";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { env } from "@/server/env";
import { seatUsage, type SeatUsage } from "@/server/repositories/firms";
import { getPlan } from "@/server/services/get-plan";
import { stripeClient } from "./stripe-client";

export interface BillingOverview {
  plan: TPlan;
  seats: SeatUsage;
  /** The per-seat price (minor units), or null when Stripe could not be asked. */
  price: { unitAmount: number; currency: string; interval: string } | null;
  nextInvoice: { amountDue: number; currency: string; date: string; description: string | null } | null;
  invoices: { id: string; number: string | null; date: string; total: number; currency: string; status: string | null; url: string | null; /** Stripe's PDF of the invoice. */ pdf: string | null }[];
  /** Set when Stripe did not answer: the page still shows the plan from our own tables. */
  stripeProblem: string | null;
}

const iso = (seconds: number) => new Date(seconds * 1000).toISOString();

/**
 * Everything the billing page shows: the plan and seats from our tables (kept current by the
 * webhooks), the price, the next invoice and past invoices from Stripe. A Stripe that does not
 * answer degrades the page to what we know, never fails it.
 */
export async function getBillingOverview(actor: Actor): Promise<BillingOverview> {
  const [plan, seats, billing] = await Promise.all([
    getPlan(actor.firm.id),
    seatUsage(db(), actor.firm.id),
    db()("firm_billing").where({ firm_id: actor.firm.id }).first("stripe_customer_id", "stripe_subscription_id", "subscription_status"),
  ]);
  const stripe = stripeClient();
  const customer: string | null = billing?.stripe_customer_id ?? null;
  const billsAgain = billing?.stripe_subscription_id && billing.subscription_status !== "canceled" && !plan.cancelAtPeriodEnd;
  const [price, preview, invoices] = await Promise.allSettled([
    stripe.prices.retrieve(env().STRIPE_SEAT_PRICE_ID),
    billsAgain ? stripe.invoices.createPreview({ customer: customer!, subscription: billing.stripe_subscription_id }) : Promise.resolve(null),
    customer ? stripe.invoices.list({ customer, limit: 24 }) : Promise.resolve(null),
  ]);
  const failed = [price, preview, invoices].find((r) => r.status === "rejected") as PromiseRejectedResult | undefined;
  if (failed) console.error("Billing overview: Stripe did not answer:", failed.reason instanceof Error ? failed.reason.message : failed.reason);

  const p = price.status === "fulfilled" ? price.value : null;
  const next = preview.status === "fulfilled" ? preview.value : null;
  return {
    plan,
    seats,
    price: p && p.unit_amount !== null ? { unitAmount: p.unit_amount, currency: p.currency, interval: p.recurring?.interval ?? "month" } : null,
    nextInvoice: next
      ? { amountDue: next.amount_due, currency: next.currency, date: iso(next.next_payment_attempt ?? next.period_start), description: next.lines?.data[0]?.description ?? null }
      : null,
    invoices:
      invoices.status === "fulfilled" && invoices.value
        ? invoices.value.data.map((i) => ({ id: i.id, number: i.number, date: iso(i.created), total: i.total, currency: i.currency, status: i.status, url: i.hosted_invoice_url ?? null, pdf: i.invoice_pdf ?? null }))
        : [],
    stripeProblem: failed ? "Stripe did not answer just now, so prices and invoices are missing; the plan and seats shown are current." : null,
  };
}
