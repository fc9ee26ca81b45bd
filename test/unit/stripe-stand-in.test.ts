// The local Stripe stand-in through the official stripe SDK, as the app uses it: customers,
// Checkout, subscriptions with a seat quantity, invoices, the portal, and signed webhooks that
// the SDK's own verifier accepts. No database: a small HTTP server here receives the webhooks.
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startStripeStandIn, type StandIn } from "../../scripts/stripe-stand-in";
import { pdfPages } from "../support/pdf-text";

const SECRET = "whsec_unit_test_secret";
const PRICE = "price_filmsheet_seat_monthly";
let standIn: StandIn;
let stripe: Stripe;
let receiver: Server;
const received: { event: Stripe.Event | null; error: string | null }[] = [];

beforeAll(async () => {
  // The receiver verifies each delivery exactly as the app's webhook route does.
  receiver = createServer(async (req, res) => {
    const chunks: Buffer[] = [];
    for await (const c of req) chunks.push(c as Buffer);
    try {
      received.push({ event: stripe.webhooks.constructEvent(Buffer.concat(chunks).toString("utf8"), String(req.headers["stripe-signature"]), SECRET), error: null });
      res.writeHead(200).end("{}");
    } catch (e) {
      received.push({ event: null, error: (e as Error).message });
      res.writeHead(400).end();
    }
  });
  await new Promise<void>((r) => receiver.listen(0, "127.0.0.1", r));
  standIn = await startStripeStandIn({ port: 0, webhookSecret: SECRET, webhookUrl: `http://127.0.0.1:${(receiver.address() as AddressInfo).port}/` });
  const url = new URL(standIn.url);
  stripe = new Stripe("sk_test_unit", { host: url.hostname, port: url.port, protocol: "http", maxNetworkRetries: 0, telemetry: false });
});
afterAll(async () => {
  await standIn?.close();
  await new Promise((r) => receiver?.close(r));
});

const control = async (path: string) => (await fetch(`${standIn.url}${path}`, { method: "POST" })).json();
const types = () => received.map((r) => r.event?.type);

test("GET /health answers ok", async () => {
  const res = await fetch(`${standIn.url}/health`);
  expect(await res.json()).toEqual({ status: "ok", service: "stripe-stand-in" });
});

test("an unknown call answers 404 with a Stripe-shaped error, and no key answers 401", async () => {
  await expect(stripe.accounts.retrieve("acct_x")).rejects.toMatchObject({ type: "StripeInvalidRequestError", statusCode: 404 });
  const res = await fetch(`${standIn.url}/v1/customers`, { method: "POST" });
  expect(res.status).toBe(401);
});

test("a Checkout session without its price is refused naming the parameter", async () => {
  const customer = await stripe.customers.create({ name: "Refused Ltd" });
  await expect(
    stripe.checkout.sessions.create({ mode: "subscription", customer: customer.id, success_url: "http://x/ok", line_items: [{ quantity: 2 }] }),
  ).rejects.toMatchObject({ statusCode: 400, param: "line_items[0][price]" });
  await expect(
    stripe.checkout.sessions.create({ mode: "subscription", customer: customer.id, success_url: "http://x/ok", line_items: [{ price: PRICE, quantity: 0 }] }),
  ).rejects.toMatchObject({ statusCode: 400, param: "line_items[0][quantity]" });
});

describe("a seat subscription from Checkout to cancellation", () => {
  let customer: Stripe.Customer;
  let subscriptionId: string;
  let sessionId: string;

  test("Checkout completes into an active subscription with the seats bought, and signed events arrive", async () => {
    customer = await stripe.customers.create({ name: "Tarn Test", email: "billing@tarn.test", metadata: { firm_id: "f-1" } });
    const session = await stripe.checkout.sessions.create({
      mode: "subscription",
      customer: customer.id,
      client_reference_id: "f-1",
      success_url: "http://app.test/firm/billing?session={CHECKOUT_SESSION_ID}",
      line_items: [{ price: PRICE, quantity: 7 }],
      subscription_data: { metadata: { firm_id: "f-1" } },
    });
    sessionId = session.id;
    expect(session.url).toBe(`${standIn.url}/checkout/${session.id}`);
    const page = await (await fetch(session.url!)).text();
    expect(page).toContain("£203.00"); // 7 seats × £29.00

    const done = await control(`/_stand-in/checkout/sessions/${session.id}/complete`);
    expect(done.statuses).toEqual([200, 200, 200]);
    expect(types()).toEqual(["customer.subscription.created", "invoice.paid", "checkout.session.completed"]);
    expect(received.every((r) => r.error === null)).toBe(true);

    const completed = await stripe.checkout.sessions.retrieve(session.id);
    subscriptionId = String(completed.subscription);
    const sub = await stripe.subscriptions.retrieve(subscriptionId);
    expect(sub.status).toBe("active");
    expect(sub.items.data[0]!.quantity).toBe(7);
    expect(sub.metadata).toEqual({ firm_id: "f-1" });
  });

  test("a completed session cannot be paid twice, and an unknown one is not found", async () => {
    const again = await fetch(`${standIn.url}/_stand-in/checkout/sessions/${sessionId}/complete`, { method: "POST" });
    expect(again.status).toBe(400);
    expect((await again.json()).error.code).toBe("checkout_session_not_open");
    expect((await fetch(`${standIn.url}/_stand-in/checkout/sessions/cs_missing/complete`, { method: "POST" })).status).toBe(404);
    expect(Object.keys(standIn.store.state.subscriptions)).toHaveLength(1);
  });

  test("changing the quantity updates the subscription, the next invoice and sends customer.subscription.updated", async () => {
    const sub = await stripe.subscriptions.retrieve(subscriptionId);
    await stripe.subscriptions.update(subscriptionId, { items: [{ id: sub.items.data[0]!.id, quantity: 9 }] });
    await standIn.flush();
    expect(types().at(-1)).toBe("customer.subscription.updated");
    const preview = await stripe.invoices.createPreview({ customer: customer.id, subscription: subscriptionId });
    expect(preview.amount_due).toBe(9 * 2900);
    const invoices = await stripe.invoices.list({ customer: customer.id, limit: 10 });
    expect(invoices.data.map((i) => [i.status, i.amount_paid])).toEqual([["paid", 7 * 2900]]);
  });

  test("every invoice links its PDF, which names the invoice, the customer and the amount", async () => {
    const [invoice] = (await stripe.invoices.list({ customer: customer.id, limit: 1 })).data;
    expect(invoice!.invoice_pdf).toBe(`${standIn.url}/invoices/${invoice!.id}/pdf`);
    expect((await stripe.invoices.retrieve(invoice!.id)).invoice_pdf).toBe(invoice!.invoice_pdf);
    const res = await fetch(invoice!.invoice_pdf!);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    const bytes = new Uint8Array(await res.arrayBuffer());
    expect(Buffer.from(bytes.subarray(0, 5)).toString()).toBe("%PDF-");
    const [text] = await pdfPages(bytes);
    expect(text).toContain(`Invoice ${invoice!.number}`);
    expect(text).toContain("billing@tarn.test");
    expect(text).toContain("£203.00"); // 7 seats × £29.00, paid at Checkout
    expect(text).toContain("not a tax invoice");
    expect((await fetch(`${standIn.url}/invoices/in_missing/pdf`)).status).toBe(404);
  });

  test("a declined renewal leaves an open invoice and the subscription past due; paying it recovers", async () => {
    await control(`/_stand-in/subscriptions/${subscriptionId}/fail-payment`);
    expect(types().slice(-2)).toEqual(["invoice.payment_failed", "customer.subscription.updated"]);
    expect((await stripe.subscriptions.retrieve(subscriptionId)).status).toBe("past_due");
    await control(`/_stand-in/subscriptions/${subscriptionId}/recover-payment`);
    expect((await stripe.subscriptions.retrieve(subscriptionId)).status).toBe("active");
    const invoices = await stripe.invoices.list({ customer: customer.id });
    expect(invoices.data.map((i) => i.status)).toEqual(["paid", "paid"]);
  });

  test("the portal session opens a page of the customer's subscription", async () => {
    const portal = await stripe.billingPortal.sessions.create({ customer: customer.id, return_url: "http://app.test/firm/billing" });
    const html = await (await fetch(portal.url)).text();
    expect(html).toContain("Simulate a declined renewal");
    expect(html).toContain("http://app.test/firm/billing");
  });

  test("cancelling ends the subscription and sends customer.subscription.deleted; nothing is left to preview", async () => {
    await stripe.subscriptions.cancel(subscriptionId);
    await standIn.flush();
    expect(types().at(-1)).toBe("customer.subscription.deleted");
    await expect(stripe.invoices.createPreview({ customer: customer.id })).rejects.toMatchObject({ code: "invoice_upcoming_none" });
  });

  test("an event can be read back through the API and redelivered", async () => {
    const id = received[0]!.event!.id;
    const event = await stripe.events.retrieve(id);
    expect(event.type).toBe("customer.subscription.created");
    const before = received.length;
    expect(await control(`/_stand-in/events/${id}/redeliver`)).toEqual({ status: 200 });
    expect(received.length).toBe(before + 1);
    expect(received.at(-1)!.event!.id).toBe(id);
  });
});
