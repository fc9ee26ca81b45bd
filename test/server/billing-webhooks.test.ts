// Billing end to end against the Stripe stand-in, through the SDK, on the real database:
// Checkout → signed webhooks → the firm is paid with its seats; replays, bad signatures and
// out-of-order events change nothing; a declined renewal returns the firm to the free limits.
import Stripe from "stripe";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { StandIn } from "../../scripts/stripe-stand-in";
import { TEST_WEBHOOK_SECRET, connectWebhooks, newFirmAdmin, startTestStandIn } from "../support/billing";
import { startBuiltApp } from "../support/built-app";
import { closeTestDb, testDb } from "../support/db";

let app: Awaited<ReturnType<typeof startBuiltApp>>;
let standIn: StandIn;
let stripe: Stripe;
let firm: Awaited<ReturnType<typeof newFirmAdmin>>;
let subscriptionId: string;

beforeAll(async () => {
  standIn = await startTestStandIn();
  app = await startBuiltApp();
  const origin = `http://127.0.0.1:${(app.server.address() as { port: number }).port}`;
  connectWebhooks(standIn, origin);
  const url = new URL(standIn.url);
  stripe = new Stripe("sk_test_billing", { host: url.hostname, port: url.port, protocol: "http", maxNetworkRetries: 0, telemetry: false });
  firm = await newFirmAdmin(app.server, origin);
});
afterAll(async () => {
  await app?.close();
  await standIn?.close();
  await closeTestDb();
});

const billing = () => testDb()("firm_billing").where({ firm_id: firm.firmId }).first();
const firmRow = () => testDb()("firms").where({ id: firm.firmId }).first("seats", "version");
const eventCount = () => testDb()("webhook_events").count({ n: "*" }).then((r) => Number(r[0]!.n));
const api = () => request(app.server);
const post = (path: string, body?: object) => api().post(path).set(firm.headers).send(body);
const control = async (path: string) => (await fetch(`${standIn.url}${path}`, { method: "POST" })).json();
const createProject = (reference: string) => post("/api/projects", { name: `Project ${reference}`, reference });
/** Posts a body to the webhook as Stripe would, signed with the given secret. */
const sendWebhook = (payload: string, secret = TEST_WEBHOOK_SECRET) =>
  api().post("/api/webhooks/stripe").set("content-type", "application/json").set("stripe-signature", stripe.webhooks.generateTestHeaderString({ payload, secret })).send(payload);

describe("a free firm buys seats through Checkout", () => {
  test("before paying, the firm is free: a first project is allowed, a second is refused with 402 plan_limit", async () => {
    expect((await createProject("BW-1")).status).toBe(201);
    const res = await createProject("BW-2");
    expect(res.status).toBe(402);
    expect(res.body.error).toMatchObject({ code: "plan_limit", details: { limit: "projects", allowed: 1, requested: 2, upgradePath: "/firm/billing" } });
    expect(res.body.error.message).toMatch(/free plan holds 1 project.*Firm › Billing/);
    expect(await testDb()("projects").where({ firm_id: firm.firmId }).count({ n: "*" }).then((r) => Number(r[0]!.n))).toBe(1);
  });

  test("checkout → webhook → the firm is paid with the seats bought", async () => {
    const res = await post("/api/firm/billing/checkout", { seats: 3 });
    expect(res.status, res.text).toBe(201);
    expect(res.body.url).toBe(`${standIn.url}/checkout/${res.body.sessionId}`);
    // Nothing changes until Stripe says it is paid.
    expect((await billing()).subscription_status).toBeNull();

    const done = await control(`/_stand-in/checkout/sessions/${res.body.sessionId}/complete`);
    expect(done.statuses).toEqual([200, 200, 200]);
    subscriptionId = done.session.subscription;
    expect(await billing()).toMatchObject({ stripe_subscription_id: subscriptionId, subscription_status: "active", subscription_seats: 3 });
    expect((await firmRow()).seats).toBe(3);
    const sub = await stripe.subscriptions.retrieve(subscriptionId);
    expect(sub.items.data[0]!.quantity).toBe(3);
    expect(sub.metadata.firm_id).toBe(firm.firmId);
  });

  test("the paid firm creates a second project, and the overview shows the plan, the paid invoice and the next one", async () => {
    expect((await createProject("BW-2")).status).toBe(201);
    const res = await api().get("/api/firm/billing").set(firm.headers);
    expect(res.status).toBe(200);
    expect(res.body.plan).toMatchObject({ plan: "paid", status: "active", seats: 3 });
    expect(res.body.invoices.map((i: { status: string; total: number }) => [i.status, i.total])).toEqual([["paid", 3 * 2900]]);
    expect(res.body.nextInvoice).toMatchObject({ amountDue: 3 * 2900, currency: "gbp" });
    expect(res.body.price).toEqual({ unitAmount: 2900, currency: "gbp", interval: "month" });
  });

  test("a second Checkout while subscribed is refused: seats are changed on the subscription", async () => {
    const res = await post("/api/firm/billing/checkout", { seats: 4 });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/already has a subscription/);
  });
});

describe("each event once, in order, and only when signed", () => {
  test("a replayed webhook changes nothing", async () => {
    const [before, beforeFirm, beforeEvents] = [await billing(), await firmRow(), await eventCount()];
    const completed = (await stripe.events.list({ type: "checkout.session.completed", limit: 1 })).data[0]!;
    expect(await control(`/_stand-in/events/${completed.id}/redeliver`)).toEqual({ status: 200 });
    const res = await sendWebhook(JSON.stringify(completed));
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ received: true, id: completed.id, outcome: "duplicate" });
    expect(await billing()).toEqual(before);
    expect(await firmRow()).toEqual(beforeFirm);
    expect(await eventCount()).toBe(beforeEvents);
  });

  test.each([
    ["no signature", (p: string) => api().post("/api/webhooks/stripe").set("content-type", "application/json").send(p)],
    ["a signature made with another secret", (p: string) => sendWebhook(p, "whsec_someone_else")],
    ["a payload changed after signing", (p: string) => sendWebhookTampered(p)],
  ])("a webhook with %s gets 400 and changes nothing", async (_label, send) => {
    const [before, beforeEvents] = [await billing(), await eventCount()];
    const forged = JSON.stringify({ id: `evt_forged_${Date.now()}`, object: "event", type: "customer.subscription.deleted", created: Math.floor(Date.now() / 1000), data: { object: { id: subscriptionId, object: "subscription", customer: before.stripe_customer_id, status: "canceled" } } });
    const res = await send(forged);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("bad_request");
    expect(await billing()).toEqual(before);
    expect(await eventCount()).toBe(beforeEvents);
  });

  test("events delivered late or out of order leave the subscription's latest state", async () => {
    standIn.setWebhookUrl("http://127.0.0.1:1/nowhere");
    const item = (await stripe.subscriptions.retrieve(subscriptionId)).items.data[0]!;
    await stripe.subscriptions.update(subscriptionId, { items: [{ id: item.id, quantity: 6 }] });
    await new Promise((r) => setTimeout(r, 1100)); // Stripe's event times are in whole seconds
    await stripe.subscriptions.update(subscriptionId, { items: [{ id: item.id, quantity: 8 }] });
    await standIn.flush();
    connectWebhooks(standIn, `http://127.0.0.1:${(app.server.address() as { port: number }).port}`);
    const [older, newer] = (await stripe.events.list({ type: "customer.subscription.updated", limit: 2 })).data.reverse();
    expect((older!.data.object as Stripe.Subscription).items.data[0]!.quantity).toBe(6);

    expect((await sendWebhook(JSON.stringify(newer))).body.outcome).toBe("applied");
    expect(await billing()).toMatchObject({ subscription_seats: 8 });
    expect((await sendWebhook(JSON.stringify(older))).body.outcome).toBe("stale");
    expect(await billing()).toMatchObject({ subscription_seats: 8 });
    expect((await firmRow()).seats).toBe(8);
  });
});

describe("a lapsed subscription returns the firm to the free limits, deleting nothing", () => {
  test("payment failure → past due → free limits; both projects are kept, a third is refused", async () => {
    const res = await control(`/_stand-in/subscriptions/${subscriptionId}/fail-payment`);
    expect(res.statuses).toEqual([200, 200]);
    expect(await billing()).toMatchObject({ subscription_status: "past_due", subscription_seats: 8 });
    expect((await firmRow()).seats).toBe(5);
    const third = await createProject("BW-3");
    expect(third.status).toBe(402);
    expect(third.body.error.code).toBe("plan_limit");
    expect(await testDb()("projects").where({ firm_id: firm.firmId }).pluck("reference")).toEqual(expect.arrayContaining(["BW-1", "BW-2"]));
    const overview = await api().get("/api/firm/billing").set(firm.headers);
    expect(overview.body.plan).toMatchObject({ plan: "free", status: "past_due" });
    expect(overview.body.invoices.map((i: { status: string }) => i.status)).toEqual(["open", "paid"]);
  });

  test("changing seats while a payment is overdue is refused", async () => {
    const res = await api().put("/api/firm/billing/seats").set(firm.headers).send({ seats: 9 });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/payment is overdue/);
  });

  test("paying the overdue invoice restores the paid plan; cancelling returns to free again", async () => {
    await control(`/_stand-in/subscriptions/${subscriptionId}/recover-payment`);
    expect(await billing()).toMatchObject({ subscription_status: "active" });
    expect((await firmRow()).seats).toBe(8);
    expect((await createProject("BW-3")).status).toBe(201);

    await stripe.subscriptions.cancel(subscriptionId);
    await standIn.flush();
    expect(await billing()).toMatchObject({ subscription_status: "canceled" });
    expect((await createProject("BW-4")).status).toBe(402);
    expect(await testDb()("projects").where({ firm_id: firm.firmId }).count({ n: "*" }).then((r) => Number(r[0]!.n))).toBe(3);
  });
});

/** Signs the payload, then sends a different body under that signature. */
function sendWebhookTampered(payload: string) {
  const header = stripe.webhooks.generateTestHeaderString({ payload, secret: TEST_WEBHOOK_SECRET });
  const tampered = payload.replace('"canceled"', '"active"');
  return api().post("/api/webhooks/stripe").set("content-type", "application/json").set("stripe-signature", header).send(tampered);
}
