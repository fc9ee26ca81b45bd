import "server-only";
import type Stripe from "stripe";
import { db } from "@/server/db/knex";
import { env } from "@/server/env";
import { AppError } from "@/server/http/app-error";
import { firmBillingByCustomer, lockFirmBilling } from "@/server/repositories/firm-billing";
import { applySubscription } from "./apply-subscription";
import { stripeClient } from "./stripe-client";

export type WebhookOutcome = "applied" | "stale" | "ignored" | "duplicate";

/** The events that can change a firm's plan or seats; others are recorded and ignored. */
const HANDLED = new Set([
  "checkout.session.completed",
  "customer.subscription.created",
  "customer.subscription.updated",
  "customer.subscription.deleted",
  "customer.subscription.paused",
  "customer.subscription.resumed",
  "invoice.paid",
  "invoice.payment_failed",
]);

const idOf = (v: string | { id: string } | null | undefined) => (v == null ? null : typeof v === "string" ? v : v.id);

/** The customer and the subscription an event concerns. */
function refsOf(event: Stripe.Event): { customer: string | null; subscription: string | null } {
  const o = event.data.object as unknown as Record<string, unknown>;
  if (event.type.startsWith("customer.subscription.")) return { customer: idOf(o.customer as string), subscription: String(o.id) };
  if (event.type.startsWith("invoice.")) {
    const parent = o.parent as { subscription_details?: { subscription?: string | { id: string } } } | null;
    return { customer: idOf(o.customer as string), subscription: idOf(parent?.subscription_details?.subscription) };
  }
  if (event.type === "checkout.session.completed") return { customer: idOf(o.customer as string), subscription: idOf(o.subscription as string) };
  return { customer: null, subscription: null };
}

const LIVE = new Set(["active", "trialing", "past_due", "unpaid", "paused"]);

/**
 * Verifies a Stripe webhook and brings the firm's billing up to date, once per event.
 *
 * - Signature: checked with the endpoint's secret (STRIPE_WEBHOOK_SECRET); a bad or missing one
 *   is `bad_request` (400) and changes nothing.
 * - Once: the event id goes into webhook_events in the same transaction as the change; a second
 *   delivery finds it and changes nothing (a concurrent one waits on the primary key).
 * - Order: events may arrive late or out of order, so the subscription is read back from Stripe
 *   (its current state, not the event's snapshot), and an event created before the last one
 *   applied to the firm is recorded as stale and not applied.
 */
export async function handleStripeWebhook(payload: string, signature: string | null): Promise<{ id: string; outcome: WebhookOutcome }> {
  let event: Stripe.Event;
  try {
    event = stripeClient().webhooks.constructEvent(payload, signature ?? "", env().STRIPE_WEBHOOK_SECRET);
  } catch {
    throw new AppError("bad_request", "Stripe-Signature is missing or does not match this endpoint's signing secret");
  }
  const eventAt = new Date(event.created * 1000);
  if (await db()("webhook_events").where({ id: event.id }).first("id")) return { id: event.id, outcome: "duplicate" };

  const refs = refsOf(event);
  const owner = refs.customer ? await firmBillingByCustomer(db(), refs.customer) : undefined;
  // Read outside the transaction: no row lock is held while waiting on Stripe.
  const subscription = owner && HANDLED.has(event.type) && refs.subscription ? await stripeClient().subscriptions.retrieve(refs.subscription) : null;

  const outcome = await db().transaction(async (trx): Promise<WebhookOutcome> => {
    const record = (outcome: Exclude<WebhookOutcome, "duplicate">) =>
      trx("webhook_events")
        .insert({ id: event.id, type: event.type, stripe_created_at: eventAt, firm_id: owner?.firm_id ?? null, outcome })
        .onConflict("id")
        .ignore()
        .returning("id");
    if (!owner || !subscription) return (await record("ignored")).length ? "ignored" : "duplicate";
    const billing = await lockFirmBilling(trx, owner.firm_id);
    if (billing.synced_event_at && eventAt < new Date(billing.synced_event_at)) return (await record("stale")).length ? "stale" : "duplicate";
    // A second subscription (a second Checkout) replaces the firm's only when the current one has ended.
    const current = billing.stripe_subscription_id;
    const adopt = !current || current === subscription.id || (LIVE.has(subscription.status) && !LIVE.has(billing.subscription_status ?? ""));
    if (!adopt) return (await record("ignored")).length ? "ignored" : "duplicate";
    if (!(await record("applied")).length) return "duplicate";
    await applySubscription(trx, owner.firm_id, subscription, eventAt);
    return "applied";
  });
  return { id: event.id, outcome };
}
