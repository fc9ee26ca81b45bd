// The Stripe objects the stand-in keeps and how they change: customers, Checkout sessions,
// subscriptions with a seat quantity, invoices and portal sessions. Each change returns the
// events it caused, for the caller to deliver.
import { recordEvent } from "./webhooks";
import { addMonth, newId, nowSeconds, type Store, type StripeObject } from "./store";

/** A refusal in Stripe's error shape (the SDK turns it into StripeInvalidRequestError). */
export class StandInError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly param?: string,
    readonly code?: string,
  ) {
    super(message);
  }
}

export const missing = (param: string) => new StandInError(400, `Missing required param: ${param}.`, param, "parameter_missing");
const noSuch = (what: string, id: string, param?: string) => new StandInError(404, `No such ${what}: '${id}'`, param, "resource_missing");

export function getOrThrow(table: Record<string, StripeObject>, what: string, id: string, param?: string): StripeObject {
  const found = table[id];
  if (!found) throw noSuch(what, id, param);
  return found;
}

type Item = { id: string; object: "subscription_item"; price: StripeObject; quantity: number; current_period_start: number; current_period_end: number };
export const itemOf = (sub: StripeObject) => (sub.items as { data: Item[] }).data[0]!;

function positiveInt(value: unknown, param: string): number {
  const n = Number(value);
  if (!Number.isInteger(n) || n < 1) throw new StandInError(400, `Invalid integer: ${String(value)}`, param, "parameter_invalid_integer");
  return n;
}

export function createCustomer(store: Store, params: Record<string, unknown>): StripeObject {
  const customer: StripeObject = {
    id: newId("cus"),
    object: "customer",
    created: nowSeconds(),
    email: params.email ?? null,
    name: params.name ?? null,
    metadata: params.metadata ?? {},
    livemode: false,
    // The stand-in's only payment method: a test card, shown in the portal.
    invoice_settings: { default_payment_method: "pm_card_visa" },
  };
  store.state.customers[customer.id] = customer;
  return customer;
}

export function createCheckoutSession(store: Store, params: Record<string, unknown>, baseUrl: string): StripeObject {
  if (params.mode !== "subscription") throw new StandInError(400, "The stand-in supports mode=subscription only.", "mode");
  if (!params.success_url) throw missing("success_url");
  if (!params.customer) throw missing("customer");
  getOrThrow(store.state.customers, "customer", String(params.customer), "customer");
  const lines = params.line_items as { price?: string; quantity?: string }[] | undefined;
  if (!Array.isArray(lines) || lines.length !== 1) throw missing("line_items");
  const line = lines[0]!;
  if (!line.price) throw missing("line_items[0][price]");
  getOrThrow(store.state.prices, "price", line.price, "line_items[0][price]");
  const quantity = positiveInt(line.quantity ?? 1, "line_items[0][quantity]");
  const id = newId("cs_test");
  const session: StripeObject = {
    id,
    object: "checkout.session",
    mode: "subscription",
    created: nowSeconds(),
    expires_at: nowSeconds() + 24 * 3600,
    customer: params.customer,
    client_reference_id: params.client_reference_id ?? null,
    metadata: params.metadata ?? {},
    success_url: params.success_url,
    cancel_url: params.cancel_url ?? null,
    status: "open",
    payment_status: "unpaid",
    subscription: null,
    // Kept so the completed subscription carries the app's metadata, as Stripe does.
    subscription_data: params.subscription_data ?? {},
    line_items: { object: "list", data: [{ price: line.price, quantity }] },
    url: `${baseUrl}/checkout/${id}`,
    livemode: false,
  };
  store.state.checkoutSessions[id] = session;
  return session;
}

function makeInvoice(store: Store, sub: StripeObject, reason: string, paid: boolean): StripeObject {
  const item = itemOf(sub);
  const amount = Number(item.price.unit_amount) * item.quantity;
  const customer = store.state.customers[String(sub.customer)];
  const id = newId("in");
  const invoice: StripeObject = {
    id,
    object: "invoice",
    customer: sub.customer,
    customer_email: customer?.email ?? null,
    number: `FSLOCAL-${String(++store.state.invoiceSeq).padStart(4, "0")}`,
    created: nowSeconds(),
    currency: item.price.currency,
    billing_reason: reason,
    status: paid ? "paid" : "open",
    amount_due: amount,
    amount_paid: paid ? amount : 0,
    amount_remaining: paid ? 0 : amount,
    total: amount,
    subtotal: amount,
    attempt_count: 1,
    attempted: true,
    next_payment_attempt: paid ? null : nowSeconds() + 3 * 24 * 3600,
    period_start: item.current_period_start,
    period_end: item.current_period_end,
    hosted_invoice_url: null,
    invoice_pdf: null,
    parent: { type: "subscription_details", quote_details: null, subscription_details: { subscription: sub.id, metadata: sub.metadata ?? {} } },
    lines: { object: "list", data: [{ id: newId("il"), object: "line_item", description: `${item.quantity} × ${item.price.nickname}`, quantity: item.quantity, amount }] },
    livemode: false,
  };
  store.state.invoices[id] = invoice;
  sub.latest_invoice = id;
  return invoice;
}

/** What paying on the Checkout page does: a subscription, its first invoice paid, the session complete. */
export function completeCheckout(store: Store, sessionId: string): StripeObject[] {
  const session = getOrThrow(store.state.checkoutSessions, "checkout session", sessionId);
  if (session.status !== "open") throw new StandInError(400, `This Checkout session is ${String(session.status)}, not open.`, undefined, "checkout_session_not_open");
  const line = (session.line_items as { data: { price: string; quantity: number }[] }).data[0]!;
  const start = nowSeconds();
  const sub: StripeObject = {
    id: newId("sub"),
    object: "subscription",
    customer: session.customer,
    status: "active",
    created: start,
    start_date: start,
    billing_cycle_anchor: start,
    cancel_at_period_end: false,
    canceled_at: null,
    ended_at: null,
    metadata: (session.subscription_data as { metadata?: unknown }).metadata ?? {},
    items: {
      object: "list",
      data: [{ id: newId("si"), object: "subscription_item", price: store.state.prices[line.price], quantity: line.quantity, current_period_start: start, current_period_end: addMonth(start) }],
    },
    latest_invoice: null,
    livemode: false,
  };
  store.state.subscriptions[sub.id] = sub;
  const invoice = makeInvoice(store, sub, "subscription_create", true);
  Object.assign(session, { status: "complete", payment_status: "paid", subscription: sub.id });
  return [recordEvent(store, "customer.subscription.created", sub), recordEvent(store, "invoice.paid", invoice), recordEvent(store, "checkout.session.completed", session)];
}

/** POST /v1/subscriptions/:id — seat quantity and cancel-at-period-end. */
export function updateSubscription(store: Store, id: string, params: Record<string, unknown>): StripeObject[] {
  const sub = getOrThrow(store.state.subscriptions, "subscription", id);
  if (sub.status === "canceled") throw new StandInError(400, "A canceled subscription can only update its cancellation_details and metadata.");
  const previous: Record<string, unknown> = {};
  const items = params.items as { id?: string; quantity?: string }[] | undefined;
  if (items !== undefined) {
    const item = itemOf(sub);
    const change = items[0];
    if (!change?.id) throw missing("items[0][id]");
    if (change.id !== item.id) throw new StandInError(404, `No such subscription item: '${change.id}'`, "items[0][id]", "resource_missing");
    previous.items = structuredClone(sub.items);
    item.quantity = positiveInt(change.quantity, "items[0][quantity]");
  }
  if (params.cancel_at_period_end !== undefined) {
    previous.cancel_at_period_end = sub.cancel_at_period_end;
    sub.cancel_at_period_end = params.cancel_at_period_end === "true";
  }
  if (params.metadata !== undefined) {
    previous.metadata = sub.metadata;
    sub.metadata = { ...(sub.metadata as object), ...(params.metadata as object) };
  }
  return [recordEvent(store, "customer.subscription.updated", sub, previous)];
}

/** Cancels at once (DELETE /v1/subscriptions/:id, or "Cancel" in the portal). */
export function cancelSubscription(store: Store, id: string): StripeObject[] {
  const sub = getOrThrow(store.state.subscriptions, "subscription", id);
  if (sub.status === "canceled") throw new StandInError(400, `The subscription ${id} is already canceled.`);
  Object.assign(sub, { status: "canceled", canceled_at: nowSeconds(), ended_at: nowSeconds() });
  return [recordEvent(store, "customer.subscription.deleted", sub)];
}

/** A renewal whose card is declined: an open invoice, and the subscription past due. */
export function failPayment(store: Store, id: string): StripeObject[] {
  const sub = getOrThrow(store.state.subscriptions, "subscription", id);
  if (sub.status === "canceled") throw new StandInError(400, `The subscription ${id} is canceled: nothing to charge.`);
  const invoice = makeInvoice(store, sub, "subscription_cycle", false);
  const previous = { status: sub.status };
  sub.status = "past_due";
  return [recordEvent(store, "invoice.payment_failed", invoice), recordEvent(store, "customer.subscription.updated", sub, previous)];
}

/** The overdue invoices paid (a new card in the portal): the subscription active again. */
export function recoverPayment(store: Store, id: string): StripeObject[] {
  const sub = getOrThrow(store.state.subscriptions, "subscription", id);
  if (sub.status !== "past_due" && sub.status !== "unpaid") throw new StandInError(400, `The subscription ${id} is ${String(sub.status)}: nothing is overdue.`);
  const events: StripeObject[] = [];
  for (const inv of Object.values(store.state.invoices)) {
    if (inv.status !== "open" || (inv.parent as { subscription_details: { subscription: string } }).subscription_details.subscription !== id) continue;
    Object.assign(inv, { status: "paid", amount_paid: inv.amount_due, amount_remaining: 0, next_payment_attempt: null });
    events.push(recordEvent(store, "invoice.paid", inv));
  }
  const previous = { status: sub.status };
  sub.status = "active";
  events.push(recordEvent(store, "customer.subscription.updated", sub, previous));
  return events;
}

/** POST /v1/invoices/create_preview: the next renewal of the customer's live subscription. */
export function previewInvoice(store: Store, params: Record<string, unknown>): StripeObject {
  if (!params.customer && !params.subscription) throw missing("customer");
  const live = Object.values(store.state.subscriptions).filter(
    (s) => (params.subscription ? s.id === params.subscription : s.customer === params.customer) && s.status !== "canceled" && !s.cancel_at_period_end,
  );
  const sub = live.at(-1);
  if (!sub) throw new StandInError(404, "No upcoming invoices for customer", undefined, "invoice_upcoming_none");
  const item = itemOf(sub);
  const amount = Number(item.price.unit_amount) * item.quantity;
  return {
    id: newId("upcoming_in"),
    object: "invoice",
    customer: sub.customer,
    status: "draft",
    currency: item.price.currency,
    amount_due: amount,
    total: amount,
    period_start: item.current_period_end,
    period_end: addMonth(item.current_period_end),
    next_payment_attempt: item.current_period_end,
    parent: { type: "subscription_details", quote_details: null, subscription_details: { subscription: sub.id, metadata: sub.metadata ?? {} } },
    lines: { object: "list", data: [{ object: "line_item", description: `${item.quantity} × ${item.price.nickname}`, quantity: item.quantity, amount }] },
    livemode: false,
  };
}

export function createPortalSession(store: Store, params: Record<string, unknown>, baseUrl: string): StripeObject {
  if (!params.customer) throw missing("customer");
  getOrThrow(store.state.customers, "customer", String(params.customer), "customer");
  const id = newId("bps");
  const session: StripeObject = { id, object: "billing_portal.session", customer: params.customer, return_url: params.return_url ?? null, created: nowSeconds(), url: `${baseUrl}/portal/${id}`, livemode: false };
  store.state.portalSessions[id] = session;
  return session;
}
